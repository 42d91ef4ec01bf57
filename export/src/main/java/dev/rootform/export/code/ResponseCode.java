package dev.rootform.export.code;

import dev.rootform.export.Rendering;
import dev.rootform.export.document.ResponseNotation;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.export.notation.CommentText;
import dev.rootform.symbolic.response.Impulse;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The generated code of a response: the solve answer's Java or C for the solved problem, whose
 * opening comment also names the transfer function and the input and says what the evaluator
 * leaves out (the time before the input, impulses at t = 0).
 *
 * @since 0.3
 */
public final class ResponseCode {
    private ResponseCode() {
    }

    /** {@code code} (a rendering of {@code r.response()}) with the response lines at the top of its comments. */
    public static Rendering decorate(ResponseReport r, Rendering code) {
        List<String> lines = lines(r);
        return new Rendering(withLines(code.text(), lines), code.header().map(h -> withLines(h, lines)));
    }

    private static List<String> lines(ResponseReport r) {
        TransferFunction h = r.transfer();
        List<String> lines = new ArrayList<>();
        lines.add("Response of " + ResponseNotation.transfer(h) + " to the input "
                + r.plan().input().text() + " from zero initial state; the output is 0 before "
                + (h.continuous() ? "t = 0" : "n = 0") + ". Solved as: " + r.problem());
        if (h.continuous()) {
            lines.add("The evaluator gives y(t) for t > 0" + (r.plan().impulses().isEmpty() ? "."
                    : "; the impulses " + r.plan().impulses().stream().map(ResponseCode::impulse).collect(Collectors.joining(" + "))
                            + " at t = 0 are not part of it."));
        }
        return CommentText.wrap(lines);
    }

    private static String impulse(Impulse i) {
        return i.coefficient() + "*delta" + (i.order() == 0 ? "" : "^(" + i.order() + ")") + "(t)";
    }

    /** The code with the lines added at the top of its opening comment. */
    private static String withLines(String code, List<String> lines) {
        String opening = "/*\n";
        if (!code.startsWith(opening)) {
            throw new IllegalStateException("generated code does not open with a comment");
        }
        return opening + lines.stream().map(l -> " * " + l + "\n").collect(Collectors.joining()) + code.substring(opening.length());
    }
}
