package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Objects;

/**
 * A solution as one tree of real terms, which every renderer walks.
 *
 * <p>Differential: y(t) = Σ terms in v = t - origin, for all t. Difference: x[n] = Σ terms in v = n
 * for n &ge; validFrom, and x[origin + i] = leadingValues[i] before that.
 *
 * <p>For a forced equation the terms split into the homogeneous (transient) part
 * {@code terms[0 .. particularFrom)}, which solves the equation without its right-hand side, and
 * the particular (steady) part {@code terms[particularFrom ..]}, which the forcing produces:
 * the powers v^i·α^v with i below the multiplicity of α in the characteristic polynomial are
 * transient, the rest (all of a forcing root that is not a characteristic root, the raised powers
 * at resonance) are particular.
 *
 * @param freeConstants names of the free constants, in order (empty for a fitted solution)
 * @param particularFrom index of the first particular term; {@code terms.size()} when unforced
 * @since 0.1
 */
public record ClosedForm(Domain domain, String function, String variable, Rational origin, long validFrom,
        List<Rational> leadingValues, List<Term> terms, List<String> freeConstants, int particularFrom) {
    public ClosedForm {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(function, "function");
        Objects.requireNonNull(variable, "variable");
        Objects.requireNonNull(origin, "origin");
        leadingValues = List.copyOf(leadingValues);
        terms = List.copyOf(terms);
        freeConstants = List.copyOf(freeConstants);
        if (particularFrom < 0 || particularFrom > terms.size()) {
            throw new IllegalArgumentException("particularFrom (" + particularFrom + ") must be in 0.." + terms.size());
        }
    }

    /** A closed form with no particular part (a homogeneous equation). */
    public ClosedForm(Domain domain, String function, String variable, Rational origin, long validFrom,
            List<Rational> leadingValues, List<Term> terms, List<String> freeConstants) {
        this(domain, function, variable, origin, validFrom, leadingValues, terms, freeConstants, terms.size());
    }

    /** The homogeneous (transient) terms. */
    public List<Term> transientTerms() {
        return terms.subList(0, particularFrom);
    }

    /** The particular (steady) terms; empty for a homogeneous equation. */
    public List<Term> particularTerms() {
        return terms.subList(particularFrom, terms.size());
    }

    /**
     * This closed form with some free constants replaced by values (e.g. constants fixed
     * numerically, rounded to rationals for generated code); the others stay free.
     */
    public ClosedForm withConstantValues(java.util.Map<String, Rational> values) {
        List<Term> filled = terms.stream().map(t -> t.withCoefficients(t.coefficients().stream()
                .map(c -> c instanceof Coefficient.Free f && values.containsKey(f.name())
                        ? new Coefficient.Exact(Surd.of(values.get(f.name()))) : c)
                .toList())).toList();
        List<String> free = freeConstants.stream().filter(n -> !values.containsKey(n)).toList();
        return new ClosedForm(domain, function, variable, origin, validFrom, leadingValues, filled, free, particularFrom);
    }

    /** This closed form restricted to the given terms (e.g. only the particular part). */
    public ClosedForm withTerms(List<Term> subset) {
        return new ClosedForm(domain, function, variable, origin, validFrom, leadingValues, subset, freeConstants);
    }
}
