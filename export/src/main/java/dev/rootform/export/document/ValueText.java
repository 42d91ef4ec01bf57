package dev.rootform.export.document;

import dev.rootform.export.notation.Numbers;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.Optional;

/**
 * A value at a point as shown to people: exact when it is known exactly and reads well (an integer,
 * a decimal that ends within the digits asked, a short fraction or surd), else a rounded decimal;
 * long fractions such as money balances read as decimals (JSON keeps the exact value).
 *
 * @since 0.3
 */
public final class ValueText {
    /** Exact integers longer than this are shown as rounded decimals. */
    private static final int EXACT_LIMIT = 60;
    /** Fractions (and each part of a surd) longer than this are shown as rounded decimals. */
    private static final int SHORT_FRACTION = 15;

    private ValueText() {
    }

    /**
     * {@code " = 55"} for an exact integer, {@code " = 80.15625"} for an exact value whose decimal ends
     * within {@code digits} significant digits, {@code " = 1/3"} for a short fraction or surd, else
     * the decimal {@code " ≈ 0.2231"}; a value whose digits were all asked for, with all of them.
     */
    public static String of(PointValue v, int digits) {
        if (v.allDigits().isPresent()) {
            return " = " + v.allDigits().get();
        }
        Optional<String> exact = v.exact().filter(q -> fitsShort(q, EXACT_LIMIT)).flatMap(q -> exactText(q, digits))
                .or(() -> v.exactSurd().filter(q -> fitsShort(q.rational(), SHORT_FRACTION) && fitsShort(q.coefficient(), SHORT_FRACTION))
                        .map(Object::toString).filter(t -> t.length() <= 2 * SHORT_FRACTION));
        return exact.map(t -> " = " + t).orElse(" ≈ " + Numbers.decimal(v.value(), digits));
    }

    /** An integer as it is, a terminating decimal within {@code digits} significant digits, or a short fraction. */
    private static Optional<String> exactText(Rational q, int digits) {
        if (q.isInteger()) {
            return Optional.of(q.toString());
        }
        try {
            BigDecimal d = new BigDecimal(q.numerator()).divide(new BigDecimal(q.denominator())).stripTrailingZeros();
            if (d.precision() <= digits) {
                return Optional.of(d.toPlainString());
            }
        } catch (ArithmeticException endless) {
            // a repeating decimal: only a short fraction is shown exactly
        }
        String fraction = q.toString();
        return fraction.length() <= SHORT_FRACTION ? Optional.of(fraction) : Optional.empty();
    }

    /** Whether the exact value may fit {@code limit} characters, judged without writing it out. */
    private static boolean fitsShort(Rational q, int limit) {
        return (q.numerator().bitLength() + q.denominator().bitLength()) * Math.log10(2) <= limit + 2;
    }
}
