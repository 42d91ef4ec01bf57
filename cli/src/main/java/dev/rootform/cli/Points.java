package dev.rootform.cli;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;

/** Reads the {@code --values-at} list: comma-separated exact numbers such as {@code 0,10,1e3,3/2}. */
final class Points {
    private Points() {
    }

    static List<Rational> parse(String list) {
        List<Rational> points = new ArrayList<>();
        if (list == null) {
            return points;
        }
        int start = 0;
        for (String item : list.split(",", -1)) {
            String trimmed = item.trim();
            try {
                points.add(Rational.parse(trimmed));
            } catch (NumberFormatException | ArithmeticException e) {
                throw new InputException("--values-at: '" + trimmed + "' is not a number", list,
                        start + item.indexOf(trimmed.isEmpty() ? item : trimmed));
            }
            start += item.length() + 1;
        }
        return points;
    }
}
