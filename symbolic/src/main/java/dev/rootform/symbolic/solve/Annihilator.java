package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The annihilator of a forcing term: a polynomial A over Q, given by its monic irreducible factors,
 * with A(L) f = 0 (the method of annihilators for undetermined coefficients; e.g. W. E. Boyce and
 * R. C. DiPrima, Elementary Differential Equations, section on the annihilator method — from
 * memory). Per term v^p·(exponential)·(oscillation):
 * <ul>
 *   <li>differential, e^{ct}: (λ - c)^{p+1}; with cos/sin(ωt), ω rational: (λ² - 2cλ + c² + ω²)^{p+1};</li>
 *   <li>difference, a^n: (λ - a)^{p+1}; with cos/sin(qπn): Φ_N(λ/a)·a^{φ(N)} to the power p+1, where
 *       e^{iqπ} is a primitive N-th root of unity and Φ_N is the cyclotomic polynomial.</li>
 * </ul>
 * A frequency whose roots are transcendental (ω·n with ω not a rational multiple of π; qπ·t) has
 * no annihilator over Q and is reported as out of scope.
 *
 * @since 0.1
 */
final class Annihilator {
    private Annihilator() {
    }

    /**
     * The factors of A with multiplicities (the least common multiple over the terms).
     *
     * @throws InputException if a term has no annihilator over Q
     */
    static List<Factor> of(LinearEquation eq) {
        Map<RationalPolynomial, Integer> factors = new LinkedHashMap<>();
        for (ForcingTerm t : eq.forcing()) {
            RationalPolynomial f = eq.domain() == Domain.DIFFERENCE ? sequenceFactor(t) : functionFactor(t);
            factors.merge(f, t.power() + 1, Math::max);
        }
        List<Factor> result = new ArrayList<>();
        factors.forEach((f, m) -> result.add(new Factor(f, m)));
        result.sort(Comparator.comparingInt(Factor::degree).thenComparing(f -> f.polynomial().toString()));
        return result;
    }

    private static RationalPolynomial functionFactor(ForcingTerm t) {
        Rational c = t.exponential();
        if (t.oscillation() == ForcingTerm.Oscillation.NONE) {
            return RationalPolynomial.of(c.negate(), Rational.ONE);
        }
        if (t.frequencyTimesPi()) {
            throw new InputException("the frequency " + t.frequency() + "·π of a differential equation's forcing "
                    + "has no annihilator over the rationals; not supported (use a rational frequency)", "", -1);
        }
        Rational w = t.frequency();
        return RationalPolynomial.of(c.multiply(c).add(w.multiply(w)), c.multiply(-2), Rational.ONE);
    }

    private static RationalPolynomial sequenceFactor(ForcingTerm t) {
        Rational a = t.exponential();
        if (a.isZero()) {
            throw new InputException("a forcing term 0^n is not supported", "", -1);
        }
        if (t.oscillation() == ForcingTerm.Oscillation.NONE) {
            return RationalPolynomial.of(a.negate(), Rational.ONE);
        }
        if (!t.frequencyTimesPi()) {
            throw new InputException("the frequency " + t.frequency() + " of a recurrence's forcing is not a rational "
                    + "multiple of π, so it has no annihilator over the rationals; not supported", "", -1);
        }
        RationalPolynomial phi = Cyclotomic.polynomial(Cyclotomic.orderOfPiMultiple(t.frequency()));
        // roots a·ζ: Φ_N(λ/a)·a^deg, coefficient j scaled by a^(deg - j)
        int d = phi.degree();
        Rational[] c = new Rational[d + 1];
        for (int j = 0; j <= d; j++) {
            c[j] = phi.coefficient(j).multiply(a.pow(d - j));
        }
        return RationalPolynomial.of(c);
    }
}
