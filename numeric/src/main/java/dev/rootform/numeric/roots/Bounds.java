package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Rigorous one-sided bounds for non-negative quantities, computed with {@link BigDecimal} at
 * {@link #DIGITS} significant digits rounded toward +∞ ({@link #UP}) or toward 0 ({@link #DOWN}).
 * {@code BigDecimal} rounds the exact result of each operation in the requested direction, so
 * chaining UP (resp. DOWN) operations on non-negative operands yields upper (resp. lower) bounds.
 */
final class Bounds {
    /** Significant digits of bound computations; bounds only need to be tight to a few digits. */
    static final int DIGITS = 20;
    static final MathContext UP = new MathContext(DIGITS, RoundingMode.CEILING);
    static final MathContext DOWN = new MathContext(DIGITS, RoundingMode.FLOOR);
    private static final MathContext NEAREST = new MathContext(DIGITS, RoundingMode.HALF_EVEN);

    private Bounds() {
    }

    /** An upper bound of |r|. */
    static BigDecimal absUp(Rational r) {
        return r.abs().toBigDecimal(UP);
    }

    /** A lower bound of |r|. */
    static BigDecimal absDown(Rational r) {
        return r.abs().toBigDecimal(DOWN);
    }

    /** An upper bound of √x for x ≥ 0, checked exactly by squaring. */
    static BigDecimal sqrtUp(BigDecimal x) {
        BigDecimal s = x.sqrt(NEAREST);
        while (s.multiply(s).compareTo(x) < 0) {
            s = s.add(s.ulp());
        }
        return s;
    }

    /** A lower bound of √x for x ≥ 0, checked exactly by squaring. */
    static BigDecimal sqrtDown(BigDecimal x) {
        BigDecimal s = x.sqrt(NEAREST);
        while (s.multiply(s).compareTo(x) > 0) {
            s = s.subtract(s.ulp()).max(BigDecimal.ZERO);
        }
        return s;
    }

    /** An upper bound of sqrt(x² + y²). */
    static BigDecimal modulusUp(BigDecimal x, BigDecimal y) {
        return sqrtUp(x.multiply(x, UP).add(y.multiply(y, UP), UP));
    }

    /** A lower bound of sqrt(x² + y²). */
    static BigDecimal modulusDown(BigDecimal x, BigDecimal y) {
        return sqrtDown(x.multiply(x, DOWN).add(y.multiply(y, DOWN), DOWN));
    }

    /** log10(x) for x &gt; 0 to double accuracy, valid far outside the range of {@code double}. */
    static double log10(BigDecimal x) {
        BigDecimal r = x.round(new MathContext(17));
        return Math.log10(r.unscaledValue().doubleValue()) - r.scale();
    }
}
