package dev.rootform.symbolic.recover;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;

/** Writes a recurrence and its conditions in solve's input syntax ({@code x[n+2] = x[n+1] + 3/4 x[n]}). */
final class RecurrenceText {
    private RecurrenceText() {
    }

    /** x[n+L] = −Σ_{k&lt;L} a_k x[n+k] for monic χ = λ^L + Σ a_k λ^k; {@code = 0} when every a_k is 0. */
    static String equation(RationalPolynomial chi) {
        int order = chi.degree();
        StringBuilder right = new StringBuilder();
        for (int k = order - 1; k >= 0; k--) {
            Rational c = chi.coefficient(k).negate();
            if (c.isZero()) {
                continue;
            }
            if (right.length() > 0) {
                right.append(c.signum() < 0 ? " - " : " + ");
            } else if (c.signum() < 0) {
                right.append('-');
            }
            Rational size = c.abs();
            if (!size.isOne()) {
                right.append(size).append(size.isInteger() ? "" : " ");
            }
            right.append(term(k));
        }
        return term(order) + " = " + (right.length() == 0 ? "0" : right);
    }

    /** x[index] = value. */
    static String condition(int index, Rational value) {
        return "x[" + index + "] = " + value;
    }

    private static String term(int shift) {
        return shift == 0 ? "x[n]" : "x[n+" + shift + "]";
    }
}
