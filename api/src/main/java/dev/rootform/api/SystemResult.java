package dev.rootform.api;

import dev.rootform.export.document.SystemReport;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of one state-space request. Expected outcomes are values, never exceptions:
 * consumers dispatch with {@code instanceof} patterns. Immutable.
 *
 * <pre>{@code
 * SystemResult r = Rootform.system(SystemRequest.discrete("[[1,1],[1,0]]"));
 * if (r instanceof SystemResult.Analysed a) {
 *     System.out.println("A^20 = " + a.report().transition().exact().get(0).get(1).valueAt(20) + " (top right)");
 * }
 * }</pre>
 *
 * @since 0.3
 */
public sealed interface SystemResult permits SystemResult.Answered, SystemResult.NoAnswer {

    /**
     * The finished answer when there is one.
     *
     * @return the report of {@link Analysed} and {@link CheckFailed}; empty for {@link NoAnswer}
     */
    default Optional<SystemReport> answer() {
        return Optional.empty();
    }

    /** An outcome that carries a finished answer: {@link Analysed} or {@link CheckFailed}. */
    sealed interface Answered extends SystemResult permits Analysed, CheckFailed {
        /**
         * The finished answer.
         *
         * @return the report
         */
        SystemReport report();

        @Override
        default Optional<SystemReport> answer() {
            return Optional.of(report());
        }
    }

    /**
     * Analysed, and every exact and numeric check held.
     *
     * @param report the verified answer
     */
    record Analysed(SystemReport report) implements Answered {
        /** @throws NullPointerException if the report is null */
        public Analysed {
            Objects.requireNonNull(report, "report");
        }
    }

    /**
     * Analysed, but at least one check failed; the answer must not be trusted.
     *
     * @param report the answer
     * @param failed the names of the failed checks
     */
    record CheckFailed(SystemReport report, List<String> failed) implements Answered {
        /** @throws NullPointerException if the report is null */
        public CheckFailed {
            Objects.requireNonNull(report, "report");
            failed = List.copyOf(failed);
        }
    }

    /**
     * No answer: the request was refused ({@link Result.Refused}: bad matrices, shapes, input) or
     * ran out of time ({@link Result.OutOfTime}).
     *
     * @param reason the outcome of the request, one without an answer
     */
    record NoAnswer(Result reason) implements SystemResult {
        /** @throws IllegalArgumentException if the reason carries an answer */
        public NoAnswer {
            Objects.requireNonNull(reason, "reason");
            if (reason instanceof Result.Answered) {
                throw new IllegalArgumentException("a result with an answer is not a refusal: " + reason);
            }
        }
    }
}
