package dev.rootform.export.html;

import dev.rootform.export.document.FormulaRows;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.SystemReport;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.export.document.SystemTextRenderer;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationFormula;
import dev.rootform.export.notation.LineBreaker;
import dev.rootform.export.notation.MathMlNotation;
import dev.rootform.numeric.plot.Sample;
import dev.rootform.numeric.plot.TimePlot;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Predicate;
import java.util.stream.Collectors;

/**
 * The sections of a state-space answer's report page: the text answer's labelled sections
 * ({@link SystemTextRenderer#sections}) grouped into tables — model, eigenvalues (χ in MathML, the
 * complex plane), e^(At) or A^n, transfer matrix and structure, response (the closed forms in
 * MathML, a plot of each output, or of each state when there is no output), values — and the
 * checks with their results. It draws the
 * report's own samples and computes nothing.
 *
 * @since 0.3
 */
public final class SystemPage {
    private static final List<String> MODEL = List.of("system", "A", "B", "C", "D", "x0", "input");
    private static final List<String> EIGEN = List.of("characteristic", "factored", "minimal", "eigenvalues", "stability");
    private static final List<String> STRUCTURE = List.of("transfer", "controllability", "observability");
    private static final List<String> RESPONSE = List.of("state", "output");

    private SystemPage() {
    }

    public static Page of(SystemReport r) {
        Map<String, FormulaRows.Row> rows = SystemTextRenderer.sections(r).stream().filter(x -> !x.lines().isEmpty())
                .collect(Collectors.toMap(FormulaRows.Row::label, x -> x, (a, b) -> a, java.util.LinkedHashMap::new));
        String transition = r.model().continuous() ? "e^(At)" : "A^n";
        List<Section> sections = new ArrayList<>();
        sections.add(new Section("Model", List.of(table(rows, MODEL::contains))));
        MathMlNotation n = MathMlNotation.INSTANCE;
        String chi = n.relation(new EquationFormula(n).factorisation(r.characteristic(), r.factors()), "=", n.number("0"));
        sections.add(new Section("Eigenvalues", List.of(
                new Block.Formula(MathMlRenderer.math(List.of(new FormulaRows.Row("characteristic", List.of(chi))))),
                table(rows, EIGEN::contains),
                new Block.Figure(plane(r), "Eigenvalues of A in the complex plane (×m: algebraic multiplicity m) against the"
                        + " stability boundary, " + (r.model().continuous() ? "the imaginary axis Re λ = 0." : "the unit circle |λ| = 1.")))));
        sections.add(new Section(transition, List.of(ReportPage.list("entry", rows.get(transition).lines()))));
        if (STRUCTURE.stream().anyMatch(rows::containsKey)) {
            sections.add(new Section("Transfer matrix and structure", List.of(table(rows, STRUCTURE::contains))));
        }
        if (RESPONSE.stream().anyMatch(rows::containsKey)) {
            List<Block> blocks = new ArrayList<>();
            LineBreaker breaker = new LineBreaker(n, ReportPage.WIDTH);
            List<SignalReport> signals = new ArrayList<>(r.states());
            signals.addAll(r.outputs());
            blocks.add(new Block.Formula(MathMlRenderer.math(signals.stream().map(s -> new FormulaRows.Row(
                    s.signal().name() + (r.model().continuous() ? "(t)" : "[n]"),
                    breaker.formula(s.report().solution().closedForm()))).toList())));
            blocks.add(table(rows, RESPONSE::contains));
            List<SignalReport> drawn = r.outputs().isEmpty() ? r.states() : r.outputs();
            for (SignalReport s : drawn) {
                s.report().plots().flatMap(p -> p.time()).ifPresent(t -> blocks.add(figure(r, s, t)));
            }
            if (rows.containsKey("values")) {
                blocks.add(ReportPage.list("values", rows.get("values").lines()));
            }
            sections.add(new Section("Response", blocks));
        }
        sections.add(new Section("Verification", List.of(ReportPage.checks(r.checks()))));
        return new Page("rootform: state-space model, " + r.model().states() + " states", (r.model().continuous()
                ? "continuous time" : "discrete time") + (r.verified() ? " · verified" : " · NOT verified"), sections,
                CommentText.FORMULA_CAUTION);
    }

    /** The chosen sections as a two-column table, a section's lines one below the other. */
    private static Block table(Map<String, FormulaRows.Row> rows, Predicate<String> chosen) {
        return new Block.Table(List.of("item", "value"), rows.values().stream().filter(x -> chosen.test(x.label()))
                .map(x -> List.of(Html.text(x.label()), x.lines().stream().map(Html::text).collect(Collectors.joining("<br>"))))
                .toList());
    }

    private static String plane(SystemReport r) {
        List<double[]> points = r.eigenvalues().stream()
                .map(e -> new double[] {e.approximation().re().doubleValue(), e.approximation().im().doubleValue()}).toList();
        List<String> labels = r.eigenvalues().stream().map(e -> e.algebraic() > 1 ? "×" + e.algebraic() : "").toList();
        return Charts.roots(points, labels, -1, !r.model().continuous());
    }

    /**
     * A signal's plot. Its marked points are the values asked for (squares) followed by the points
     * where the response was checked against the state equation (rings), told apart by position.
     */
    private static Block figure(SystemReport r, SignalReport s, TimePlot t) {
        String variable = r.model().continuous() ? "t" : "n";
        String name = s.signal().name() + (r.model().continuous() ? "(t)" : "[n]");
        Set<Double> asked = r.values().stream().map(v -> v.at().doubleValue()).collect(Collectors.toSet());
        List<Sample> requested = t.marks().stream().filter(m -> asked.contains(m.x())).toList();
        List<Sample> checked = t.marks().stream().filter(m -> !asked.contains(m.x())).toList();
        Optional<String> by = checked.isEmpty() ? Optional.empty() : Optional.of(r.model().continuous()
                ? "a numerical integration of the state equation (see Verification)"
                : "the exact iteration of the state equation (see Verification)");
        return new Block.Figure(Charts.time(t, variable, name, ReportPage.series(t, name), requested, checked, s.signal().name()),
                ReportPage.timeCaption(t, name, !requested.isEmpty(), by)
                        + (s.signal().delta().isZero() ? "" : " The impulse at t = 0 is not drawn."));
    }
}
