package dev.rootform.export.document;

import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Mismatch;
import dev.rootform.symbolic.claim.Slip;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;

/**
 * The answer to a claim check for a person on a terminal: the verdict first, then the equation
 * part, the conditions, where claim and solution differ, the slips with their corrections and the
 * correct solution, each under an aligned label.
 *
 * @since 0.3
 */
public final class ClaimTextRenderer {
    private static final int LABEL_WIDTH = 16;

    private ClaimTextRenderer() {
    }

    public static String render(ClaimReport r) {
        StringBuilder out = new StringBuilder();
        section(out, "claim", List.of(r.claim()));
        section(out, "read as", List.of(r.asRead().map(ClaimText::of).orElse(r.reading())));
        section(out, "verdict", List.of((r.holds() ? "holds" : "fails") + (r.exact() ? " (exact)"
                : " (numeric, " + r.digits() + " digits)")));
        section(out, "equation", List.of(equation(r.equation())));
        List<String> conditions = new ArrayList<>();
        for (ConditionFinding c : r.conditions()) {
            conditions.add(condition(r, c.condition()) + ": claimed " + c.claimed() + ", " + word(c.decision())
                    + (c.exact() || c.decision() == Decision.UNDECIDED ? "" : " (numeric)"));
        }
        section(out, "conditions", conditions);
        r.mismatch().ifPresent(m -> section(out, r.sequence() ? "first mismatch" : "largest diff.", List.of(mismatch(r, m))));
        if (!r.sequence() && r.holds() && r.exact()) {
            section(out, "largest diff.", List.of("0 (the claim is the solution exactly)"));
        }
        List<String> slips = new ArrayList<>();
        for (Slip s : r.slips()) {
            slips.add(s.kind().label() + ": " + s.explanation());
            slips.add("  corrected: " + ClaimText.of(s.corrected()));
        }
        section(out, "slips", slips);
        section(out, "solution", solution(r));
        section(out, "notes", r.notes());
        return out.toString();
    }

    /** The correct solution as a claim, and its numerically fixed constants. */
    private static List<String> solution(ClaimReport r) {
        List<String> lines = new ArrayList<>(List.of(ClaimText.of(r.solution().solution().closedForm())));
        r.solution().analysis().constantValues().forEach((name, value) -> lines.add("  " + name + " ≈ "
                + value.round(new java.math.MathContext(r.digits())).stripTrailingZeros().toPlainString()));
        return lines;
    }

    private static String equation(EquationFinding e) {
        if (e.decision() == Decision.HOLDS) {
            return "satisfied (" + e.detail() + ")";
        }
        if (e.decision() == Decision.UNDECIDED) {
            return "not decided (" + e.detail() + ")";
        }
        return "not satisfied: " + e.residual().map(f -> "leaves " + Formulas.plain(f) + " (" + e.detail() + ")").orElse(e.detail());
    }

    private static String mismatch(ClaimReport r, Mismatch m) {
        String v = r.solution().solution().problem().equation().variable();
        return r.sequence() ? v + " = " + m.at() + ": claimed " + m.claimed() + ", solution " + m.actual()
                : m.difference() + " at " + v + " = " + m.at() + " (claimed " + m.claimed() + ", solution " + m.actual() + ")";
    }

    private static String word(Decision d) {
        return d == Decision.HOLDS ? "holds" : d == Decision.FAILS ? "fails" : "not checked";
    }

    /** {@code x[3] = 5} or {@code y'(0) = 1}. */
    static String condition(ClaimReport r, Condition c) {
        var eq = r.solution().solution().problem().equation();
        String at = c.atTimesPi() ? c.point() : c.at().toString();
        return (eq.domain() == Domain.DIFFERENCE ? eq.function() + "[" + at + "]"
                : eq.function() + "'".repeat(c.derivative()) + "(" + at + ")") + " = " + c.value();
    }

    private static void section(StringBuilder out, String label, List<String> lines) {
        for (int i = 0; i < lines.size(); i++) {
            String head = i == 0 ? label : "";
            out.append(head).append(" ".repeat(Math.max(1, LABEL_WIDTH - head.length()))).append(lines.get(i)).append('\n');
        }
    }
}
