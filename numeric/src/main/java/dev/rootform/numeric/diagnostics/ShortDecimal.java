package dev.rootform.numeric.diagnostics;

import java.math.BigDecimal;
import java.math.MathContext;

/** Short decimal text for approximate (double-precision) diagnostic numbers, e.g. {@code 1.618034}. */
final class ShortDecimal {
    /** Significant digits shown for approximate diagnostic numbers. */
    static final int DIGITS = 7;
    /** Beyond this decimal exponent, numbers are written with an exponent. */
    private static final int PLAIN_LIMIT = 9;

    private ShortDecimal() {
    }

    /** x to {@link #DIGITS} significant digits without trailing zeros, e.g. {@code 1.618034}. */
    static String text(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        BigDecimal r = new BigDecimal(x).round(new MathContext(DIGITS)).stripTrailingZeros();
        int magnitude = r.precision() - r.scale() - 1;
        return r.signum() == 0 ? "0" : Math.abs(magnitude) <= PLAIN_LIMIT ? r.toPlainString() : r.toString();
    }
}
