package dev.rootform.api;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;

/** Reads the points of {@link Options#points()}: exact numbers such as {@code 0}, {@code 1e3}, {@code 3/2}. */
final class Points {
    private Points() {
    }

    /**
     * @throws InputException naming the first item that is not a number, positioned in the
     *     comma-joined list
     */
    static List<Rational> parse(List<String> items) {
        String joined = String.join(",", items);
        List<Rational> points = new ArrayList<>();
        int start = 0;
        for (String item : items) {
            String trimmed = item.trim();
            try {
                points.add(Rational.parse(trimmed));
            } catch (NumberFormatException | ArithmeticException e) {
                throw new InputException("point '" + trimmed + "' is not a number", joined,
                        start + item.indexOf(trimmed.isEmpty() ? item : trimmed));
            }
            start += item.length() + 1;
        }
        return points;
    }
}
