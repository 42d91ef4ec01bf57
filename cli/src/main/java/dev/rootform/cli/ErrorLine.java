package dev.rootform.cli;

import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.solve.ConditionsException;

/** Formats problems for stderr: one line naming the problem, then the input with a caret under the place. */
final class ErrorLine {
    private ErrorLine() {
    }

    static String describe(InputException e) {
        StringBuilder sb = new StringBuilder("rootform: ").append(e.getMessage());
        if (e instanceof ConditionsException c && c.freeSolution().isPresent()) {
            ClosedForm free = c.freeSolution().get();
            sb.append("; adding any multiple of ").append(Formulas.plain(free)).append(" keeps every condition");
        }
        if (e.position() >= 0 && e.source() != null && !e.source().isEmpty()) {
            int column = Math.min(e.position(), e.source().length());
            sb.append(" (at column ").append(column + 1).append(')').append(System.lineSeparator())
                    .append("  ").append(e.source()).append(System.lineSeparator())
                    .append("  ").append(" ".repeat(column)).append('^');
        }
        return sb.toString();
    }
}
