package dev.rootform.api;

import dev.rootform.symbolic.model.Problem;
import java.util.List;
import java.util.Objects;

/**
 * One problem to solve and the options to solve it with. Immutable.
 *
 * <p>An oscillator started at 1 with speed 2, its conditions given one per string, and its
 * position at t = 1 (cos 2 + sin 2):
 *
 * <pre>{@code
 * SolveRequest request = SolveRequest.of("y'' + 4y = 0", List.of("y(0) = 1", "y'(0) = 2"))
 *         .with(Options.builder().points("1").digits(15).build());
 * Rootform.solve(request).answer()
 *         .ifPresent(report -> System.out.println("y(1) = " + report.values().get(0).value()));
 * }</pre>
 *
 * @param input the problem, as text or as a model built in code
 * @param options digits, points, time limit, presentation
 * @since 0.2
 */
public record SolveRequest(Input input, Options options) {
    /** @throws NullPointerException if an argument is null */
    public SolveRequest {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(options, "options");
    }

    /**
     * The problem as text, with the default options.
     *
     * @param problem the equation, then conditions separated by {@code ;}
     * @return the request
     */
    public static SolveRequest of(String problem) {
        return new SolveRequest(new Input.Text(problem, List.of()), Options.defaults());
    }

    /**
     * The problem as text with further conditions, with the default options.
     *
     * @param problem the equation, optionally followed by conditions separated by {@code ;}
     * @param given further conditions, one per string ({@code "y(0) = 1"})
     * @return the request
     */
    public static SolveRequest of(String problem, List<String> given) {
        return new SolveRequest(new Input.Text(problem, given), Options.defaults());
    }

    /**
     * A problem built in code, with the default options.
     *
     * @param problem an equation with its conditions
     * @return the request
     */
    public static SolveRequest of(Problem problem) {
        return new SolveRequest(new Input.Model(problem), Options.defaults());
    }

    /**
     * This request with other options.
     *
     * @param options the options to use instead
     * @return a new request; this one is unchanged
     */
    public SolveRequest with(Options options) {
        return new SolveRequest(input, options);
    }

    /** Where the problem comes from: text to read, or a model built in code. */
    public sealed interface Input permits Input.Text, Input.Model {
        /**
         * The problem as text, read when the request is solved.
         *
         * @param problem equation and optional conditions separated by {@code ;}
         * @param given further conditions, one per string
         */
        record Text(String problem, List<String> given) implements Input {
            /** @throws NullPointerException if an argument or a condition is null */
            public Text {
                Objects.requireNonNull(problem, "problem");
                given = List.copyOf(given);
            }
        }

        /**
         * A problem built in code.
         *
         * @param problem an equation with its conditions
         */
        record Model(Problem problem) implements Input {
            /** @throws NullPointerException if the problem is null */
            public Model {
                Objects.requireNonNull(problem, "problem");
            }
        }
    }
}
