package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.FormulaWriter;
import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.LatexNotation;
import dev.rootform.export.notation.Numbers;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The answer as a displayable LaTeX math fragment: {@code %} comment lines (equation, conditions,
 * validity, caution), then one {@code aligned} environment with the equation, the conditions, the
 * characteristic polynomial, the real closed form with exact constants and where it holds. It is
 * meant for a display environment ({@code \[ … \]}, {@code $$ … $$} or {@code equation*}); it needs
 * {@code amsmath} and {@code amssymb}.
 *
 * @since 0.2
 */
public final class LatexRenderer {
    private LatexRenderer() {
    }

    /** The fragment, ending in a newline. */
    public static String render(Report r) {
        Solution s = r.solution();
        LinearEquation eq = s.problem().equation();
        ClosedForm f = s.closedForm();
        StringBuilder out = new StringBuilder();
        CommentText.lines(s).forEach(l -> out.append("% ").append(l).append('\n'));
        List<String> rows = new ArrayList<>();
        rows.add(row("equation", math(EquationText.equation(eq))));
        if (!s.problem().conditions().isEmpty()) {
            rows.add(row("conditions", s.problem().conditions().stream().map(c -> math(EquationText.condition(eq, c)))
                    .collect(Collectors.joining(",\\; "))));
        }
        FormulaWriter writer = new FormulaWriter(LatexNotation.INSTANCE, f);
        rows.add(row("characteristic", writer.polynomial(s.characteristic(), LatexNotation.INSTANCE.lambda()) + " = 0"));
        rows.add(row("solution", math(EquationText.unknownAt(f, f.variable())) + " = " + Formulas.latex(f)));
        if (!r.analysis().constantValues().isEmpty()) {
            List<String> constants = new ArrayList<>();
            r.analysis().constantValues().forEach((name, value) -> constants.add(
                    LatexNotation.INSTANCE.constant(name) + " \\approx " + Numbers.decimal(value, r.digits())));
            rows.add(row("constants", String.join(",\\; ", constants)));
        }
        rows.add(row("valid for", validity(f)));
        return out.append("\\begin{aligned}\n").append(String.join(" \\\\\n", rows)).append("\n\\end{aligned}\n").toString();
    }

    private static String row(String label, String body) {
        return "&\\text{" + label + ":} && " + body;
    }

    private static String validity(ClosedForm f) {
        if (f.domain() == Domain.DIFFERENTIAL) {
            return f.variable() + " \\in \\mathbb{R}";
        }
        StringBuilder sb = new StringBuilder(f.variable() + " \\geq " + f.validFrom());
        long first = f.origin().toBigInteger().longValueExact();
        for (int i = 0; i < f.leadingValues().size(); i++) {
            sb.append(",\\; ").append(math(EquationText.unknownAt(f, Long.toString(first + i)) + " = " + f.leadingValues().get(i)));
        }
        return sb.toString();
    }

    /** Plain equation text in LaTeX math: {@code ·} as \cdot, {@code y^(4)} as y^{(4)}, other powers braced. */
    static String math(String plain) {
        return plain.replace("·", " \\cdot ").replace("π", "\\pi ").replace("λ", "\\lambda ").replace("√", "\\sqrt ")
                .replaceAll("\\^\\((\\d+)\\)", "^{($1)}").replaceAll("\\^\\(([^()]*)\\)", "^{$1}");
    }
}
