package dev.rootform.api;

import java.util.List;
import java.util.Objects;

/**
 * A claimed solution to check, with its problem and the options to check it with. Immutable.
 *
 * @param problem the equation, optionally followed by conditions separated by {@code ;}
 * @param given further conditions, one per string
 * @param claim the claimed closed form, e.g. {@code x[n] = 2^(n+1) - 1} or
 *     {@code y(t) = e^(-t)(cos(2t) + 1/2 sin(2t))}
 * @param options digits of the numeric parts, time limit, variable
 * @since 0.3
 */
public record CheckRequest(String problem, List<String> given, String claim, Options options) {
    /** @throws NullPointerException if an argument or a condition is null */
    public CheckRequest {
        Objects.requireNonNull(problem, "problem");
        given = List.copyOf(given);
        Objects.requireNonNull(claim, "claim");
        Objects.requireNonNull(options, "options");
    }

    /**
     * The problem as text with its conditions, and the claim, with the default options.
     *
     * @param problem the equation, optionally followed by conditions separated by {@code ;}
     * @param claim the claimed closed form
     * @return the request
     */
    public static CheckRequest of(String problem, String claim) {
        return new CheckRequest(problem, List.of(), claim, Options.defaults());
    }

    /**
     * This request with other options.
     *
     * @param options digits, time limit, variable
     * @return a new request
     */
    public CheckRequest with(Options options) {
        return new CheckRequest(problem, given, claim, options);
    }
}
