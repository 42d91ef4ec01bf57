package dev.rootform.export.document;

import static dev.rootform.export.Fixtures.at;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.rootform.export.Fixtures;
import dev.rootform.export.Report;
import java.util.List;
import org.junit.jupiter.api.Test;

class JsonRendererTest {
    private static JsonNode parse(Report r) throws Exception {
        return new ObjectMapper().readTree(JsonRenderer.render(r));
    }

    @Test
    void fibonacciHasEveryKey() throws Exception {
        JsonNode json = parse(Fixtures.report(Fixtures.fibonacci(), List.of(Fixtures.value(10, 55))));
        for (String key : List.of("domain", "order", "equation", "conditions", "characteristic", "roots", "solution",
                "constants", "verification", "diagnostics", "values", "warnings")) {
            assertTrue(json.has(key), key);
        }
        assertEquals("difference", json.get("domain").asText());
        assertEquals(2, json.get("order").asInt());
        assertEquals("x[n+2] - x[n+1] - x[n] = 0", json.get("equation").asText());
        assertEquals("x[1] = 1", json.get("conditions").get(1).asText());
        assertEquals("λ^2 - λ - 1", json.at("/characteristic/factors/0/polynomial").asText());
        assertEquals("1/2 + 1/2·√5", json.at("/roots/0/exact").asText());
        assertTrue(json.at("/roots/0/re").isTextual());
        assertEquals("1.618033989", json.at("/roots/0/re").asText());
        assertEquals(0, json.at("/solution/validFrom").asInt());
        assertFalse(json.at("/solution/general").asBoolean());
        assertTrue(json.at("/solution/latex").asText().startsWith("\\frac{1}{5}"));
        assertEquals("-1/5·√5", json.at("/constants/1/coefficient").asText());
        assertEquals("(1/2 - 1/2·√5)^n", json.at("/constants/1/basis").asText());
        assertTrue(json.at("/verification/verified").asBoolean());
        assertEquals(3, json.at("/verification/checks").size());
        assertEquals(0, json.get("diagnostics").size());
        assertEquals("55", json.at("/values/0/exact").asText());
    }

    @Test
    void generalSolutionWithZeroRoot() throws Exception {
        JsonNode json = parse(Fixtures.report(Fixtures.difference(List.of(), 0, -2, 1), List.of()));
        assertTrue(json.at("/solution/general").asBoolean());
        assertEquals("C1", json.at("/solution/freeConstants/0").asText());
        assertEquals(1, json.at("/solution/validFrom").asInt());
        assertEquals("C1", json.at("/constants/0/coefficient").asText());
        assertEquals("2^n", json.at("/constants/0/basis").asText());
        assertEquals(0, json.get("conditions").size());
    }

    @Test
    void oscillationAndConjugateSumConstants() throws Exception {
        JsonNode osc = parse(Fixtures.report(Fixtures.dampedOscillator(), List.of()));
        assertEquals("e^(-t)·sin(2t)", osc.at("/constants/1/basis").asText());
        assertEquals("1/2", osc.at("/constants/1/coefficient").asText());
        assertFalse(osc.at("/solution").has("validFrom"));
        JsonNode cubic = parse(Fixtures.report(Fixtures.difference(List.of(at(0, 1), at(1, 0), at(2, 0)), -1, -1, 0, 1), List.of()));
        assertEquals(3, cubic.get("constants").size());
        assertEquals("Σ_{λ^3 - λ - 1 = 0} λ^2·λ^n", cubic.at("/constants/2/basis").asText());
        assertEquals("root 2 of λ^3 - λ - 1", cubic.at("/roots/1/exact").asText());
        assertEquals("1E-15", cubic.at("/roots/1/radius").asText());
    }
}
