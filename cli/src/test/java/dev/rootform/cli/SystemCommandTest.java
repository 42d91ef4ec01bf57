package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code rootform system} end to end. */
class SystemCommandTest {
    @Test
    void jsonHasTheDocumentedKeys() throws Exception {
        MainTest.Run r = MainTest.run("system", "--a", "[[0,1],[-5,-2]]", "--b", "[[0],[1]]", "--c", "[[1,0]]",
                "--continuous", "--to", "step", "--values-at", "1", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("1/(s^2 + 2s + 5)", j.get("transferMatrix").get(0).get(0).get("text").asText());
        assertEquals("1", j.get("values").get(0).get("at").asText());
        assertEquals(2, j.get("values").get(0).get("state").size());
        assertTrue(j.get("stable").asBoolean());
        assertEquals(2, j.get("controllabilityRank").asInt());
        assertEquals("1/2·e^(-t)·sin(2t)", j.get("transitionMatrix").get("entries").get(0).get(1).get("text").asText());
    }

    @Test
    void otherFormats() {
        String[] base = {"system", "--a", "[[0,1],[-5,-2]]", "--b", "[[0],[1]]", "--c", "[[1,0]]", "--continuous", "--to", "step"};
        MainTest.Run latex = MainTest.run(concat(base, "--format", "latex"));
        assertTrue(latex.out().contains("\\begin{pmatrix}"), latex.out());
        MainTest.Run mathml = MainTest.run(concat(base, "--format", "mathml"));
        assertTrue(mathml.out().contains("<mtable>"), mathml.out());
        MainTest.Run java = MainTest.run(concat(base, "--format", "java", "--class", "Plant"));
        assertEquals(0, java.code(), java.err());
        assertTrue(java.out().contains("public final class Plant"), java.out());
        MainTest.Run html = MainTest.run(concat(base, "--format", "html"));
        assertEquals(0, html.code(), html.err());
        assertTrue(html.out().startsWith("<!DOCTYPE html>") && html.out().contains("y1-plot"), html.out());
        MainTest.Run withCode = MainTest.run(concat(base, "--format", "html", "--with-code", "java"));
        assertEquals(2, withCode.code(), withCode.out());
        assertTrue(withCode.err().contains("--with-code is not available"), withCode.err());
        MainTest.Run standalone = MainTest.run(concat(base, "--format", "latex", "--standalone"));
        assertEquals(2, standalone.code(), standalone.out());
        assertTrue(standalone.err().contains("--standalone is not available"), standalone.err());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "[[0,1],[-5,x]]|--continuous|A: entry (2, 2) 'x'",
        "[[0,1],[-5,2],[1,1]]|--continuous|A must be square",
        "[[0,1],[-5,2]]|--discrete|--format java writes the evaluator",
    })
    void badInputExitsTwo(String a, String mode, String message) {
        MainTest.Run r = MainTest.run("system", "--a", a, mode, "--format", message.contains("java") ? "java" : "text");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains(message), r.err());
    }

    @Test
    void missingModeExitsTwo() {
        MainTest.Run r = MainTest.run("system", "--a", "[[1]]");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--continuous"), r.err());
    }

    private static String[] concat(String[] a, String... b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }
}
