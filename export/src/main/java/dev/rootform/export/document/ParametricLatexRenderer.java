package dev.rootform.export.document;

import dev.rootform.export.notation.LatexNotation;
import dev.rootform.export.notation.LineBreaker;
import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.ArrayList;
import java.util.List;

/**
 * An answer with parameters as a LaTeX fragment (amsmath): the solution as one {@code cases}
 * environment (per case a row with its number and conditions, then the formula on indented rows),
 * the definitions of the root symbols, and the stability conditions. Long formulas and conditions
 * are broken at + and − (by a {@link LineBreaker}, measured on the plain form) so that every line
 * fits the text width of an A4 page at 10 pt. With {@code --at}, a comment names the case that holds.
 *
 * @since 0.3
 */
public final class ParametricLatexRenderer {
    /**
     * The widest line, in characters of the plain form: the head {@code y(t) = \{} and the indents
     * take about 75 pt of the 345 pt text width, and the products of many parameters, each \cdot
     * with its spaces, set wider than the ordinary answer's lines ({@link LatexRenderer#WIDTH}).
     */
    static final int WIDTH = 44;

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
        LineBreaker breaker = new LineBreaker(LatexNotation.INSTANCE, WIDTH);
        List<String> definitions = new ArrayList<>();
        if (!a.cases().isEmpty()) {
            String head = formula.of(a.problem().function(), a.cases().get(0)).formula();
            head = head.substring(0, head.indexOf(" = "));
            List<String> rows = new ArrayList<>();
            int number = 1;
            for (ParametricCase c : a.cases()) {
                ParametricFormula.Text t = formula.of(a.problem().function(), c);
                List<String> when = conditions(c);
                List<String> condition = new ArrayList<>(List.of("\\text{" + condition(c, number) + "}"));
                if (!when.isEmpty()) {
                    List<String> lines = PlainMath.lines(when, ",\\; ", breaker, PlainMath::latex);
                    condition.set(0, condition.get(0) + " " + lines.get(0));
                    condition.addAll(lines.subList(1, lines.size()));
                }
                rows.addAll(continued("", condition));
                String body = t.formula().substring(t.formula().indexOf(" = ") + 3);
                rows.addAll(continued("\\quad ", PlainMath.lines(body, breaker, PlainMath::latex)));
                for (String d : t.definitions()) {
                    definitions.add(display("\\text{case " + number + ": } ", PlainMath.lines(d, breaker, PlainMath::latex)));
                }
                number++;
            }
            s.append("\\[\n").append(PlainMath.latex(head)).append(" = \\begin{cases}\n  ").append(String.join(" \\\\\n  ", rows))
                    .append("\n\\end{cases}\n\\]\n");
        }
        definitions.forEach(s::append);
        for (String note : a.notes()) {
            s.append("% note: ").append(note).append('\n');
        }
        s.append("% ").append(ParametricTextRenderer.stability(a.stability())).append('\n');
        if (!a.stability().conditions().isEmpty()) {
            s.append(display("", PlainMath.lines(a.stability().conditions().stream().map(Constraint::toString).toList(),
                    ",\\quad ", breaker, PlainMath::latex)));
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

    /** The lines of one formula after {@code indent}, the continuation lines indented by a further \qquad. */
    private static List<String> continued(String indent, List<String> lines) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            out.add(indent + (i == 0 ? "" : "\\qquad ") + lines.get(i));
        }
        return out;
    }

    /** The lines as one display formula after {@code label}: one line as it is, more in an {@code aligned} environment. */
    private static String display(String label, List<String> lines) {
        if (lines.size() == 1) {
            return "\\[ " + label + lines.get(0) + " \\]\n";
        }
        return "\\[\n\\begin{aligned}\n  &" + label + String.join(" \\\\\n  &", continued("", lines)) + "\n\\end{aligned}\n\\]\n";
    }

    private static String condition(ParametricCase c, int number) {
        return "(" + number + ") " + (conditions(c).isEmpty() ? "for all parameter values allowed" : "if ");
    }

    /** The case's conditions as plain formulas. */
    private static List<String> conditions(ParametricCase c) {
        List<Constraint> all = new ArrayList<>(c.when());
        all.addAll(c.excluded());
        return all.stream().map(Constraint::toString).toList();
    }

    /** The case's conditions as one plain formula, joined by commas. */
    static String condition(ParametricCase c) {
        return String.join(", ", conditions(c));
    }
}
