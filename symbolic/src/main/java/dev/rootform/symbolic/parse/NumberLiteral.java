package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
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

    /** @throws NullPointerException if an argument is null */
    public NumberLiteral {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(value, "value");
    }

    /**
     * The number that starts at {@code position} in {@code source}, ending no later than {@code end}:
     * within {@link Limits#MAX_LITERAL_DIGITS} digits and a decimal exponent within
     * {@link Limits#MAX_DECIMAL_EXPONENT}; a literal run on by a second point or digits
     * ({@code 1.5.2}) is malformed, never two numbers.
     *
     * @param what the kind of input, for the message ("number", "number in the claim")
     * @return the literal
     * @throws InputException if no number starts there, it is run on, or it is beyond the limits
     */
    public static NumberLiteral read(String source, int position, int end, String what) {
        Matcher m = NUMBER.matcher(source).region(position, end);
        if (!m.lookingAt()) {
            throw new InputException("malformed " + what, source, position);
        }
        String text = m.group();
        if (m.end() < end && (source.charAt(m.end()) == '.' || Character.isDigit(source.charAt(m.end())))) {
            int stop = m.end();
            while (stop < end && (source.charAt(stop) == '.' || Character.isDigit(source.charAt(stop)))) {
                stop++;
            }
            throw new InputException("malformed " + what + " '" + Lexer.shorten(source.substring(position, stop)) + "'", source,
                    position);
        }
        long digits = m.group(1).chars().filter(Character::isDigit).count();
        if (digits > Limits.MAX_LITERAL_DIGITS) {
            throw new InputException(what + " with " + digits + " digits: at most " + Limits.MAX_LITERAL_DIGITS
                    + " digits are accepted", source, position);
        }
        String exponent = m.group(2) == null ? "0" : m.group(2).substring(1).replace("+", "").replace("-", "");
        BigDecimal decimal = exponent.length() > 9 ? null : new BigDecimal(text);
        if (decimal == null || Math.abs(decimal.scale()) > Limits.MAX_DECIMAL_EXPONENT) {
            throw new InputException(what + " " + Lexer.shorten(text) + " is out of range: decimal exponents up to "
                    + Limits.MAX_DECIMAL_EXPONENT + " are accepted", source, position);
        }
        return new NumberLiteral(text, m.end(), Rational.of(decimal));
    }
}
