package dev.rootform.api;

import dev.rootform.export.document.ResponseReport;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of a response request; expected outcomes are values, never exceptions.
 *
 * <pre>{@code
 * ResponseResult r = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)").to("step"));
 * if (r instanceof ResponseResult.Answered a) {
 *     System.out.println(a.report().stepFigures());
 * } else if (r instanceof ResponseResult.Unanswered u && u.result() instanceof Result.Refused refused) {
 *     System.err.println(refused.message());
 * }
 * }</pre>
 *
 * @since 0.3
 */
public sealed interface ResponseResult permits ResponseResult.Answered, ResponseResult.CheckFailed, ResponseResult.Unanswered {

    /** The finished answer when there is one. */
    default Optional<ResponseReport> answer() {
        return Optional.empty();
    }

    /** Answered, and every exact and numeric check held. */
    record Answered(ResponseReport report) implements ResponseResult {
        public Answered {
            Objects.requireNonNull(report, "report");
        }

        @Override
        public Optional<ResponseReport> answer() {
            return Optional.of(report);
        }
    }

    /** Answered, but at least one check failed; the answer must not be trusted. */
    record CheckFailed(ResponseReport report, List<String> failed) implements ResponseResult {
        public CheckFailed {
            Objects.requireNonNull(report, "report");
            failed = List.copyOf(failed);
        }

        @Override
        public Optional<ResponseReport> answer() {
            return Optional.of(report);
        }
    }

    /**
     * No answer: the input was refused ({@link Result.Refused}, with the position) or the time
     * limit ran out ({@link Result.OutOfTime}).
     */
    record Unanswered(Result result) implements ResponseResult {
        public Unanswered {
            Objects.requireNonNull(result, "result");
            if (result.answer().isPresent()) {
                throw new IllegalArgumentException("an unanswered response wraps a result without an answer: " + result);
            }
        }
    }
}
