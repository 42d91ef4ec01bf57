package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Decimal text for numbers that renderers show: values rounded to significant digits, and points
 * written as decimals when they terminate.
 *
 * @since 0.1
 */
public final class Numbers {
    /** Beyond this many digits before or after the point, a value is written with an exponent. */
    private static final int PLAIN_LIMIT = 20;

    private Numbers() {
    }

    /** x rounded to {@code digits} significant digits, without trailing zeros, e.g. {@code 0.2231}. */
    public static String decimal(BigDecimal x, int digits) {
        BigDecimal r = x.round(new MathContext(Math.max(1, digits))).stripTrailingZeros();
        if (r.signum() == 0) {
            return "0";
        }
        int magnitude = r.precision() - r.scale() - 1;
        return Math.abs(magnitude) <= PLAIN_LIMIT ? r.toPlainString() : r.toString();
    }

    /** A point as written: {@code 10}, {@code 1.5}, or {@code 1/3} when its decimal does not end. */
    public static String point(Rational at) {
        if (at.isInteger()) {
            return at.toString();
        }
        try {
            return new BigDecimal(at.numerator()).divide(new BigDecimal(at.denominator())).toPlainString();
        } catch (ArithmeticException endless) {
            return at.toString();
        }
    }
}
