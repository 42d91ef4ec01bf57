package dev.rootform.cli;

import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.symbolic.model.InputException;

/** Formats problems for stderr: one line naming the problem, then the input with a caret under the place. */
final class ErrorLine {
    private ErrorLine() {
    }

    /** The error line of a result that carries no answer. */
    static String describe(Result result) {
        if (result instanceof Result.Refused r) {
            return describe(r.message(), r.source(), r.position());
        }
        return "rootform: " + ResultText.explain(result);
    }

    static String describe(InputException e) {
        return describe(e.getMessage(), e.source(), e.position());
    }

    private static String describe(String message, String source, int position) {
        StringBuilder sb = new StringBuilder("rootform: ").append(message);
        if (position >= 0 && source != null && !source.isEmpty()) {
            int column = Math.min(position, source.length());
            sb.append(" (at column ").append(column + 1).append(')').append(System.lineSeparator())
                    .append("  ").append(source).append(System.lineSeparator())
                    .append("  ").append(" ".repeat(column)).append('^');
        }
        return sb.toString();
    }
}
