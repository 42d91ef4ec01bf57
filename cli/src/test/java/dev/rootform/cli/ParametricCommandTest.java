package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.rootform.cli.MainTest.Run;
import org.junit.jupiter.api.Test;

/** {@code rootform solve --params} end to end: text, JSON, --at, exit codes. */
class ParametricCommandTest {
    private static final String OSCILLATOR = "m y'' + c y' + k y = 0; y(0) = x0; y'(0) = v0";

    @Test
    void textListsTheThreeDampingRegimesAndStability() {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("1. when 4·m·k > c^2  [complex pair]"), r.out());
        assertTrue(r.out().contains("2. when 4·m·k = c^2  [double root]"), r.out());
        assertTrue(r.out().contains("3. when 4·m·k < c^2  [two real roots]"), r.out());
        assertTrue(r.out().contains("asymptotically stable exactly when c > 0"), r.out());
        assertTrue(r.out().contains("Verified exactly over Q(m, c, k, x0, v0)"), r.out());
    }

    @Test
    void jsonHasCasesWithWhenAndSolutionAndValuesAtTheGivenPoint() throws Exception {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0",
                "--at", "m=2, c=0.4, k=8, x0=0.01, v0=0", "--values-at", "1", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals(3, json.get("cases").size());
        for (JsonNode c : json.get("cases")) {
            assertTrue(c.has("when") && c.has("solution"), c.toString());
        }
        assertEquals(1, json.get("at").get("case").asInt());
        assertEquals("1", json.get("values").get(0).get("at").asText());
        assertTrue(json.get("verified").asBoolean());
        assertEquals("when", json.get("stability").get("verdict").asText());
    }

    @Test
    void badParameterUseExitsTwoWithOneLine() {
        Run r = MainTest.run("solve", "m y'' + k y*y = 0", "--params", "m,k");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("nonlinear term"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void latexPutsTheCasesInOneCasesEnvironment() {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0", "--format", "latex");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("y\\left(t\\right) = \\begin{cases}") || r.out().contains("= \\begin{cases}"), r.out());
        assertEquals(2, r.out().split("\\\\\\\\\n", -1).length - 1, r.out());
        assertTrue(r.out().contains("\\end{cases}") && r.out().contains("\\sqrt{") && r.out().contains("\\omega_{1}"), r.out());
    }

    @Test
    void mathMlIsWellFormedWithOneTableRowPerCase() throws Exception {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0", "--format", "mathml");
        assertEquals(0, r.code(), r.err());
        javax.xml.parsers.DocumentBuilderFactory factory = javax.xml.parsers.DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        org.w3c.dom.Document doc = factory.newDocumentBuilder().parse(new org.xml.sax.InputSource(
                new java.io.StringReader("<root>" + r.out() + "</root>")));
        assertEquals(3, doc.getElementsByTagNameNS("http://www.w3.org/1998/Math/MathML", "mtr").getLength());
    }
}
