package dev.rootform.api;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads comma-separated lists: the points of {@link Options#points()} (exact numbers such as
 * {@code 0}, {@code 1e3}, {@code 3/2}) and other lists of one item kind.
 */
final class Points {
    private static final Pattern EXPONENT = Pattern.compile("[eE][+-]?(\\d+)");

    private Points() {
    }

    /**
     * @throws InputException naming the first item that is not a number, positioned in the
     *     comma-joined list
     */
    static List<Rational> parse(List<String> items) {
        return read(items, "point", item -> {
            try {
                return Rational.parse(item);
            } catch (NumberFormatException | ArithmeticException e) {
                throw new InputException("point '" + shown(item) + "' is not a number", item, 0);
            }
        });
    }

    /**
     * Each trimmed item read by {@code reader}, which names a bad item by an {@link InputException}.
     * Items too long or with too large a decimal exponent are refused before they are read.
     *
     * @param kind the name of an item in messages ({@code point}, {@code frequency})
     * @throws InputException with the reader's message, positioned in the comma-joined list
     */
    static <T> List<T> read(List<String> items, String kind, Function<String, T> reader) {
        String joined = String.join(",", items);
        List<T> values = new ArrayList<>();
        int start = 0;
        for (String item : items) {
            String trimmed = item.trim();
            int at = start + item.indexOf(trimmed.isEmpty() ? item : trimmed);
            if (outOfRange(trimmed)) {
                throw new InputException(kind + " '" + shown(trimmed) + "' is out of range: at most " + Limits.MAX_LITERAL_DIGITS
                        + " digits and decimal exponents up to " + Limits.MAX_DECIMAL_EXPONENT + " are accepted", joined, at);
            }
            try {
                values.add(reader.apply(trimmed));
            } catch (InputException e) {
                throw new InputException(e.getMessage(), joined, at);
            }
            start += item.length() + 1;
        }
        return values;
    }

    /** True for text too long to be a point, or with a decimal exponent beyond {@link Limits#MAX_DECIMAL_EXPONENT}. */
    private static boolean outOfRange(String text) {
        if (text.length() > 2 * Limits.MAX_LITERAL_DIGITS + 1) {
            return true;
        }
        Matcher m = EXPONENT.matcher(text);
        while (m.find()) {
            String digits = m.group(1).replaceFirst("^0+(?=.)", "");
            if (digits.length() > 9 || Integer.parseInt(digits) > Limits.MAX_DECIMAL_EXPONENT) {
                return true;
            }
        }
        return false;
    }

    /** The item as shown in a message, cut to 40 characters. */
    private static String shown(String text) {
        return text.length() <= 40 ? text : text.substring(0, 37) + "...";
    }
}
