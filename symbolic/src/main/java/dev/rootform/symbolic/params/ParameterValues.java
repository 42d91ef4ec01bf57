package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads rational values for every declared parameter from a text such as
 * {@code "m=2, c=0.4, k=8"} (integers, decimals, fractions; at most 40 characters and exponents up to
 * ±30 each).
 *
 * @since 0.3
 */
public final class ParameterValues {
    private static final int MAX_LENGTH = 40;
    private static final int MAX_EXPONENT = 30;

    private ParameterValues() {
    }

    /**
     * The values by parameter, in the order of {@code parameters}.
     *
     * @throws InputException for an item that is not name=number, an undeclared or repeated name, or a missing one
     */
    public static Map<String, Rational> parse(String text, List<String> parameters) {
        Map<String, Rational> values = new LinkedHashMap<>();
        int at = 0;
        for (String item : text.split(",", -1)) {
            int eq = item.indexOf('=');
            String name = eq < 0 ? item.strip() : item.substring(0, eq).strip();
            if (eq < 0 || !parameters.contains(name)) {
                throw new InputException(eq < 0 ? "'" + item.strip() + "': write name=value" : "'" + name + "' is not a declared parameter",
                        text, at + Math.max(0, item.indexOf(name)));
            }
            String number = item.substring(eq + 1).strip();
            Rational value;
            try {
                if (number.length() > MAX_LENGTH || exponent(number) > MAX_EXPONENT) {
                    throw new NumberFormatException();
                }
                value = Rational.parse(number);
            } catch (NumberFormatException | ArithmeticException e) {
                throw new InputException("'" + number + "' is not an exact number of at most " + MAX_LENGTH
                        + " characters (integer, decimal or fraction)", text, at + eq + 1);
            }
            if (values.put(name, value) != null) {
                throw new InputException("'" + name + "' is given twice", text, at);
            }
            at += item.length() + 1;
        }
        for (String p : parameters) {
            if (!values.containsKey(p)) {
                throw new InputException("no value for the parameter " + p, text, text.length());
            }
        }
        Map<String, Rational> ordered = new LinkedHashMap<>();
        parameters.forEach(p -> ordered.put(p, values.get(p)));
        return java.util.Collections.unmodifiableMap(ordered);
    }

    private static int exponent(String number) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("[eE][+-]?(\\d+)").matcher(number);
        return m.find() ? (m.group(1).length() > 3 ? Integer.MAX_VALUE : Integer.parseInt(m.group(1))) : 0;
    }
}
