package dev.rootform.export.document;

import dev.rootform.export.notation.Numbers;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;

/**
 * A value at a point as shown to people: exact when it is known exactly and short, else a rounded
 * decimal.
 *
 * @since 0.3
 */
public final class ValueText {
    /** Exact values longer than this are shown as rounded decimals. */
    private static final int EXACT_LIMIT = 60;

    private ValueText() {
    }

    /** {@code " = 55"} when the exact value is known and short, else {@code " ≈ 0.2231"}. */
    public static String of(PointValue v, int digits) {
        String exact = v.exact().filter(ValueText::fitsShort).map(Rational::toString)
                .or(() -> v.exactSurd().filter(q -> fitsShort(q.rational()) && fitsShort(q.coefficient())).map(Object::toString))
                .orElse("");
        return !exact.isEmpty() && exact.length() <= EXACT_LIMIT ? " = " + exact : " ≈ " + Numbers.decimal(v.value(), digits);
    }

    /** Whether the exact value may fit {@link #EXACT_LIMIT} characters, judged without writing it out. */
    private static boolean fitsShort(Rational q) {
        return (q.numerator().bitLength() + q.denominator().bitLength()) * Math.log10(2) <= EXACT_LIMIT + 2;
    }
}
