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
 * @param freeConstants names of the free constants, in order (empty for a fitted solution)
 * @since 0.1
 */
public record ClosedForm(Domain domain, String function, String variable, Rational origin, long validFrom,
        List<Rational> leadingValues, List<Term> terms, List<String> freeConstants) {
    public ClosedForm {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(function, "function");
        Objects.requireNonNull(variable, "variable");
        Objects.requireNonNull(origin, "origin");
        leadingValues = List.copyOf(leadingValues);
        terms = List.copyOf(terms);
        freeConstants = List.copyOf(freeConstants);
    }
}
