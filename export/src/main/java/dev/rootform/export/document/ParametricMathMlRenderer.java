package dev.rootform.export.document;

import dev.rootform.export.notation.LineBreaker;
import dev.rootform.export.notation.MathMlNotation;
import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * An answer with parameters as presentation MathML: the solution as a brace and a table (one row
 * per case: formula, condition), the root symbols' definitions and the stability conditions, each
 * as its own {@code <math>} element, with an XML comment for the verification; and the same
 * formulas as labelled rows for the report page.
 *
 * @since 0.3
 */
public final class ParametricMathMlRenderer {
    private static final String MATH = "<math xmlns=\"http://www.w3.org/1998/Math/MathML\" display=\"block\">";

    private ParametricMathMlRenderer() {
    }

    /**
     * The cases as labelled rows of MathML for a page ({@link MathMlRenderer#math} lays them out): per
     * case the formula ({@code case k}), broken at + and − into lines of at most {@code width} plain
     * characters, then the definitions of its root symbols ({@code where}).
     */
    public static List<FormulaRows.Row> caseRows(ParametricReport r, int width) {
        ParametricAnswer a = r.answer();
        ParametricFormula formula = new ParametricFormula(a.problem().domain(), a.problem().variable());
        LineBreaker breaker = new LineBreaker(MathMlNotation.INSTANCE, width);
        List<FormulaRows.Row> rows = new ArrayList<>();
        int number = 1;
        for (ParametricCase c : a.cases()) {
            ParametricFormula.Text t = formula.of(a.problem().function(), c);
            rows.add(new FormulaRows.Row("case " + number++, PlainMath.lines(t.formula(), breaker, PlainMath::mathMl)));
            for (String d : t.definitions()) {
                rows.add(new FormulaRows.Row("where", PlainMath.lines(d, breaker, PlainMath::mathMl)));
            }
        }
        return rows;
    }

    /**
     * The stability conditions as one labelled row ({@code stable when}) of MathML lines of at most
     * {@code width} plain characters; empty when there are none (always or never stable).
     */
    public static Optional<FormulaRows.Row> stabilityRow(ParametricReport r, int width) {
        List<String> conditions = r.answer().stability().conditions().stream().map(Constraint::toString).toList();
        if (conditions.isEmpty()) {
            return Optional.empty();
        }
        LineBreaker breaker = new LineBreaker(MathMlNotation.INSTANCE, width);
        return Optional.of(new FormulaRows.Row("stable when", PlainMath.lines(conditions, MathMlRenderer.SEPARATOR, breaker,
                PlainMath::mathMl)));
    }

    public static String render(ParametricReport r) {
        ParametricAnswer a = r.answer();
        StringBuilder s = new StringBuilder();
        s.append("<!-- rootform: solution with parameters ").append(String.join(", ", a.problem().parameters())).append(". ")
                .append(ParametricTextRenderer.verification(r).replace("--", "-")).append(" -->\n");
        ParametricFormula formula = new ParametricFormula(a.problem().domain(), a.problem().variable());
        if (!a.cases().isEmpty()) {
            String head = formula.of(a.problem().function(), a.cases().get(0)).formula();
            s.append(MATH).append("<mrow>").append(PlainMath.mathMl(head.substring(0, head.indexOf(" = "))))
                    .append("<mo>=</mo><mrow><mo>{</mo><mtable columnalign=\"left left\">");
            for (ParametricCase c : a.cases()) {
                String f = formula.of(a.problem().function(), c).formula();
                String condition = ParametricLatexRenderer.condition(c);
                s.append("<mtr><mtd>").append(PlainMath.mathMl(f.substring(f.indexOf(" = ") + 3))).append("</mtd><mtd>")
                        .append(condition.isEmpty() ? "<mtext>for all parameter values allowed</mtext>"
                                : "<mtext>if&#xA0;</mtext>" + PlainMath.mathMl(condition))
                        .append("</mtd></mtr>");
            }
            s.append("</mtable></mrow></mrow></math>\n");
            for (ParametricCase c : a.cases()) {
                for (String d : formula.of(a.problem().function(), c).definitions()) {
                    s.append(MATH).append(PlainMath.mathMl(d)).append("</math>\n");
                }
            }
        }
        s.append("<!-- ").append(ParametricTextRenderer.stability(a.stability())).append(" -->\n");
        if (!a.stability().conditions().isEmpty()) {
            s.append(MATH).append("<mrow>").append(a.stability().conditions().stream().map(c -> PlainMath.mathMl(c.toString()))
                    .collect(Collectors.joining("<mo>,</mo><mspace width=\"1em\"/>"))).append("</mrow></math>\n");
        }
        return s.toString();
    }
}
