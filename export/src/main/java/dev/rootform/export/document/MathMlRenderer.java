package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.FormulaWriter;
import dev.rootform.export.notation.MathMlNotation;
import dev.rootform.export.notation.Xml;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The answer as one presentation-MathML element ({@code <math xmlns=… display="block">}) preceded
 * by an XML comment (equation, conditions, validity, caution): a table whose rows are the equation
 * and conditions (as text), the closed form (as MathML over the same formula walk as the other
 * notations) and where it holds. Well-formed XML; no XML declaration, so it can be pasted into HTML.
 *
 * @since 0.2
 */
public final class MathMlRenderer {
    /** The MathML namespace. */
    public static final String NAMESPACE = "http://www.w3.org/1998/Math/MathML";

    private MathMlRenderer() {
    }

    /** The comment and the math element, ending in a newline. */
    public static String render(Report r) {
        Solution s = r.solution();
        LinearEquation eq = s.problem().equation();
        ClosedForm f = s.closedForm();
        StringBuilder out = new StringBuilder("<!--\n");
        CommentText.lines(s).forEach(l -> out.append("  ").append(l).append('\n'));
        out.append("-->\n<math xmlns=\"").append(NAMESPACE).append("\" display=\"block\">\n<mtable>\n");
        List<String> rows = new ArrayList<>();
        rows.add(text("equation: " + EquationText.equation(eq)));
        if (!s.problem().conditions().isEmpty()) {
            rows.add(text("conditions: " + s.problem().conditions().stream().map(c -> EquationText.condition(eq, c))
                    .collect(Collectors.joining(", "))));
        }
        MathMlNotation n = MathMlNotation.INSTANCE;
        String unknown = n.name(f.function()) + (f.domain() == dev.rootform.symbolic.model.Domain.DIFFERENTIAL
                ? n.parens(n.name(f.variable())) : "<mo>[</mo>" + n.name(f.variable()) + "<mo>]</mo>");
        rows.add("<mrow>" + unknown + "<mo>=</mo>" + new FormulaWriter(n, f).formula() + "</mrow>");
        rows.add(text("valid for " + CommentText.range(f).replace(">=", "≥")));
        rows.forEach(row -> out.append("<mtr><mtd>").append(row).append("</mtd></mtr>\n"));
        return out.append("</mtable>\n</math>\n").toString();
    }

    private static String text(String s) {
        return "<mtext>" + Xml.escape(s) + "</mtext>";
    }
}
