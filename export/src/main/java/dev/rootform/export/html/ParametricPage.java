package dev.rootform.export.html;

import dev.rootform.export.document.FormulaRows;
import dev.rootform.export.document.MathMlRenderer;
import dev.rootform.export.document.ParametricMathMlRenderer;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.export.document.ParametricTextRenderer;
import dev.rootform.export.notation.CommentText;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import dev.rootform.symbolic.params.ParametricProblem;
import java.util.ArrayList;
import java.util.List;

/**
 * The sections of an answer with parameters as a report page: the problem, the case table (when
 * each case holds and the form of its roots) with the case formulas in MathML, the stability
 * conditions, the verification with each specialisation check, and the answer at the given values.
 * It formats the report and computes nothing.
 *
 * @since 0.3
 */
public final class ParametricPage {
    /**
     * The widest line of a formula, in plain characters: narrower than {@link ReportPage#WIDTH}, as
     * products of many parameters set wider than a character each.
     */
    static final int WIDTH = 60;

    private ParametricPage() {
    }

    public static Page of(ParametricReport r) {
        ParametricAnswer a = r.answer();
        ParametricProblem p = a.problem();
        String parameters = String.join(", ", p.parameters());
        List<List<String>> problem = new ArrayList<>();
        problem.add(List.of("problem", Html.text(p.source().strip())));
        problem.add(List.of("parameters", Html.text(parameters)));
        if (!a.assumptions().toString().isEmpty()) {
            problem.add(List.of("assuming", Html.text(a.assumptions().toString())));
        }
        List<Section> sections = new ArrayList<>();
        sections.add(new Section("Problem", List.of(new Block.Table(List.of("item", "value"), problem))));
        sections.add(new Section("Cases", cases(r)));
        List<Block> stability = new ArrayList<>(List.of(new Block.Paragraph(Html.text(ParametricTextRenderer.stability(a.stability())))));
        ParametricMathMlRenderer.stabilityRow(r, WIDTH)
                .ifPresent(row -> stability.add(new Block.Formula(MathMlRenderer.math(List.of(row)))));
        sections.add(new Section("Stability", stability));
        sections.add(new Section("Verification", verification(r)));
        r.at().ifPresent(at -> {
            List<Block> blocks = new ArrayList<>();
            blocks.add(new Block.Paragraph(Html.text((at.caseNumber() == 0 ? "No case formula; the ordinary solver's answer to "
                    : "Case " + at.caseNumber() + " holds. The ordinary solver's answer to ") + at.problem().strip())));
            ReportPage.values(at.report()).ifPresent(blocks::add);
            sections.add(new Section("At " + ParametricTextRenderer.values(at.values()), blocks));
        });
        return new Page("rootform: " + p.source().strip(), "solution with parameters " + parameters
                + (r.verified() ? " · verified" : " · NOT verified"), sections, CommentText.FORMULA_CAUTION);
    }

    /** The case table and the case formulas, or why there are none; the notes. */
    private static List<Block> cases(ParametricReport r) {
        ParametricAnswer a = r.answer();
        List<Block> blocks = new ArrayList<>();
        if (a.cases().isEmpty()) {
            blocks.add(new Block.Paragraph(Html.text("No case formula was derived over Q(" + String.join(", ", a.problem().parameters())
                    + ").")));
        } else {
            List<List<String>> rows = new ArrayList<>();
            int number = 1;
            for (ParametricCase c : a.cases()) {
                rows.add(List.of(String.valueOf(number++), Html.text(ParametricTextRenderer.when(c)),
                        Html.text(ParametricTextRenderer.forms(c))));
            }
            blocks.add(new Block.Table(List.of("case", "holds", "roots"), rows));
            List<FormulaRows.Row> formulas = ParametricMathMlRenderer.caseRows(r, WIDTH);
            blocks.add(new Block.Formula(MathMlRenderer.math(formulas)));
        }
        a.notes().forEach(note -> blocks.add(new Block.Paragraph(Html.text("Note: " + note))));
        return blocks;
    }

    /** The verification in words and a table of the specialisation checks. */
    private static List<Block> verification(ParametricReport r) {
        List<Block> blocks = new ArrayList<>();
        ParametricTextRenderer.verification(r).lines().forEach(line -> blocks.add(new Block.Paragraph(Html.text(line))));
        if (!r.checks().isEmpty()) {
            blocks.add(new Block.Table(List.of("parameter values", "case", "compared at", "largest difference", "result"),
                    r.checks().stream().map(c -> List.of(Html.text(ParametricTextRenderer.values(c.values())),
                            String.valueOf(c.caseNumber()), Html.text(String.join(", ", c.points())), Html.text(c.largestDifference()),
                            c.agreed() ? "agrees" : "DIFFERS")).toList()));
        }
        return blocks;
    }
}
