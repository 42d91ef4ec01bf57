package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.symbolic.closedform.ClosedForm;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of one request. Every expected outcome is a value of this sealed type, never an
 * exception: consumers dispatch with {@code instanceof} patterns.
 *
 * <pre>{@code
 * Result r = Rootform.solve(SolveRequest.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1"));
 * if (r instanceof Result.Solved s) {
 *     System.out.println(s.report().solution().closedForm());
 * }
 * }</pre>
 *
 * @since 0.2
 */
public sealed interface Result permits Result.Solved, Result.General, Result.CheckFailed, Result.Contradictory,
        Result.Underdetermined, Result.Refused, Result.OutOfTime {

    /** The finished answer when there is one (solved, general, or a check failed). */
    default Optional<Report> answer() {
        return Optional.empty();
    }

    /** Solved with the conditions fitted, and every exact and numeric check held. */
    record Solved(Report report) implements Result {
        public Solved {
            Objects.requireNonNull(report, "report");
        }

        @Override
        public Optional<Report> answer() {
            return Optional.of(report);
        }
    }

    /** No conditions were given: the general solution with free constants C1..Ck, verified. */
    record General(Report report) implements Result {
        public General {
            Objects.requireNonNull(report, "report");
        }

        @Override
        public Optional<Report> answer() {
            return Optional.of(report);
        }
    }

    /** Solved, but at least one check failed; the answer must not be trusted. */
    record CheckFailed(Report report, List<String> failed) implements Result {
        public CheckFailed {
            Objects.requireNonNull(report, "report");
            failed = List.copyOf(failed);
        }

        @Override
        public Optional<Report> answer() {
            return Optional.of(report);
        }
    }

    /** No solution meets the conditions; {@code explanation} states the relation every solution obeys. */
    record Contradictory(String explanation) implements Result {
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
        public Refused {
            Objects.requireNonNull(message, "message");
            Objects.requireNonNull(source, "source");
        }
    }

    /** The time limit ran out; the work was stopped. */
    record OutOfTime(Duration limit) implements Result {
        public OutOfTime {
            Objects.requireNonNull(limit, "limit");
        }
    }
}
