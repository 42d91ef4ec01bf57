package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.Slip;
import java.io.UncheckedIOException;
import java.util.Locale;

/**
 * The answer to a claim check as one JSON object. Keys: verdict ("holds" | "fails"), exact,
 * claim, readAs, digits, equation {holds, residual, detail}, conditions [{condition, claimed,
 * required, holds}], firstMismatch {at, claimed, actual} (a sequence's first differing index, null
 * when there is none), largestDifference {at, claimed, actual, difference} (a function's, on the
 * grid; difference "0" and no point when the claim is the solution exactly), slips [{kind, explanation, corrected}], solution (as in solve's JSON), notes.
 * A part not decided has holds null.
 *
 * @since 0.3
 */
public final class ClaimJsonRenderer {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ClaimJsonRenderer() {
    }

    /**
     * The report as JSON text.
     *
     * @param r the check's report
     * @return one pretty-printed JSON object
     */
    public static String render(ClaimReport r) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("verdict", r.holds() ? "holds" : "fails");
        root.put("exact", r.exact());
        root.put("claim", r.claim());
        root.put("readAs", r.asRead().map(ClaimText::of).orElse(r.reading()));
        root.put("digits", r.digits());
        ObjectNode equation = root.putObject("equation");
        holds(equation, r.equation().decision());
        equation.put("residual", r.equation().decision() == Decision.HOLDS ? "0"
                : r.equation().residual().map(Formulas::plain).orElse(null));
        equation.put("detail", r.equation().detail());
        ArrayNode conditions = root.putArray("conditions");
        for (ConditionFinding c : r.conditions()) {
            ObjectNode node = conditions.addObject().put("condition", EquationText.condition(r.problem(), c.condition()))
                    .put("claimed", c.claimed()).put("required", c.condition().value().toString());
            holds(node, c.decision());
        }
        String key = r.sequence() ? "firstMismatch" : "largestDifference";
        root.putNull("firstMismatch");
        if (!r.sequence() && r.holds() && r.exact()) {
            root.putObject(key).putNull("at").put("difference", "0");
        }
        r.mismatch().ifPresent(m -> {
            ObjectNode node = root.putObject(key).put("at", m.at()).put("claimed", m.claimed()).put("actual", m.actual());
            if (!r.sequence()) {
                node.put("difference", m.difference());
            }
        });
        ArrayNode slips = root.putArray("slips");
        for (Slip s : r.slips()) {
            slips.addObject().put("kind", s.kind().name().toLowerCase(Locale.ROOT).replace('_', '-'))
                    .put("explanation", s.explanation()).put("corrected", ClaimText.of(s.corrected()));
        }
        JsonRenderer.solution(root.putObject("solution"), r.solution().solution().closedForm(), r.solution());
        ArrayNode notes = root.putArray("notes");
        r.notes().forEach(notes::add);
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void holds(ObjectNode node, Decision d) {
        if (d == Decision.UNDECIDED) {
            node.putNull("holds");
        } else {
            node.put("holds", d == Decision.HOLDS);
        }
    }
}
