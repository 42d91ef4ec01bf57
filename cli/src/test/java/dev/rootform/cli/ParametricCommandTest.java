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
        String cases = r.out().substring(r.out().indexOf("\\begin{cases}"), r.out().indexOf("\\end{cases}"));
        assertEquals(3, cases.split("\\\\text\\{\\(\\d\\) ", -1).length - 1, r.out());
        assertTrue(r.out().contains("\\end{cases}") && r.out().contains("\\sqrt{") && r.out().contains("\\omega_{1}"), r.out());
    }

    @Test
    void standaloneLatexIsOneCompleteDocumentWithTheCommentsBeforeThePreamble() {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0", "--format", "latex",
                "--standalone");
        assertEquals(0, r.code(), r.err());
        String tex = r.out();
        int preamble = tex.indexOf("\\documentclass[10pt,a4paper]{article}");
        assertTrue(preamble > 0 && tex.substring(0, preamble).lines().allMatch(l -> l.startsWith("%")), tex);
        assertTrue(tex.indexOf("\\begin{document}") < tex.indexOf("\\begin{cases}") && tex.strip().endsWith("\\end{document}"), tex);
        assertTrue(tex.contains("\\text{(1) if }"), tex);
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

    @Test
    void htmlIsAReportPageWithTheCaseTableAndTheAnswerAtTheValues(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        java.nio.file.Path page = dir.resolve("mast.html");
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0",
                "--at", "m=2, c=0.4, k=8, x0=0.01, v0=0", "--values-at", "1", "--format", "html", "-o", page.toString());
        assertEquals(0, r.code(), r.err());
        String html = java.nio.file.Files.readString(page);
        assertTrue(html.startsWith("<!DOCTYPE html>") && html.contains("</html>"), html);
        for (String part : new String[] {"<h2>Cases</h2>", "<th>holds</th>", "<h2>Stability</h2>", "c &gt; 0", "Case 1 holds",
                "<th>point</th>"}) {
            assertTrue(html.contains(part), "the page lacks " + part);
        }
        Run code = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--format", "html", "--with-code", "java");
        assertEquals(2, code.code(), code.err());
        assertTrue(code.err().contains("carries no code"), code.err());
    }

    @Test
    void generatedJavaBranchesOnTheCaseAndMatchesTheOrdinarySolver(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        Run r = MainTest.run("solve", OSCILLATOR, "--params", "m,c,k,x0,v0", "--where", "m > 0, c >= 0, k > 0", "--format", "java",
                "--class", "Mast");
        assertEquals(0, r.code(), r.err());
        java.nio.file.Files.writeString(dir.resolve("Mast.java"), r.out());
        assertEquals(0, javax.tools.ToolProvider.getSystemJavaCompiler().run(null, null, null, "-d", dir.toString(),
                dir.resolve("Mast.java").toString()), r.out());
        try (java.net.URLClassLoader loader = new java.net.URLClassLoader(new java.net.URL[] {dir.toUri().toURL()})) {
            java.lang.reflect.Method value = loader.loadClass("Mast").getMethod("value", double.class, double.class, double.class,
                    double.class, double.class, double.class);
            // underdamped, critically damped (c = 2√(km), common practice) and overdamped, against the ordinary solver
            String[][] points = {{"2", "0.4", "8"}, {"1", "4", "4"}, {"1", "5", "4"}};
            for (String[] p : points) {
                Run ordinary = MainTest.run("solve", "(" + p[0] + ") y'' + (" + p[1] + ") y' + (" + p[2] + ") y = 0; y(0) = 1/100; y'(0) = 1/2",
                        "--values-at", "3/2", "--format", "json");
                double expected = new ObjectMapper().readTree(ordinary.out()).get("values").get(0).get("value").asDouble();
                double actual = (double) value.invoke(null, Double.parseDouble(p[0]), Double.parseDouble(p[1]), Double.parseDouble(p[2]),
                        0.01, 0.5, 1.5);
                assertEquals(expected, actual, 1e-12 * Math.max(1, Math.abs(expected)), String.join(",", p));
            }
        }
    }

    @Test
    void generatedCCompilesAndTakesTheRecurrencesResonantCase(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        // x[n+1] = a x[n] + 1, x[0] = 0: the geometric sum, and n at a = 1 (common practice)
        Run r = MainTest.run("solve", "x[n+1] = a x[n] + 1; x[0] = 0", "--params", "a", "--format", "c", "--function", "sum");
        assertEquals(0, r.code(), r.err());
        java.nio.file.Files.writeString(dir.resolve("sum.c"), r.out() + "\n#include <stdio.h>\nint main(void) {\n"
                + "    printf(\"%.17g %.17g\\n\", sum(1.0, 7), sum(0.5, 3));\n    return 0;\n}\n");
        Process gcc = new ProcessBuilder("gcc", "-std=c99", "-Wall", "-Werror", "-o", dir.resolve("sum").toString(),
                dir.resolve("sum.c").toString(), "-lm").redirectErrorStream(true).start();
        String log = new String(gcc.getInputStream().readAllBytes());
        assertEquals(0, gcc.waitFor(), log + r.out());
        Process run = new ProcessBuilder(dir.resolve("sum").toString()).start();
        String[] out = new String(run.getInputStream().readAllBytes()).trim().split(" ");
        assertEquals(0, run.waitFor());
        assertEquals(7.0, Double.parseDouble(out[0]), 1e-12);
        assertEquals(1.75, Double.parseDouble(out[1]), 1e-12);
    }
}
