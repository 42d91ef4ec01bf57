package dev.rootform.api;

import dev.rootform.export.document.ParametricReport;
import java.util.Objects;

/**
 * The outcome of {@link Rootform#solveWithParameters}: the cases, or why there are none. Expected
 * failures are values, never exceptions.
 *
 * @since 0.3
 */
public sealed interface ParametricResult permits ParametricResult.Solved, ParametricResult.NotSolved {

    /** The answer: cases, stability conditions, checks and the specialised answer; see {@link ParametricReport#verified()}. */
    record Solved(ParametricReport report) implements ParametricResult {
        public Solved {
            Objects.requireNonNull(report, "report");
        }
    }

    /**
     * No answer: bad input or out of scope ({@link Result.Refused}), the time limit
     * ({@link Result.OutOfTime}), or the specialised problem's own outcome without an answer
     * (contradictory or underdetermined conditions at the values of {@code at}).
     */
    record NotSolved(Result result) implements ParametricResult {
        public NotSolved {
            Objects.requireNonNull(result, "result");
            if (result.answer().isPresent()) {
                throw new IllegalArgumentException("result (" + result.getClass().getSimpleName() + ") carries an answer");
            }
        }
    }
}
