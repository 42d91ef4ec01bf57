package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.NumericSolution;
import dev.rootform.symbolic.closedform.ClosedForm;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of one request. Every expected outcome is a value of this sealed type, never an
 * exception: consumers dispatch with {@code instanceof} patterns. Immutable.
 *
 * <p>Three requests and what became of them: a population that triples each step, two values of
 * a sequence that no solution of its equation can take, and a typing slip:
 *
 * <pre>{@code
 * for (String problem : List.of("x[n+1] = 3x[n]; x[0] = 2", "x[n+2] = -x[n]; x[0] = 1; x[2] = 0", "y'' + (2y' = 0")) {
 *     Result result = Rootform.solve(SolveRequest.of(problem));
 *     String outcome;
 *     if (result instanceof Result.Solved solved) {
 *         outcome = "solved and verified, " + solved.report().solution().checks().size() + " exact checks";
 *     } else if (result instanceof Result.Contradictory contradictory) {
 *         outcome = "contradictory: " + contradictory.explanation();
 *     } else if (result instanceof Result.Refused refused) {
 *         outcome = "refused: " + refused.message() + " at position " + refused.position();
 *     } else {
 *         outcome = result.getClass().getSimpleName();
 *     }
 *     System.out.println(problem + "  ->  " + outcome);
 * }
 * }</pre>
 *
 * @since 0.2
 */
public sealed interface Result permits Result.Answered, Result.Contradictory, Result.Underdetermined, Result.Refused,
        Result.OutOfTime, Result.Numeric {

    /**
     * The finished answer when there is one.
     *
     * @return the report of {@link Solved}, {@link General} and {@link CheckFailed}; empty for the
     *     other outcomes
     */
    default Optional<Report> answer() {
        return Optional.empty();
    }

    /** An outcome that carries a finished answer: {@link Solved}, {@link General} or {@link CheckFailed}. */
    sealed interface Answered extends Result permits Solved, General, CheckFailed {
        /**
         * The finished answer.
         *
         * @return the report
         */
        Report report();

        @Override
        default Optional<Report> answer() {
            return Optional.of(report());
        }
    }

    /**
     * Solved with the conditions fitted, and every exact and numeric check held.
     *
     * @param report the verified answer
     */
    record Solved(Report report) implements Answered {
        /** @throws NullPointerException if the report is null */
        public Solved {
            Objects.requireNonNull(report, "report");
        }
    }

    /**
     * No conditions were given: the general solution with free constants C1..Ck, verified.
     *
     * @param report the verified general solution
     */
    record General(Report report) implements Answered {
        /** @throws NullPointerException if the report is null */
        public General {
            Objects.requireNonNull(report, "report");
        }
    }

    /**
     * Solved, but at least one check failed; the answer must not be trusted.
     *
     * @param report the answer with every check, passed or not
     * @param failed the names of the checks that failed
     */
    record CheckFailed(Report report, List<String> failed) implements Answered {
        /** @throws NullPointerException if the report, the list or a name is null */
        public CheckFailed {
            Objects.requireNonNull(report, "report");
            failed = List.copyOf(failed);
        }
    }

    /**
     * No solution meets the conditions.
     *
     * @param explanation the certificate: the relation every solution obeys and the conditions
     *     break, e.g. {@code every solution has x[0] + x[2] = 0, but the given values make it 1}
     */
    record Contradictory(String explanation) implements Result {
        /** @throws NullPointerException if the explanation is null */
        public Contradictory {
            Objects.requireNonNull(explanation, "explanation");
        }
    }

    /**
     * The conditions leave a solution free.
     *
     * @param explanation what is missing
     * @param freeSolution a nonzero solution that can be added without breaking a condition, when
     *     it is known exactly
     */
    record Underdetermined(String explanation, Optional<ClosedForm> freeSolution) implements Result {
        /** @throws NullPointerException if an argument is null */
        public Underdetermined {
            Objects.requireNonNull(explanation, "explanation");
            Objects.requireNonNull(freeSolution, "freeSolution");
        }
    }

    /**
     * Bad or out-of-scope input.
     *
     * @param message one line naming the problem
     * @param source the text that was being read, empty when the problem has no single place
     * @param position 0-based index into {@code source}, or -1
     */
    record Refused(String message, String source, int position) implements Result {
        /** @throws NullPointerException if the message or the source is null */
        public Refused {
            Objects.requireNonNull(message, "message");
            Objects.requireNonNull(source, "source");
        }
    }

    /**
     * The exact path did not finish within its share of the time limit, and the answer was
     * computed numerically instead: certified roots, constants and values to the requested digits,
     * checked by iteration or integration; not exact, and labelled so. {@link #answer()} is empty
     * (there is no exact report); the text and JSON documents render the solution.
     *
     * @param solution the numeric solution with its checks and the reason
     */
    record Numeric(NumericSolution solution) implements Result {
        /** @throws NullPointerException if the solution is null */
        public Numeric {
            Objects.requireNonNull(solution, "solution");
        }
    }

    /**
     * The time limit ran out before the answer was finished.
     *
     * @param limit the time limit of the request
     */
    record OutOfTime(Duration limit) implements Result {
        /** @throws NullPointerException if the limit is null */
        public OutOfTime {
            Objects.requireNonNull(limit, "limit");
        }
    }
}
