package dev.rootform.api;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * Reads comma-separated lists: the points of {@link Options#points()} (exact numbers such as
 * {@code 0}, {@code 1e3}, {@code 3/2}) and other lists of one item kind.
 */
final class Points {
    private Points() {
    }

    /**
     * @throws InputException naming the first item that is not a number, positioned in the
     *     comma-joined list
     */
    static List<Rational> parse(List<String> items) {
        return read(items, item -> {
            try {
                return Rational.parse(item);
            } catch (NumberFormatException | ArithmeticException e) {
                throw new InputException("point '" + item + "' is not a number", item, 0);
            }
        });
    }

    /**
     * Each trimmed item read by {@code reader}, which names a bad item by an {@link InputException}.
     *
     * @throws InputException with the reader's message, positioned in the comma-joined list
     */
    static <T> List<T> read(List<String> items, Function<String, T> reader) {
        String joined = String.join(",", items);
        List<T> values = new ArrayList<>();
        int start = 0;
        for (String item : items) {
            String trimmed = item.trim();
            try {
                values.add(reader.apply(trimmed));
            } catch (InputException e) {
                throw new InputException(e.getMessage(), joined, start + item.indexOf(trimmed.isEmpty() ? item : trimmed));
            }
            start += item.length() + 1;
        }
        return values;
    }
}
