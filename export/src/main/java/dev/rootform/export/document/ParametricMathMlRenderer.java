package dev.rootform.export.document;

import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.stream.Collectors;

/**
 * An answer with parameters as presentation MathML: the solution as a brace and a table (one row
 * per case: formula, condition), the root symbols' definitions and the stability conditions, each
 * as its own {@code <math>} element, with an XML comment for the verification.
 *
 * @since 0.4
 */
public final class ParametricMathMlRenderer {
    private static final String MATH = "<math xmlns=\"http://www.w3.org/1998/Math/MathML\" display=\"block\">";

    private ParametricMathMlRenderer() {
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
