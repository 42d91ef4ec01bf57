package dev.rootform.api;

import dev.rootform.export.document.SystemReport;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of one state-space request. Expected outcomes are values, never exceptions.
 *
 * @since 0.3
 */
public sealed interface SystemResult permits SystemResult.Analysed, SystemResult.CheckFailed, SystemResult.NoAnswer {

    /** The finished answer when there is one. */
    default Optional<SystemReport> answer() {
        return Optional.empty();
    }

    /** Analysed, and every exact and numeric check held. */
    record Analysed(SystemReport report) implements SystemResult {
        public Analysed {
            Objects.requireNonNull(report, "report");
        }

        @Override
        public Optional<SystemReport> answer() {
            return Optional.of(report);
        }
    }

    /** Analysed, but at least one check failed; the answer must not be trusted. */
    record CheckFailed(SystemReport report, List<String> failed) implements SystemResult {
        public CheckFailed {
            Objects.requireNonNull(report, "report");
            failed = List.copyOf(failed);
        }

        @Override
        public Optional<SystemReport> answer() {
            return Optional.of(report);
        }
    }

    /**
     * No answer: the request was refused ({@link Result.Refused}: bad matrices, shapes, input) or
     * ran out of time ({@link Result.OutOfTime}).
     */
    record NoAnswer(Result reason) implements SystemResult {
        public NoAnswer {
            Objects.requireNonNull(reason, "reason");
            if (reason.answer().isPresent()) {
                throw new IllegalArgumentException("a result with an answer is not a refusal: " + reason);
            }
        }
    }
}
