package dev.rootform.symbolic.recover;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the terms of a sequence from text: exact numbers (integers {@code -3}, fractions
 * {@code 3/4}, decimals {@code 0.25} or {@code 1e3}, each the exact rational it denotes) separated
 * by commas, whitespace or line breaks. One comma may stand between two terms and one after the
 * last; a term left out between two commas is an error.
 *
 * @since 0.2
 */
public final class TermsReader {
    private TermsReader() {
    }

    /**
     * The terms in {@code text}, in order.
     *
     * @throws InputException naming the first item that is not an exact number, a missing term, or
     *     text with no term, positioned in {@code text}
     */
    public static List<Rational> read(String text) {
        List<Rational> terms = new ArrayList<>();
        int i = 0;
        int commas = 1;
        int lastComma = -1;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (c == ',') {
                if (++commas > 1) {
                    throw new InputException("a term is missing before this comma", text, i);
                }
                lastComma = i;
                i++;
            } else if (Character.isWhitespace(c)) {
                i++;
            } else {
                int end = i;
                while (end < text.length() && text.charAt(end) != ',' && !Character.isWhitespace(text.charAt(end))) {
                    end++;
                }
                terms.add(term(text, i, end));
                commas = 0;
                i = end;
            }
        }
        if (terms.isEmpty()) {
            throw new InputException("no terms given", text, lastComma);
        }
        return List.copyOf(terms);
    }

    private static Rational term(String text, int from, int to) {
        String item = text.substring(from, to);
        try {
            return Rational.parse(item);
        } catch (NumberFormatException e) {
            throw new InputException("'" + item + "' is not an exact number (integer, fraction or decimal)", text, from);
        } catch (ArithmeticException e) {
            throw new InputException("'" + item + "' divides by zero", text, from + item.indexOf('/') + 1);
        }
    }
}
