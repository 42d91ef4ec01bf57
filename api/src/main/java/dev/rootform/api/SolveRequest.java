package dev.rootform.api;

import dev.rootform.symbolic.model.Problem;
import java.util.List;
import java.util.Objects;

/**
 * One problem to solve and the options to solve it with. Immutable.
 *
 * @param input the problem, as text or as a model built in code
 * @param options digits, points, time limit, presentation
 * @since 0.2
 */
public record SolveRequest(Input input, Options options) {
    public SolveRequest {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(options, "options");
    }

    /** The problem as text: the equation, then conditions separated by {@code ;}. */
    public static SolveRequest of(String problem) {
        return new SolveRequest(new Input.Text(problem, List.of()), Options.defaults());
    }

    /** The problem as text with further conditions, one per string ({@code "y(0) = 1"}). */
    public static SolveRequest of(String problem, List<String> given) {
        return new SolveRequest(new Input.Text(problem, given), Options.defaults());
    }

    /** A problem built in code. */
    public static SolveRequest of(Problem problem) {
        return new SolveRequest(new Input.Model(problem), Options.defaults());
    }

    /** This request with other options. */
    public SolveRequest with(Options options) {
        return new SolveRequest(input, options);
    }

    /** Where the problem comes from. */
    public sealed interface Input permits Input.Text, Input.Model {
        /**
         * @param problem equation and optional conditions separated by {@code ;}
         * @param given further conditions, one per string
         */
        record Text(String problem, List<String> given) implements Input {
            public Text {
                Objects.requireNonNull(problem, "problem");
                given = List.copyOf(given);
            }
        }

        /** @param problem an equation with its conditions, built in code */
        record Model(Problem problem) implements Input {
            public Model {
                Objects.requireNonNull(problem, "problem");
            }
        }
    }
}
