package dev.rootform.cli;

import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.symbolic.model.InputException;
import java.io.PrintWriter;

/** Formats problems for stderr: one line naming the problem, then the input with a caret under the place. */
final class ErrorLine {
    /** Characters of a long input line shown on each side of the caret. */
    private static final int WINDOW = 60;

    private ErrorLine() {
    }

    /** Prints {@code line} to {@code err}, flushed, and returns {@code exitCode}. */
    static int print(PrintWriter err, String line, int exitCode) {
        err.println(line);
        err.flush();
        return exitCode;
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

    /**
     * The message, and when it has a place, the input line with a caret under it: a source of
     * several lines (a file) is cut to the line of the place, which is then named.
     */
    private static String describe(String message, String source, int position) {
        StringBuilder sb = new StringBuilder("rootform: ").append(message);
        if (position >= 0 && source != null && !source.isEmpty()) {
            int at = Math.min(position, source.length());
            int from = source.lastIndexOf('\n', at - 1) + 1;
            int to = source.indexOf('\n', at);
            String line = source.substring(from, to < 0 ? source.length() : to);
            int column = at - from;
            boolean several = from > 0 || to >= 0;
            sb.append(several ? " (at line " + (source.substring(0, from).chars().filter(c -> c == '\n').count() + 1) + ", column "
                    : " (at column ").append(column + 1).append(')').append(System.lineSeparator());
            int left = Math.max(0, column - WINDOW);
            int right = Math.min(line.length(), column + WINDOW);
            String shown = (left > 0 ? "..." : "") + line.substring(left, right) + (right < line.length() ? "..." : "");
            sb.append("  ").append(shown).append(System.lineSeparator())
                    .append("  ").append(" ".repeat(column - left + (left > 0 ? 3 : 0))).append('^');
        }
        return sb.toString();
    }
}
