package dev.rootform.export.document;

import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;

import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * A state-space answer as a LaTeX math fragment: {@code %} comment lines, then one
 * {@code aligned} environment (amsmath) with χ, e^{At} or A^n as a {@code pmatrix} of closed forms,
 * G(s) as a {@code pmatrix} of fractions, and the response.
 *
 * @since 0.3
 */
public final class SystemLatexRenderer {
    private SystemLatexRenderer() {
    }

    public static String render(SystemReport r) {
        StringBuilder out = new StringBuilder();
        CommentText.wrap(List.of("state-space model, " + r.model().states() + " states; " + (r.verified() ? "verified" : "NOT verified"),
                CommentText.CAUTION)).forEach(l -> out.append("% ").append(l).append('\n'));
        List<String> rows = new ArrayList<>();
        rows.add(row("characteristic", LatexRenderer.math(EquationText.factorisation(r.characteristic(), r.factors())) + " = 0"));
        String name = r.model().continuous() ? "e^{At}" : "A^{n}";
        rows.add(row("transition", name + " = " + matrix(r.transition().entries(), Formulas::latex)));
        r.transfer().ifPresent(g -> rows.add(row("transfer", "G(" + r.transformVariable() + ") = "
                + matrix(g.entries(), f -> fraction(f, r.transformVariable())))));
        for (SignalReport s : concat(r.states(), r.outputs())) {
            ClosedForm f = s.report().solution().closedForm();
            String arg = r.model().continuous() ? "(t)" : "[n]";
            String signal = s.signal().name().replaceAll("^([a-z])(\\d+)$", "$1_{$2}");
            String delta = s.signal().delta().isZero() ? "" : " + " + LatexRenderer.math(s.signal().delta().toString()) + "\\,\\delta(t)";
            String from = s.signal().start() == 0 ? ""
                    : ",\\; n \\geq 1,\\; " + signal + "[0] = " + LatexRenderer.math(s.signal().before().toString());
            rows.add(row("response", signal + arg + " = " + Formulas.latex(f) + delta + from));
        }
        return out.append("\\begin{aligned}\n").append(String.join(" \\\\\n", rows)).append("\n\\end{aligned}\n").toString();
    }

    private static <T> String matrix(List<List<T>> entries, Function<T, String> cell) {
        return "\\begin{pmatrix} " + entries.stream().map(row -> row.stream().map(cell).collect(Collectors.joining(" & ")))
                .collect(Collectors.joining(" \\\\ ")) + " \\end{pmatrix}";
    }

    private static String fraction(RationalFunction f, String v) {
        String num = LatexRenderer.math(f.numerator().toString(v));
        return f.denominator().degree() == 0 ? num : "\\frac{" + num + "}{" + LatexRenderer.math(f.denominator().toString(v)) + "}";
    }

    private static String row(String label, String body) {
        return "&\\text{" + label + ":} && " + body;
    }

    private static List<SignalReport> concat(List<SignalReport> a, List<SignalReport> b) {
        List<SignalReport> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }
}
