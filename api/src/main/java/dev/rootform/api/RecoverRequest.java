package dev.rootform.api;

import java.util.List;
import java.util.Objects;

/**
 * Terms of a sequence to recover a recurrence from, and the options to solve it with. Immutable.
 *
 * @param terms exact numbers (integers, fractions, decimals) separated by commas, whitespace or
 *     line breaks, x[start] first
 * @param start the index of the first term
 * @param options digits, points, time limit, presentation of the solve answer
 * @since 0.2
 */
public record RecoverRequest(String terms, int start, Options options) {
    public RecoverRequest {
        Objects.requireNonNull(terms, "terms");
        Objects.requireNonNull(options, "options");
    }

    /** Terms as one text, e.g. {@code "0, 1, 1, 2, 3, 5, 8, 13, 21, 34"}, from index 0. */
    public static RecoverRequest of(String terms) {
        return new RecoverRequest(terms, 0, Options.defaults());
    }

    /**
     * Terms one per string, e.g. {@code List.of("1/2", "0.25")}, from index 0; a refusal is
     * positioned in the list joined with {@code ", "}.
     */
    public static RecoverRequest of(List<String> terms) {
        return of(String.join(", ", terms));
    }

    /** This request with the first term at index {@code start}. */
    public RecoverRequest startingAt(int start) {
        return new RecoverRequest(terms, start, options);
    }

    /** This request with other options. */
    public RecoverRequest with(Options options) {
        return new RecoverRequest(terms, start, options);
    }
}
