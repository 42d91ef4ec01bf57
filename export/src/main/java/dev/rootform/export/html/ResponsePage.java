package dev.rootform.export.html;

import dev.rootform.export.Report;
import dev.rootform.export.document.FormulaRows;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.ResponseMathMl;
import dev.rootform.export.document.ResponseNotation;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.export.document.ResponseText;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.LineBreaker;
import dev.rootform.export.notation.MathMlNotation;
import dev.rootform.export.notation.RootText;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.response.ResponsePlan;
import dev.rootform.symbolic.response.TransferFacts;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The sections of a response answer's report page: the transfer function and its exact facts,
 * the poles and zeros (table and complex plane), the response in closed form with its plot, the
 * frequency response (magnitude and phase plot, the requested frequencies), the step figures, the
 * equivalent equation and the solved problem, verification, values, warnings, and the generated
 * code when asked for. It draws the report's own samples and computes nothing.
 *
 * @since 0.3
 */
public final class ResponsePage {
    private ResponsePage() {
    }

    /**
     * @param code generated code to show, with its language, e.g. {@code ("java", source)}
     */
    public static Page of(ResponseReport r, Optional<Block.Code> code) {
        TransferFunction h = r.transfer();
        Report solved = r.response();
        List<Section> sections = new ArrayList<>();
        sections.add(new Section("Transfer function", List.of(
                new Block.Formula(MathMlRenderer.math(List.of(new FormulaRows.Row("transfer", List.of(ResponseMathMl.transfer(h)))))),
                ReportPage.pairs(facts(r)))));
        List<Block> roots = new ArrayList<>();
        roots.add(roots(r));
        roots.add(new Block.Figure(plane(r), "Poles (×) and zeros (○) of " + h.signature() + " in the complex plane (×m: "
                + "multiplicity m) against the stability boundary, " + (h.continuous() ? "the imaginary axis Re s = 0."
                        : "the unit circle |z| = 1.")));
        sections.add(new Section("Poles and zeros", roots));
        sections.add(new Section("Response", response(r)));
        frequency(r).ifPresent(sections::add);
        r.stepFigures().ifPresent(s -> sections.add(new Section("Step figures",
                List.of(ReportPage.list("figure", ResponseText.figures(h, s, r.digits()))))));
        sections.add(new Section("Equivalent equation", equation(r)));
        sections.add(new Section("Verification", List.of(ReportPage.verification(solved))));
        ReportPage.values(solved).ifPresent(v -> sections.add(new Section("Values", List.of(v))));
        if (!r.warnings().isEmpty()) {
            sections.add(new Section("Warnings", r.warnings().stream().<Block>map(w -> new Block.Paragraph(Html.text(w))).toList()));
        }
        code.ifPresent(c -> sections.add(new Section("Generated " + c.language() + " code", List.of(c))));
        return new Page("rootform: " + ResponseNotation.transfer(h), "response to " + r.plan().input().text()
                + " from zero initial state" + (r.verified() ? " · verified" : " · NOT verified"), sections,
                CommentText.FORMULA_CAUTION);
    }

    /** "label: text" lines of the transfer function's facts. */
    private static List<String> facts(ResponseReport r) {
        TransferFunction h = r.transfer();
        TransferFacts f = r.facts();
        List<String> lines = new ArrayList<>();
        if (!h.continuous()) {
            lines.add("in z^-1: " + ResponseNotation.delayForm(h));
        }
        f.hiddenModes().forEach(m -> lines.add("cancelled: " + ResponseText.hidden(h, m)));
        lines.add("DC gain: " + ResponseText.dcGain(h, f));
        lines.add("properness: " + ResponseText.properness(f.relativeDegree()));
        lines.add("stability: " + ResponseText.stability(h, f));
        return lines;
    }

    private static Block roots(ResponseReport r) {
        List<List<String>> rows = new ArrayList<>();
        addRoots(rows, "pole", r, r.facts().poleRoots(), r.poleValues());
        addRoots(rows, "zero", r, r.facts().zeroRoots(), r.zeroValues());
        return new Block.Table(List.of("kind", "exact", "value", "multiplicity"), rows);
    }

    private static void addRoots(List<List<String>> rows, String kind, ResponseReport r, List<ExactRoot> exact,
            List<RootApproximation> values) {
        for (int i = 0; i < exact.size(); i++) {
            rows.add(List.of(kind, Html.text(ResponseNotation.root(r.transfer(), exact.get(i))),
                    Html.text(RootText.decimal(values.get(i), Math.min(r.digits(), 12))),
                    Integer.toString(exact.get(i).multiplicity())));
        }
    }

