package dev.rootform.export.html;

import dev.rootform.export.Report;
import dev.rootform.export.document.DiagnosticsText;
import dev.rootform.export.document.FormulaRows;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.ValueText;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.RootText;
import dev.rootform.numeric.analysis.SteadyState;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.plot.TimePlot;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * The sections of a solve answer's report page: the problem and the solution as MathML, the
 * plots (solution against t or n, roots in the complex plane, frequency response), verification,
 * diagnostics, values and steady states as tables, and the generated code when asked for.
 *
 * @since 0.3
 */
public final class ReportPage {
    /** The widest line of a formula row, in plain characters (the page's text column). */
    static final int WIDTH = 76;
    private static final List<String> PROBLEM_ROWS = List.of("equation", "conditions", "characteristic", "factored");

    private ReportPage() {
    }

    /**
     * @param code generated code to show, with its language, e.g. {@code ("java", source)}
     */
    public static Page of(Report r, Optional<Block.Code> code) {
        Solution s = r.solution();
        List<FormulaRows.Row> rows = MathMlRenderer.rows(r, WIDTH);
        List<Section> sections = new ArrayList<>();
        sections.add(new Section("Problem", List.of(new Block.Formula(MathMlRenderer.math(problemRows(rows))))));
        List<Block> solution = new ArrayList<>();
        solution.add(new Block.Formula(MathMlRenderer.math(rows.stream().filter(x -> !PROBLEM_ROWS.contains(x.label())).toList())));
        solution.add(roots(r));
        sections.add(new Section("Solution", solution));
        r.plots().ifPresent(p -> sections.add(new Section("Plots", plots(r, p))));
        if (r.plots().isEmpty()) {
            sections.add(new Section("Plots", List.of(new Block.Figure(rootPlane(r), rootCaption(s)))));
        }
        sections.add(new Section("Verification", List.of(verification(r))));
        r.diagnostics().ifPresent(d -> sections.add(new Section("Diagnostics", List.of(pairs(DiagnosticsText.lines(d, r))))));
        values(r).ifPresent(v -> sections.add(new Section("Values", List.of(v))));
        if (!r.steadyStates().isEmpty()) {
            sections.add(new Section("Steady state", List.of(steady(r))));
        }
        if (!r.warnings().isEmpty()) {
            sections.add(new Section("Warnings", r.warnings().stream().<Block>map(w -> new Block.Paragraph(Html.text(w))).toList()));
        }
        code.ifPresent(c -> sections.add(new Section("Generated " + c.language() + " code", List.of(c))));
        return new Page("rootform: " + EquationText.equation(s.problem().equation()),
                EquationText.kind(s.problem().equation()) + (r.verified() ? " · verified" : " · NOT verified"),
                sections, CommentText.FORMULA_CAUTION);
    }

    /** The rows that state the problem: equation, conditions, characteristic polynomial and its factors. */
    static List<FormulaRows.Row> problemRows(List<FormulaRows.Row> rows) {
        return rows.stream().filter(x -> PROBLEM_ROWS.contains(x.label())).toList();
    }

    /** The values at the requested points as a table; empty when none were asked for. */
    static Optional<Block> values(Report r) {
        if (r.values().isEmpty()) {
            return Optional.empty();
        }
        ClosedForm f = r.solution().closedForm();
        return Optional.of(new Block.Table(List.of("point", "value"), r.values().stream()
                .map(v -> List.of(Html.text(EquationText.unknownAt(f, Numbers.point(v.at()))),
                        Html.text(ValueText.of(v, r.digits()).strip()))).toList()));
    }

    private static List<Block> plots(Report r, Plots p) {
        Solution s = r.solution();
        ClosedForm f = s.closedForm();
        List<Block> blocks = new ArrayList<>();
        String unknown = EquationText.unknownAt(f, f.variable());
        p.time().ifPresent(t -> blocks.add(new Block.Figure(Charts.time(t, f.variable(), unknown, series(t, unknown)),
                timeCaption(t, unknown))));
        blocks.add(new Block.Figure(rootPlane(r), rootCaption(s)));
        p.frequency().ifPresent(fr -> blocks.add(new Block.Figure(Charts.frequency(fr),
                "Frequency response H: magnitude in dB (top) and phase in degrees (bottom) against "
                        + (fr.discrete() ? "the frequency θ in rad per sample" : "the angular frequency ω")
                        + "; dashed lines mark the sinusoidal inputs.")));
        return blocks;
    }

