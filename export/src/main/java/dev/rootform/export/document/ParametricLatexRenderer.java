package dev.rootform.export.document;

import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * An answer with parameters as a LaTeX fragment (amsmath): the solution as one {@code cases}
 * environment (formula and condition per row), the definitions of the root symbols, and the
 * stability conditions. With {@code --at}, a comment names the case that holds.
 *
 * @since 0.4
 */
public final class ParametricLatexRenderer {
    private ParametricLatexRenderer() {
    }

    public static String render(ParametricReport r) {
        ParametricAnswer a = r.answer();
        StringBuilder s = new StringBuilder();
        s.append("% rootform: solution with parameters ").append(String.join(", ", a.problem().parameters()));
        if (!a.assumptions().toString().isEmpty()) {
            s.append(", assuming ").append(a.assumptions());
        }
        s.append("\n% ").append(ParametricTextRenderer.verification(r).replace("\n", "\n% ")).append('\n');
        ParametricFormula formula = new ParametricFormula(a.problem().domain(), a.problem().variable());
        List<String> definitions = new ArrayList<>();
        if (!a.cases().isEmpty()) {
            String head = formula.of(a.problem().function(), a.cases().get(0)).formula();
            head = head.substring(0, head.indexOf(" = "));
            s.append("\\[\n").append(PlainMath.latex(head)).append(" = \\begin{cases}\n");
            int number = 1;
            for (ParametricCase c : a.cases()) {
                ParametricFormula.Text t = formula.of(a.problem().function(), c);
                String body = t.formula().substring(t.formula().indexOf(" = ") + 3);
                s.append("  ").append(PlainMath.latex(body)).append(" & \\text{").append(condition(c, number)).append("}")
                        .append(condition(c).isEmpty() ? "" : " " + PlainMath.latex(condition(c)))
                        .append(number < a.cases().size() ? " \\\\" : "").append('\n');
                for (String d : t.definitions()) {
                    definitions.add("\\text{case " + number + ": } " + PlainMath.latex(d));
                }
                number++;
            }
            s.append("\\end{cases}\n\\]\n");
        }
        for (String d : definitions) {
            s.append("\\[ ").append(d).append(" \\]\n");
        }
        for (String note : a.notes()) {
            s.append("% note: ").append(note).append('\n');
        }
        s.append("% ").append(ParametricTextRenderer.stability(a.stability())).append('\n');
        if (!a.stability().conditions().isEmpty()) {
            s.append("\\[ ").append(a.stability().conditions().stream().map(c -> PlainMath.latex(c.toString()))
                    .collect(Collectors.joining(",\\quad "))).append(" \\]\n");
        }
        r.at().ifPresent(at -> s.append("% at ").append(ParametricTextRenderer.values(at.values())).append(": case ")
                .append(at.caseNumber()).append('\n'));
        return s.toString();
    }

    /**
     * The answer as a complete document (article, 10 pt, A4, amsmath and amssymb): the comment lines
     * of {@link #render} stay before the preamble, the display formulas form the body.
     */
    public static String document(ParametricReport r) {
        return LatexRenderer.document(render(r).lines().toList());
    }

    private static String condition(ParametricCase c, int number) {
        return "(" + number + ") " + (condition(c).isEmpty() ? "for all parameter values allowed" : "if ");
    }

    /** The case's conditions as one plain formula, joined by commas. */
    static String condition(ParametricCase c) {
        List<Constraint> all = new ArrayList<>(c.when());
        all.addAll(c.excluded());
        return all.stream().map(Constraint::toString).collect(Collectors.joining(", "));
    }
}
