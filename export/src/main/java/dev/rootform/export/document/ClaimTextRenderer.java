package dev.rootform.export.document;

import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Mismatch;
import dev.rootform.symbolic.claim.Slip;
import java.math.MathContext;
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
    private ClaimTextRenderer() {
    }

    /**
     * The whole answer, one fact per line.
     *
     * @param r the check's report
     * @return the text, ending in a newline
     */
    public static String render(ClaimReport r) {
        Layout out = new Layout()
                .line("claim", r.claim())
                .line("read as", r.asRead().map(ClaimText::of).orElse(r.reading()))
                .line("verdict", (r.holds() ? "holds" : "fails") + (r.exact() ? " (exact)" : " (numeric, " + r.digits() + " digits)"))
                .line("equation", equation(r.equation()));
        List<String> conditions = new ArrayList<>();
        for (ConditionFinding c : r.conditions()) {
            conditions.add(EquationText.condition(r.problem(), c.condition()) + ": claimed " + c.claimed() + ", "
                    + word(c.decision()) + (c.exact() || c.decision() == Decision.UNDECIDED ? "" : " (numeric)"));
        }
        out.section("conditions", conditions);
        r.mismatch().ifPresent(m -> out.line(r.sequence() ? "first mismatch" : "largest diff.", mismatch(r, m)));
        if (!r.sequence() && r.holds() && r.exact()) {
            out.line("largest diff.", "0 (the claim is the solution exactly)");
        }
        List<String> slips = new ArrayList<>();
        for (Slip s : r.slips()) {
            slips.add(s.kind().label() + ": " + s.explanation());
            slips.add("  corrected: " + ClaimText.of(s.corrected()));
        }
        return out.section("slips", slips).section("solution", solution(r)).section("notes", r.notes()).toString();
    }

    /** The correct solution as a claim, and its numerically fixed constants. */
    private static List<String> solution(ClaimReport r) {
        List<String> lines = new ArrayList<>(List.of(ClaimText.of(r.solution().solution().closedForm())));
        r.solution().analysis().constantValues().forEach((name, value) -> lines.add("  " + name + " ≈ "
                + value.round(new MathContext(r.digits())).stripTrailingZeros().toPlainString()));
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
        String v = r.problem().variable();
        return r.sequence() ? v + " = " + m.at() + ": claimed " + m.claimed() + ", solution " + m.actual()
                : m.difference() + " at " + v + " = " + m.at() + " (claimed " + m.claimed() + ", solution " + m.actual() + ")";
    }

    private static String word(Decision d) {
        return d == Decision.HOLDS ? "holds" : d == Decision.FAILS ? "fails" : "not checked";
    }
}