    /** The solution and, when split, its transient and steady parts, as plotted series. */
    static List<Charts.Series> series(TimePlot t, String unknown) {
        List<Charts.Series> series = new ArrayList<>();
        series.add(new Charts.Series("solution " + unknown, t.solution()));
        if (t.split()) {
            series.add(new Charts.Series("transient (homogeneous) part", t.transientPart()));
            series.add(new Charts.Series("steady (particular) part", t.steadyPart()));
        }
        return series;
    }

    /** The caption of a time plot whose marked points are all values the user asked for. */
    static String timeCaption(TimePlot t, String unknown) {
        return timeCaption(t, unknown, !t.marks().isEmpty(), Optional.empty());
    }

    /**
     * The caption of a time plot, naming each kind of mark drawn: squares at the --values-at points
     * ({@code requested}), rings at the cross-check points ({@code checked}, {@code checkedBy} says against what).
     */
    static String timeCaption(TimePlot t, String unknown, boolean requested, Optional<String> checkedBy) {
        return "The solution " + unknown + (t.stems() ? " at each index" : "")
                + (t.logScale() ? " in magnitude on a log axis (it grows)" : "") + " over " + t.range()
                + (t.split() ? "; the transient and steady parts drawn separately" : "")
                + (requested ? "; squares mark the values asked for with --values-at" : "")
                + checkedBy.map(by -> "; rings mark the points where the answer was compared with " + by).orElse("") + ".";
    }

    private static String rootCaption(Solution s) {
        boolean discrete = s.problem().equation().domain() == Domain.DIFFERENCE;
        return "Roots of the characteristic polynomial in the complex plane (×m: multiplicity m) against the stability "
                + "boundary, " + (discrete ? "the unit circle |λ| = 1" : "the imaginary axis Re λ = 0")
                + "; the square marks the dominant root.";
    }

    private static String rootPlane(Report r) {
        List<double[]> points = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        int dominant = -1;
        Optional<RootApproximation> top = r.diagnostics().flatMap(d -> d.growth().root());
        for (RootApproximation a : r.roots()) {
            if (top.isPresent() && top.get().equals(a)) {
                dominant = points.size();
            }
            points.add(new double[] {a.re().doubleValue(), a.im().doubleValue()});
            labels.add(a.root().multiplicity() > 1 ? "×" + a.root().multiplicity() : "");
        }
        return Charts.roots(points, labels, dominant, r.solution().problem().equation().domain() == Domain.DIFFERENCE);
    }

    private static Block roots(Report r) {
        List<List<String>> rows = new ArrayList<>();
        for (RootApproximation a : r.roots()) {
            rows.add(List.of(Html.text(RootText.exact(a.root())), Html.text(RootText.decimal(a, Math.min(r.digits(), 12))),
                    Integer.toString(a.root().multiplicity())));
        }
        return new Block.Table(List.of("root λ", "value", "multiplicity"), rows);
    }

    /** The exact and numeric checks of {@code r} as a table. */
    static Block verification(Report r) {
        return checks(Stream.concat(r.solution().checks().stream(), r.numericChecks().stream()).toList());
    }

    /** Checks as a table: name, passed or FAILED, how. */
    static Block checks(List<Check> checks) {
        return new Block.Table(List.of("check", "result", "how"),
                checks.stream().map(c -> List.of(Html.text(c.name()), result(c), Html.text(c.detail()))).toList());
    }

    private static String result(Check c) {
        return c.passed() ? "<span class=\"ok\">passed</span>" : "<span class=\"failed\">FAILED</span>";
    }

    /** Lines {@code "label: text"} as a two-column table. */
    static Block pairs(List<String> lines) {
        return pairs(List.of("fact", "value"), lines);
    }

    /** Lines {@code "label: text"} as a two-column table with the given headings. */
    static Block pairs(List<String> headings, List<String> lines) {
        return new Block.Table(headings, lines.stream().map(l -> {
            int colon = l.indexOf(": ");
            return colon < 0 ? List.of("", Html.text(l)) : List.of(Html.text(l.substring(0, colon)), Html.text(l.substring(colon + 2)));
        }).toList());
    }

    /** Lines as a one-column table. */
    static Block list(String heading, List<String> lines) {
        return new Block.Table(List.of(heading), lines.stream().map(l -> List.of(Html.text(l))).toList());
    }

    private static Block steady(Report r) {
        List<List<String>> rows = new ArrayList<>();
        for (SteadyState st : r.steadyStates()) {
            rows.add(List.of(Html.text(EquationText.forcingTerm(r.solution().problem().equation(), st.input())),
                    Numbers.decimal(st.amplitude(), 8), Numbers.decimal(st.gain(), 8), Numbers.decimal(st.phaseDegrees(), 8) + "°"));
        }
        return new Block.Table(List.of("input", "amplitude", "gain", "phase"), rows);
    }
}
