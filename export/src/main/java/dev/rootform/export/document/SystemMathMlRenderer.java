package dev.rootform.export.document;

import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;

import dev.rootform.export.notation.Xml;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * A state-space answer as one presentation-MathML element after an XML comment: rows for χ, the
 * matrix of closed forms of e^(At) or A^n, the transfer matrix and the response. Well-formed XML.
 *
 * @since 0.3
 */
public final class SystemMathMlRenderer {
    private SystemMathMlRenderer() {
    }

    public static String render(SystemReport r) {
        StringBuilder out = new StringBuilder("<!--\n");
        CommentText.wrap(List.of("state-space model, " + r.model().states() + " states; " + (r.verified() ? "verified" : "NOT verified"),
                CommentText.CAUTION)).forEach(l -> out.append("  ").append(l.replace("--", "—")).append('\n'));
        out.append("-->\n<math xmlns=\"").append(MathMlRenderer.NAMESPACE).append("\" display=\"block\">\n<mtable>\n");
        List<String> rows = new ArrayList<>();
        rows.add(text("characteristic: " + EquationText.factorisation(r.characteristic(), r.factors()) + " = 0"));
        String name = r.model().continuous() ? "<msup><mi>e</mi><mrow><mi>A</mi><mi>t</mi></mrow></msup>"
                : "<msup><mi>A</mi><mi>n</mi></msup>";
        rows.add("<mrow>" + name + "<mo>=</mo>" + matrix(r.transition().entries(), Formulas::mathml) + "</mrow>");
        r.transfer().ifPresent(g -> rows.add("<mrow><mi>G</mi><mo>(</mo><mi>" + r.transformVariable() + "</mi><mo>)</mo><mo>=</mo>"
                + matrix(g.entries(), f -> fraction(f, r.transformVariable())) + "</mrow>"));
        List<SignalReport> signals = new ArrayList<>(r.states());
        signals.addAll(r.outputs());
        for (SignalReport s : signals) {
            String arg = r.model().continuous() ? "<mo>(</mo><mi>t</mi><mo>)</mo>" : "<mo>[</mo><mi>n</mi><mo>]</mo>";
            rows.add("<mrow><mi>" + Xml.escape(s.signal().name()) + "</mi>" + arg + "<mo>=</mo>"
                    + Formulas.mathml(s.report().solution().closedForm()) + "</mrow>");
        }
        rows.forEach(row -> out.append("<mtr><mtd>").append(row).append("</mtd></mtr>\n"));
        return out.append("</mtable>\n</math>\n").toString();
    }

    private static <T> String matrix(List<List<T>> entries, Function<T, String> cell) {
        StringBuilder sb = new StringBuilder("<mrow><mo>(</mo><mtable>");
        for (List<T> row : entries) {
            sb.append("<mtr>");
            row.forEach(e -> sb.append("<mtd>").append(cell.apply(e)).append("</mtd>"));
            sb.append("</mtr>");
        }
        return sb.append("</mtable><mo>)</mo></mrow>").toString();
    }

    private static String fraction(RationalFunction f, String v) {
        String num = text(f.numerator().toString(v));
        return f.denominator().degree() == 0 ? num : "<mfrac>" + num + text(f.denominator().toString(v)) + "</mfrac>";
    }

    private static String text(String s) {
        return "<mtext>" + Xml.escape(s) + "</mtext>";
    }
}
