package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricCase;
import java.io.UncheckedIOException;

/**
 * An answer with parameters as one JSON object. Keys: problem, parameters, where, cases [{when,
 * conditions, excluding, substitution, forms, solution, definitions, freeConstants, verified}],
 * notes, verified, checks [{values, case, points, largestDifference, agreed}], stability {criterion,
 * verdict ("always" | "never" | "when"), conditions}, and with --at: at {values, case, problem,
 * answer (solve's JSON)} and values (the answer's values, as in solve).
 *
 * @since 0.3
 */
public final class ParametricJsonRenderer {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ParametricJsonRenderer() {
    }

    public static String render(ParametricReport r) {
        ParametricAnswer a = r.answer();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("problem", a.problem().source().strip());
        ArrayNode names = root.putArray("parameters");
        a.problem().parameters().forEach(names::add);
        root.put("where", a.assumptions().toString());
        ArrayNode cases = root.putArray("cases");
        ParametricFormula formula = new ParametricFormula(a.problem().domain(), a.problem().variable());
        for (ParametricCase c : a.cases()) {
            ObjectNode node = cases.addObject();
            node.put("when", ParametricTextRenderer.when(c));
            ArrayNode conditions = node.putArray("conditions");
            c.when().forEach(x -> conditions.add(x.toString()));
            ArrayNode excluding = node.putArray("excluding");
            c.excluded().forEach(x -> excluding.add(x.toString()));
            node.put("substitution", c.substitution());
            node.put("forms", ParametricTextRenderer.forms(c));
            ParametricFormula.Text t = formula.of(a.problem().function(), c);
            node.put("solution", t.formula());
            ArrayNode definitions = node.putArray("definitions");
            t.definitions().forEach(definitions::add);
            ArrayNode free = node.putArray("freeConstants");
            c.freeConstants().forEach(free::add);
            node.put("verified", c.verified());
        }
        ArrayNode notes = root.putArray("notes");
        a.notes().forEach(notes::add);
        root.put("verified", r.verified());
        ArrayNode checks = root.putArray("checks");
        for (ParametricReport.Agreement g : r.checks()) {
            ObjectNode node = checks.addObject();
            ObjectNode values = node.putObject("values");
            g.values().forEach((k, v) -> values.put(k, v.toString()));
            node.put("case", g.caseNumber());
            ArrayNode points = node.putArray("points");
            g.points().forEach(points::add);
            node.put("largestDifference", g.largestDifference());
            node.put("agreed", g.agreed());
        }
        ObjectNode stability = root.putObject("stability");
        stability.put("criterion", a.stability().criterion());
        stability.put("verdict", a.stability().verdict().name().toLowerCase(java.util.Locale.ROOT));
        ArrayNode sc = stability.putArray("conditions");
        a.stability().conditions().stream().map(Constraint::toString).forEach(sc::add);
        r.at().ifPresent(at -> {
            ObjectNode node = root.putObject("at");
            ObjectNode values = node.putObject("values");
            at.values().forEach((k, v) -> values.put(k, v.toString()));
            node.put("case", at.caseNumber());
            node.put("problem", at.problem().strip());
            try {
                ObjectNode answer = (ObjectNode) MAPPER.readTree(JsonRenderer.render(at.report()));
                node.set("answer", answer);
                if (answer.has("values")) {
                    root.set("values", answer.get("values"));
                }
            } catch (JsonProcessingException e) {
                throw new UncheckedIOException(e);
            }
        });
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
