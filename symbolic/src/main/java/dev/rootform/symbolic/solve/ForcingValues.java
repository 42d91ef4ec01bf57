package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.InputException;

/**
 * Exact values of the right-hand side g of the normalised equation Σ a_j L^j y = g:
 * g(m) = f(m - shift) at integer m (difference), and the derivatives g^(j)(t0) (differential).
 * Values must be rational: cos(qπn) is rational only when it is 0, ±1/2 or ±1 (Niven's theorem:
 * I. Niven, Irrational Numbers, 1956, Corollary 3.12 — corollary number from memory); other values
 * and exponential or oscillating forcing with conditions away from t = 0 are out of exact scope.
 *
 * @since 0.1
 */
final class ForcingValues {
    /** cos(πr) for r = k/6, k = 0..11, where it is rational; null where it is not. */
    private static final Rational[] COS_PI_SIXTHS = {
        Rational.ONE, null, Rational.of(1, 2), Rational.ZERO, Rational.of(-1, 2), null,
        Rational.MINUS_ONE, null, Rational.of(-1, 2), Rational.ZERO, Rational.of(1, 2), null,
    };

    private ForcingValues() {
    }

    /** g(m) = f(m - shift) for a difference equation. */
    static Rational at(LinearEquation eq, long m) {
        Rational n = Rational.of(m - eq.shift());
        Rational sum = Rational.ZERO;
        for (ForcingTerm t : eq.forcing()) {
            Rational v = t.coefficient().multiply(n.pow(t.power())).multiply(t.exponential().pow(Math.toIntExact(n.toBigInteger().longValueExact())));
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                Rational turns = t.frequency().multiply(n);
                v = v.multiply(t.oscillation() == ForcingTerm.Oscillation.COS
                        ? cosPi(turns) : cosPi(Rational.of(1, 2).subtract(turns)));
            }
            sum = sum.add(v);
        }
        return sum;
    }

    /** g^(j)(t0) for a differential equation. */
    static Rational derivative(LinearEquation eq, Rational t0, int j) {
        Rational sum = Rational.ZERO;
        for (ForcingTerm t : eq.forcing()) {
            sum = sum.add(t.coefficient().multiply(t0.isZero() ? atZero(t, j) : polynomialAt(t, t0, j)));
        }
        return sum;
    }

    /**
     * The j-th derivative at 0 of t^p·e^{zt} is C(j,p)·p!·z^{j-p} (j &ge; p, else 0), z = c + iω;
     * cos takes the real part, sin the imaginary part.
     */
    private static Rational atZero(ForcingTerm t, int j) {
        int p = t.power();
        if (j < p) {
            return Rational.ZERO;
        }
        Rational w = t.oscillation() == ForcingTerm.Oscillation.NONE ? Rational.ZERO : t.frequency();
        Rational re = Rational.ONE;
        Rational im = Rational.ZERO;
        for (int i = 0; i < j - p; i++) {
            Rational r = re.multiply(t.exponential()).subtract(im.multiply(w));
            im = re.multiply(w).add(im.multiply(t.exponential()));
            re = r;
        }
        Rational scale = Rational.ONE;
        for (int i = 0; i < p; i++) {
            scale = scale.multiply(j - i);
        }
        return scale.multiply(t.oscillation() == ForcingTerm.Oscillation.SIN ? im : re);
    }

    /** d^j/dt^j of t^p at t0 ≠ 0; only plain polynomial forcing is exact there. */
    private static Rational polynomialAt(ForcingTerm t, Rational t0, int j) {
        if (t.oscillation() != ForcingTerm.Oscillation.NONE || !t.exponential().isZero()) {
            throw new InputException("with exponential or oscillating forcing, give the conditions at t = 0 "
                    + "(values at t0 ≠ 0 would need e^(c·t0), cos(ω·t0), which are not exact rationals)", "", -1);
        }
        int p = t.power();
        if (j > p) {
            return Rational.ZERO;
        }
        Rational falling = Rational.ONE;
        for (int i = 0; i < j; i++) {
            falling = falling.multiply(p - i);
        }
        return falling.multiply(t0.pow(p - j));
    }

    /** cos(πr) when rational. @throws InputException otherwise */
    private static Rational cosPi(Rational r) {
        Rational sixths = r.multiply(6);
        if (sixths.isInteger()) {
            int k = Math.floorMod(sixths.toBigInteger().intValue(), 12);
            if (COS_PI_SIXTHS[k] != null) {
                return COS_PI_SIXTHS[k];
            }
        }
        throw new InputException("the forcing takes the irrational value cos(" + r + "·π) at an integer index; "
                + "only frequencies whose cos/sin values are rational (multiples of π/3 and π/2) are solved exactly",
                "", -1);
    }
}
