package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.math.BigDecimal;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A number as written in rootform's input — {@code 3}, {@code 0.25}, {@code .5}, {@code 1e3},
 * {@code 2.5E-3} — read exactly ({@code 0.1} is 1/10), as the equation and claim readers do.
 *
 * @param text the characters as written
 * @param end the offset after the last character
 * @param value the exact value
 * @since 0.3
 */
public record NumberLiteral(String text, int end, Rational value) {
    private static final Pattern NUMBER = Pattern.compile("(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    /** Bound on the decimal exponent of a literal, which keeps exact values small. */
    private static final int MAX_SCALE = 1000;

    /** @throws NullPointerException if an argument is null */
    public NumberLiteral {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(value, "value");
    }

    /**
     * The number that starts at {@code position} in {@code source}, ending no later than {@code end}.
     *
     * @param what the kind of input, for the message ("number", "number in the claim")
     * @return the literal
     * @throws InputException if no number starts there or its exponent is beyond 1000
     */
    public static NumberLiteral read(String source, int position, int end, String what) {
        Matcher m = NUMBER.matcher(source).region(position, end);
        if (!m.lookingAt()) {
            throw new InputException("malformed " + what, source, position);
        }
        String text = m.group();
        BigDecimal decimal = new BigDecimal(text);
        if (Math.abs(decimal.scale()) > MAX_SCALE) {
            throw new InputException("number " + text + " is too large", source, position);
        }
        return new NumberLiteral(text, m.end(), Rational.of(decimal));
    }
}
