package dev.rootform.api;

import dev.rootform.export.notation.Formulas;
import java.math.BigDecimal;

/**
 * One line of plain text that says why a {@link Result} carries no answer, for logs, batch error
 * objects and build failures. The command line shows a refusal with a caret under the place
 * instead; this line names the column.
 *
 * @since 0.2
 */
public final class ResultText {
    private ResultText() {
    }

    /**
     * Why there is no answer: the refusal with its column and input, the relation that makes the
     * conditions contradictory, the solution they leave free, or the time limit that ran out; for
     * an answer whose checks failed (which a claim check cannot use), the checks that failed.
     *
     * @throws IllegalArgumentException if the result is {@link Result.Solved} or {@link Result.General}
     */
    public static String explain(Result result) {
        if (result instanceof Result.Refused r) {
            return refusal(r.message(), r.source(), r.position());
        }
        if (result instanceof Result.Contradictory c) {
            return c.explanation();
        }
        if (result instanceof Result.Underdetermined u) {
            return u.explanation() + u.freeSolution()
                    .map(f -> "; adding any multiple of " + Formulas.plain(f) + " keeps every condition").orElse("");
        }
        if (result instanceof Result.Numeric n) {
            return "only a numeric answer: " + n.solution().reason();
        }
        if (result instanceof Result.CheckFailed f) {
            return "the solver's own answer failed its checks (" + String.join(", ", f.failed()) + ")";
        }
        if (result instanceof Result.OutOfTime t) {
            String seconds = BigDecimal.valueOf(t.limit().toMillis(), 3).stripTrailingZeros().toPlainString();
            return "gave up after " + seconds + " s (raise the time limit to allow more)";
        }
        throw new IllegalArgumentException("the result carries an answer: " + result.getClass().getSimpleName());
    }

    /** {@code message}, followed by the 1-based column and the input when there is a place. */
    public static String refusal(String message, String source, int position) {
        if (position < 0 || source == null || source.isEmpty()) {
            return message;
        }
        int column = Math.min(position, source.length()) + 1;
        return message + " (at column " + column + " of \"" + source + "\")";
    }
}
