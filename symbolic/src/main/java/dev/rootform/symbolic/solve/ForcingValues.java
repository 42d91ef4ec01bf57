package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;

/**
 * Exact values of the right-hand side g of the normalised equation Σ a_j L^j y = g:
 * g(m) = f(m - shift) at integer m (difference), split into its rational part and its √r part when
 * cos(qπn) lies in a real quadratic field ({@link CosineTable}; by Niven's theorem — I. Niven,
 * Irrational Numbers, 1956, Corollary 3.12, number from memory — the rational values are only 0,
 * ±1/2, ±1), and the derivatives g^(j)(t0) (differential), rational for t0 = 0; exponential or
 * oscillating forcing with conditions away from t = 0 is out of exact scope.
 *
 * @since 0.1
 */
final class ForcingValues {
    private ForcingValues() {
    }

    /**
     * The r with every value of the forcing in Q(√r): 1 when all are rational, else 2, 3 or 5.
     *
     * @throws InputException if a cos/sin value lies in none of these fields, or two are mixed
     */
    static int radicand(LinearEquation eq) {
        int radicand = 1;
        for (ForcingTerm t : eq.forcing()) {
            if (t.oscillation() == ForcingTerm.Oscillation.NONE || !t.frequencyTimesPi()) {
                continue;
            }
            // one period of the angle qπn, reduced mod 2π, covers every value the term takes
            int period = 2 * t.frequency().denominator().intValueExact();
            for (int n = 0; n < period; n++) {
                int s = trig(t, Rational.of(n)).radicand();
                if (s != 1 && radicand != 1 && s != radicand) {
                    throw new InputException("the forcing mixes values in Q(√" + radicand + ") and Q(√" + s
                            + "); only one square root is supported", "", -1);
                }
                radicand = s == 1 ? radicand : s;
            }
        }
        return radicand;
    }

    /** One part of g(m) = f(m - shift) for a difference equation. */
    static Rational at(LinearEquation eq, long m, ForcingPart part) {
        Rational n = Rational.of(m - eq.shift());
        Rational sum = Rational.ZERO;
        for (ForcingTerm t : eq.forcing()) {
            Rational v = t.coefficient().multiply(n.pow(t.power()))
                    .multiply(t.exponential().pow(Math.toIntExact(n.toBigInteger().longValueExact())));
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                CosineTable.Value trig = trig(t, n);
                v = v.multiply(part == ForcingPart.RATIONAL ? trig.rational() : trig.radical());
            } else if (part == ForcingPart.RADICAL) {
                v = Rational.ZERO;
            }
            sum = sum.add(v);
        }
        return sum;
    }

    /** cos(qπn) or sin(qπn) = cos(π/2 - qπn). @throws InputException outside the supported fields */
    private static CosineTable.Value trig(ForcingTerm t, Rational n) {
        Rational turns = t.frequency().multiply(n);
        Rational angle = t.oscillation() == ForcingTerm.Oscillation.COS ? turns : Rational.of(1, 2).subtract(turns);
        return CosineTable.cosPi(angle).orElseThrow(() -> new InputException("the forcing takes the value cos("
                + angle + "·π) at an integer index, which lies in no quadratic field; cos and sin of multiples of "
                + "π/4 and π/6 per step, and cos of multiples of π/5, are solved exactly", "", -1));
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

}
