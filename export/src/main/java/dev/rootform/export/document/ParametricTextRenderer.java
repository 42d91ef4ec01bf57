package dev.rootform.export.document;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import dev.rootform.symbolic.params.ParametricProblem;
import dev.rootform.symbolic.params.Regime;
import dev.rootform.symbolic.params.StabilityConditions;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * An answer with parameters as plain text: the problem, each case with its condition, formula and
 * definitions, the verification, the stability conditions, notes, and the answer at {@code --at}.
 *
 * @since 0.3
 */
public final class ParametricTextRenderer {
    private ParametricTextRenderer() {
    }

    public static String render(ParametricReport r) {
        ParametricAnswer a = r.answer();
        ParametricProblem p = a.problem();
        StringBuilder s = new StringBuilder();
        s.append("Problem: ").append(p.source().strip()).append('\n');
        s.append("Parameters: ").append(String.join(", ", p.parameters()));
        if (!a.assumptions().toString().isEmpty()) {
            s.append("   (assuming ").append(a.assumptions()).append(')');
        }
        s.append("\n\n");
        ParametricFormula formula = new ParametricFormula(p.domain(), p.variable());
        if (a.cases().isEmpty()) {
            s.append("Solution: not derived over Q(").append(String.join(", ", p.parameters())).append(").\n");
        } else {
            s.append("Solution, ").append(a.cases().size() == 1 ? "one case" : a.cases().size() + " cases").append(":\n");
        }
        int number = 1;
        for (ParametricCase c : a.cases()) {
            s.append("  ").append(number++).append(". ").append(when(c)).append("  [").append(forms(c)).append("]\n");
            ParametricFormula.Text t = formula.of(p.function(), c);
            s.append("     ").append(t.formula()).append('\n');
            for (String d : t.definitions()) {
                s.append("       where ").append(d).append('\n');
            }
            if (!c.freeConstants().isEmpty()) {
                s.append("       ").append(String.join(", ", c.freeConstants())).append(": free constants (no conditions given)\n");
            }
        }
        for (String note : a.notes()) {
            s.append("  Note: ").append(note).append('\n');
        }
        s.append('\n').append(verification(r)).append('\n');
        s.append(stability(a.stability())).append('\n');
        r.at().ifPresent(at -> {
            s.append("\nAt ").append(values(at.values())).append(at.caseNumber() == 0 ? ": no case formula; the ordinary solver's answer:\n"
                    : ": case " + at.caseNumber() + " holds.\n");
            s.append("Specialised problem: ").append(at.problem().strip()).append("\n\n");
            s.append(TextRenderer.render(at.report()).strip()).append('\n');
        });
        return s.toString();
    }

    /** The case's conditions joined with "and", or "for all parameter values". */
    public static String when(ParametricCase c) {
        List<String> parts = c.when().stream().map(Constraint::toString).collect(Collectors.toList());
        if (!c.excluded().isEmpty()) {
            parts.add(c.excluded().stream().map(Constraint::toString).collect(Collectors.joining(", ")));
        }
        String text = parts.isEmpty() ? "for all parameter values allowed" : "when " + String.join(" and ", parts);
        return c.substitution().isEmpty() ? text : text + " (put in: " + c.substitution() + ")";
    }

    /** The form of each root of the equation in the case: "complex pair", "double root", …. */
    public static String forms(ParametricCase c) {
        return java.util.stream.IntStream.range(0, c.modes().size()).filter(i -> c.modes().get(i).inEquation() > 0)
                .mapToObj(i -> name(c.regimes().get(i)) + (c.modes().get(i).multiplicity() > c.modes().get(i).inEquation()
                        ? " met by the forcing" : ""))
                .collect(Collectors.joining(", "));
    }

    static String name(Regime r) {
        switch (r) {
            case ROOT:
                return "real root";
            case REAL_PAIR:
                return "two real roots";
            case DOUBLE_ROOT:
                return "double root";
            default:
                return "complex pair";
        }
    }

    /** The verification: the exact check of the cases, then the specialisation checks (a second line). */
    public static String verification(ParametricReport r) {
        ParametricAnswer a = r.answer();
        if (a.cases().isEmpty()) {
            return "Verified: nothing to verify (no case derived).";
        }
        String exact = a.verified() ? "Verified exactly over Q(" + String.join(", ", a.problem().parameters())
                + ") in every case: the residual of the equation is zero as a rational function and the conditions hold."
                : "NOT verified: the exact check failed in a case.";
        if (r.checks().isEmpty()) {
            return exact;
        }
        long agreed = r.checks().stream().filter(ParametricReport.Agreement::agreed).count();
        String largest = r.checks().stream().map(ParametricReport.Agreement::largestDifference).collect(Collectors.joining(", "));
        return exact + "\nSpecialised at " + r.checks().size() + " parameter point" + (r.checks().size() == 1 ? "" : "s")
                + " and solved by the ordinary exact solver: " + agreed + " of " + r.checks().size() + " agree (largest differences "
                + largest + ").";
    }

    /** The stability verdict in one sentence, naming the criterion and the conditions. */
    public static String stability(StabilityConditions s) {
        switch (s.verdict()) {
            case ALWAYS:
                return "Stability (" + s.criterion() + "): asymptotically stable for all parameter values allowed.";
            case NEVER:
                return "Stability (" + s.criterion() + "): never asymptotically stable.";
            default:
                return "Stability (" + s.criterion() + "): asymptotically stable exactly when "
                        + s.conditions().stream().map(Constraint::toString).collect(Collectors.joining(" and ")) + ".";
        }
    }

    /** Parameter values as {@code m = 2, c = 1/5}. */
    public static String values(Map<String, Rational> values) {
        return values.entrySet().stream().map(e -> e.getKey() + " = " + e.getValue()).collect(Collectors.joining(", "));
    }
}
