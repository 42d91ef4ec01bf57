package dev.rootform.numeric.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.Objects;

/**
 * An angular frequency ω, exact: a rational number, or a rational multiple of π
 * ({@code pi/4}, {@code 0.5pi}, {@code 3pi/4}) as usual for rad/sample.
 *
 * @param value q
 * @param timesPi whether ω = q·π rather than q
 * @param text as the user wrote it, trimmed
 * @since 0.3
 */
public record Frequency(Rational value, boolean timesPi, String text) {
    public Frequency {
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(text, "text");
    }

    /**
     * Reads {@code 2}, {@code 0.5}, {@code 3/2}, {@code 1e3}, {@code pi}, {@code pi/4}, {@code 0.25pi},
     * {@code 3pi/4}, {@code 3*pi/4}.
     *
     * @throws InputException naming the text when it is none of these
     */
    public static Frequency parse(String text) {
        String t = text.strip().replace(" ", "").replace("*", "");
        try {
            int pi = t.indexOf("pi");
            if (pi < 0) {
                return new Frequency(Rational.parse(t), false, text.strip());
            }
            String before = t.substring(0, pi);
            String after = t.substring(pi + 2);
            Rational factor = before.isEmpty() ? Rational.ONE : before.equals("-") ? Rational.MINUS_ONE : Rational.parse(before);
            Rational divisor = after.isEmpty() ? Rational.ONE : after.startsWith("/") ? Rational.parse(after.substring(1)) : null;
            if (divisor == null || divisor.isZero()) {
                throw new NumberFormatException(after);
            }
            return new Frequency(factor.divide(divisor), true, text.strip());
        } catch (NumberFormatException | ArithmeticException e) {
            throw new InputException("frequency '" + text.strip() + "' is not a number or a rational multiple of pi", text, 0);
        }
    }
}