    private static String plane(ResponseReport r) {
        String v = r.transfer().variable();
        return Charts.plane(List.of(new Charts.Marks("poles", Charts.POLE, values(r.poleValues()), labels(r.facts().poleRoots())),
                new Charts.Marks("zeros", Charts.ZERO, values(r.zeroValues()), labels(r.facts().zeroRoots()))),
                !r.transfer().continuous(), v, "poles");
    }

    private static List<double[]> values(List<RootApproximation> roots) {
        return roots.stream().map(a -> new double[] {a.re().doubleValue(), a.im().doubleValue()}).toList();
    }

    private static List<String> labels(List<ExactRoot> roots) {
        return roots.stream().map(x -> x.multiplicity() > 1 ? "×" + x.multiplicity() : "").toList();
    }

    /** The response as formula rows (impulses, closed form, parts, validity) and its plot. */
    private static List<Block> response(ResponseReport r) {
        TransferFunction h = r.transfer();
        Report solved = r.response();
        ClosedForm f = solved.solution().closedForm();
        List<FormulaRows.Row> rows = new ArrayList<>();
        rows.add(new FormulaRows.Row("input", List.of(ResponseMathMl.text(r.plan().input().text() + ", from zero initial state"))));
        if (h.continuous() && !r.plan().impulses().isEmpty()) {
            rows.add(new FormulaRows.Row("impulses at t = 0", List.of(ResponseMathMl.impulses(h, r.plan().impulses()))));
        }
        MathMlRenderer.rows(solved, ReportPage.WIDTH).stream().filter(x -> x.label().equals("solution")).forEach(rows::add);
        rows.add(new FormulaRows.Row("valid", List.of(ResponseMathMl.text(ResponseText.validity(r)))));
        if (r.plan().split() == ResponsePlan.Split.FORCED && !f.particularTerms().isEmpty() && !f.transientTerms().isEmpty()) {
            LineBreaker breaker = new LineBreaker(MathMlNotation.INSTANCE, ReportPage.WIDTH);
            rows.add(new FormulaRows.Row("transient", breaker.formula(f.withTerms(f.transientTerms()))));
            rows.add(new FormulaRows.Row("steady", breaker.formula(f.withTerms(f.particularTerms()))));
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Formula(MathMlRenderer.math(rows)));
        solved.plots().flatMap(p -> p.time()).ifPresent(t -> {
            String unknown = ResponseNotation.unknown(h);
            blocks.add(new Block.Figure(Charts.time(t, f.variable(), unknown, ReportPage.series(t, unknown)),
                    ReportPage.timeCaption(t, unknown) + (h.continuous() && !r.plan().impulses().isEmpty()
                            ? " The impulses at t = 0 are not drawn." : "")));
        });
        return blocks;
    }

    private static Optional<Section> frequency(ResponseReport r) {
        TransferFunction h = r.transfer();
        List<Block> blocks = new ArrayList<>();
        r.frequencyPlot().ifPresent(p -> blocks.add(new Block.Figure(Charts.frequency(p), "Frequency response of "
                + h.signature() + " at " + (h.continuous() ? "s = jω: magnitude in dB (top) and phase in degrees (bottom) against ω"
                        : "z = e^(jθ): magnitude in dB (top) and phase in degrees (bottom) against θ in rad per sample")
                + "; frequencies at a zero or pole on the " + (h.continuous() ? "imaginary axis" : "unit circle") + " left out.")));
        if (!r.frequencyResponse().isEmpty()) {
            blocks.add(ReportPage.pairs(List.of("frequency", "response"), r.frequencyResponse().stream()
                    .map(p -> ResponseText.frequency(h, p, r.digits())).toList()));
        }
        return blocks.isEmpty() ? Optional.empty() : Optional.of(new Section("Frequency response", blocks));
    }

    private static List<Block> equation(ResponseReport r) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Input u, output y: <code>" + Html.text(r.relation()) + "</code>"));
        blocks.add(new Block.Formula(MathMlRenderer.math(ReportPage.problemRows(MathMlRenderer.rows(r.response(), ReportPage.WIDTH)))));
        blocks.add(new Block.Paragraph("The response is the solution of <code>rootform solve \"" + Html.text(r.problem())
                + "\"</code>."));
        return blocks;
    }
}
