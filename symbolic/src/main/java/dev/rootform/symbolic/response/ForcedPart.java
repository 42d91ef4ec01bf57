package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.solve.LinearSystem;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Writes a function g annihilated by A(L) as forcing terms with rational coefficients, from its
 * first deg A values (derivatives at 0, or samples). The basis comes from the factors of A: a
 * rational root a gives v^p·e^(av) or v^p·a^v; a complex pair α ± iω with rational α and ω gives
 * v^p·e^(αv)·cos ωv and sin ωv; in n, a pair r·e^(±iπ/2) with rational r gives r^n·cos(πn/2) and
 * sin(πn/2). The coefficients solve the square system of the basis's first values exactly.
 */
final class ForcedPart {
    private ForcedPart() {
    }

    /** The terms of g, or empty when A has a factor outside the basis above. */
    static Optional<List<ForcingTerm>> fit(RationalPolynomial annihilator, List<Rational> values, Domain domain) {
        if (annihilator.degree() < 1) {
            return Optional.of(List.of());
        }
        List<ForcingTerm> basis = new ArrayList<>();
        for (Factor f : JasFactorizer.factor(annihilator)) {
            for (int p = 0; p < f.multiplicity(); p++) {
                Optional<List<ForcingTerm>> terms = basis(f.polynomial(), p, domain);
                if (terms.isEmpty()) {
                    return Optional.empty();
                }
                basis.addAll(terms.get());
            }
        }
        int n = basis.size();
        List<List<Rational>> matrix = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            matrix.add(new ArrayList<>());
        }
        for (ForcingTerm t : basis) {
            List<Rational> column = values(Transforms.of(t, domain).orElseThrow(), domain, n);
            for (int i = 0; i < n; i++) {
                matrix.get(i).add(column.get(i));
            }
        }
        LinearSystem.Result r = LinearSystem.solve(matrix, values);
        if (r.solution() == null) {
            return Optional.empty();
        }
        List<ForcingTerm> terms = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            Rational c = r.solution().get(j);
            ForcingTerm b = basis.get(j);
            if (!c.isZero()) {
                terms.add(new ForcingTerm(c, b.power(), b.exponential(), b.oscillation(), b.frequency(), b.frequencyTimesPi()));
            }
        }
        return Optional.of(terms);
    }

    /** The basis terms with v^p for the roots of the irreducible f, or empty when they are not of the supported kinds. */
    private static Optional<List<ForcingTerm>> basis(RationalPolynomial f, int p, Domain domain) {
        if (f.degree() == 1) {
            return Optional.of(List.of(new ForcingTerm(Rational.ONE, p, f.coefficient(0).negate(), Oscillation.NONE,
                    Rational.ZERO, false)));
        }
        if (f.degree() != 2) {
            return Optional.empty();
        }
        Rational b = f.coefficient(1);
        Rational c = f.coefficient(0);
        if (domain == Domain.DIFFERENTIAL) {
            // roots α ± iω with α = -b/2, ω² = c - b²/4
            Rational alpha = b.multiply(Rational.of(-1, 2));
            Surd omega = Surd.sqrt(c.subtract(b.multiply(b).multiply(Rational.of(1, 4))));
            if (!omega.isRational()) {
                return Optional.empty();
            }
            return Optional.of(pair(p, alpha, omega.rational(), false));
        }
        // roots r·e^(±iπ/2) = ±ir: b = 0 and c = r² with rational r
        Surd r = Surd.sqrt(c);
        if (!b.isZero() || !r.isRational()) {
            return Optional.empty();
        }
        return Optional.of(pair(p, r.rational(), Rational.of(1, 2), true));
    }

    private static List<ForcingTerm> pair(int p, Rational growth, Rational frequency, boolean timesPi) {
        return List.of(new ForcingTerm(Rational.ONE, p, growth, Oscillation.COS, frequency, timesPi),
                new ForcingTerm(Rational.ONE, p, growth, Oscillation.SIN, frequency, timesPi));
    }

    /**
     * The first values of the signal whose transform is given: the derivatives f^(i)(0+) (s: the
     * coefficients of the strictly proper part at infinity) or the samples x[i] (z: the Taylor
     * coefficients in z^-1), i &lt; count.
     */
    private static List<Rational> values(RationalFunction transform, Domain domain, int count) {
        return domain == Domain.DIFFERENTIAL ? transform.seriesAtInfinity(count)
                : transform.reciprocalArgument().seriesAtZero(count);
    }
}
