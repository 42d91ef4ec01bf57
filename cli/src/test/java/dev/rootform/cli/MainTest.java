package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** End-to-end tests of the command through {@link Main#execute}. */
class MainTest {
    /** Exit code, stdout and stderr of one run. */
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void solvesFibonacciExactly() {
        Run r = run("solve", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "--values-at", "10,100");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("x[10] = 55"), r.out());
        assertTrue(r.out().contains("x[100] = 354224848179261915075"), r.out());
        assertTrue(r.out().contains("verified"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void jsonHasTheContractKeys() throws Exception {
        Run r = run("solve", "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0", "--format", "json", "--values-at", "1", "--digits", "40");
        assertEquals(0, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        for (String key : new String[] {"domain", "order", "characteristic", "roots", "solution", "constants",
                "verification", "diagnostics", "values", "warnings"}) {
            assertTrue(json.has(key), key);
        }
        assertEquals("differential", json.get("domain").asText());
        assertTrue(json.get("verification").get("verified").asBoolean());
        // y(1) = e^{-1}(cos 2 + ½ sin 2) (common practice), to 40 digits
        double expected = Math.exp(-1) * (Math.cos(2) + 0.5 * Math.sin(2));
        String value = json.get("values").get(0).get("value").asText();
        assertEquals(expected, Double.parseDouble(value), 1e-15);
        assertTrue(value.replace("-", "").replace("0.", "").length() >= 39, value);
    }

    @Test
    void jsonOfAForcedStableSystemHasItsPartsAndSteadyState() throws Exception {
        Run r = run("solve", "y'' + 3y' + 2y = 2sin(3t); y(0) = 0; y'(0) = 0", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertTrue(json.get("solution").get("particular").asText().contains("sin(3t)"), r.out());
        // gain 1/|χ(3i)| = 1/|-7 + 9i| = 1/√130 (common practice: frequency response)
        assertEquals(1 / Math.sqrt(130), json.get("steadyState").get(0).get("gain").asDouble(), 1e-15);
    }

    @Test
    void jsonOfABoundaryValueProblemHasTheConstants() throws Exception {
        // y'' - y = 0, y(0) = 0, y(1) = 1 → sinh t / sinh 1 = (e^t - e^(-t))/(e - 1/e) (common practice)
        Run r = run("solve", "y'' - y = 0; y(0) = 0; y(1) = 1", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode constants = new ObjectMapper().readTree(r.out()).get("solution").get("constantValues");
        double c = 1 / (Math.E - 1 / Math.E);
        assertEquals(-c, constants.get("C1").asDouble(), 1e-15);
        assertEquals(c, constants.get("C2").asDouble(), 1e-15);
    }

    @Test
    void jsonOfABoundaryValueProblemWithExactEntriesHasExactConstants() throws Exception {
        // y'' + y = 0, y(0) = 1, y(π/2) = 2 → cos t + 2 sin t (common practice): cos(π/2) = 0, sin(π/2) = 1
        Run r = run("solve", "y'' + y = 0; y(0) = 1; y(pi/2) = 2", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode solution = new ObjectMapper().readTree(r.out()).get("solution");
        assertEquals("y(t) = cos(t) + 2·sin(t)", solution.get("text").asText());
        assertTrue(solution.get("constantValues") == null || solution.get("constantValues").isEmpty(), solution.toString());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', value = {
        "y'' + (2y' = 0|unbalanced",
        "y'' + z = 0|",
        "y*y' + y = 0|nonlinear",
        "t*y' + y = 0|variable coefficient",
        "''|empty",
        "y'' + y = 0; y(0) = 1|needs exactly 2",
        "y'' + y = tan(t); y(0) = 1; y'(0) = 0|out of scope",
        "x[n+2] = x[n+1] + cos(2n); x[0] = 1; x[1] = 2|characteristic root 0 forced by a sampled sinusoid",
        "x[n+1] = 0.9x[n] + sin(0.3n); x[300] = 1|indices up to 100",
        "x[n+1] = x[n] + 1/n; x[0] = 1|",
        "x[n+1] = x[n] + cos(2 pi n/7); x[0] = 1|lies in no quadratic field",
        "x[n+1] = x[n] + cos(pi n/4) + sin(pi n/6); x[0] = 1|mixes values",
        "x[n+2] = 2x[n]; x[0] = 1; x[0] = 2|given twice",
        "x[n+2] = -x[n]; x[0] = 0; x[2] = 1|every solution has x[0] + x[2] = 0, but the given values make it 1",
        "x[n+2] = -x[n]; x[0] = 0; x[2] = 0|adding any multiple of sin(πn/2) keeps every condition",
        "y'' = 0; y'(0) = 1; y'(1) = 1|singular",
        "y'' + y = 0; y(0) = 0; y(pi) = 0|adding any multiple of sin(t) keeps every condition",
        "y'' + y = 0; y(0) = 0; y(pi) = 1|contradict each other",
    })
    void badInputGetsOneLineAndExitCodeTwo(String input, String fragment) {
        Run r = run("solve", input);
        assertEquals(2, r.code(), r.out() + r.err());
        assertEquals("", r.out());
        assertTrue(r.err().startsWith("rootform: "), r.err());
        assertTrue(fragment == null || r.err().contains(fragment), r.err());
        assertTrue(!r.err().contains("Exception") && !r.err().contains("\tat "), r.err());
    }

    @Test
    void caretPointsAtTheProblem() {
        Run r = run("solve", "y'' + (2y' = 0");
        String[] lines = r.err().split("\\R");
        assertEquals(3, lines.length, r.err());
        assertEquals(lines[1].indexOf('('), lines[2].indexOf('^'), r.err());
    }

    @Test
    void badValuesAtListIsBadInput() {
        Run r = run("solve", "x[n+1] = 2x[n]; x[0] = 1", "--values-at", "1,zz");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("'zz'"), r.err());
    }

    @Test
    void generalSolutionHasFreeConstants() {
        Run r = run("solve", "(D+1)^2 (D^2+4) y = 0");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("C4"), r.out());
    }

    @Test
    void writesTheAnswerToAFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("answer.json");
        Run r = run("solve", "x[n+1] = 3x[n]; x[0] = 2", "--format", "json", "-o", file.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals("", r.out());
        assertTrue(Files.readString(file).contains("\"verification\""));
        try (var listing = Files.list(dir)) {
            assertEquals(1, listing.count(), "no temporary file left behind");
        }
    }

    @Test
    void versionHelpAndDemo() {
        assertEquals(0, run("--version").code());
        assertTrue(run("--help").out().contains("solve"));
        Run demo = run("demo");
        assertEquals(0, demo.code(), demo.err());
        assertTrue(demo.out().contains("verified"));
    }

    @Test
    void aJobPastItsTimeLimitExitsWithOne() {
        // factoring a degree-200 trinomial over Z takes JAS far longer than one second
        Run r = run("solve", "x[n+200] = x[n+3] + x[n+1] + x[n]", "--time-limit", "1");
        assertEquals(1, r.code(), r.err());
        assertTrue(r.err().startsWith("rootform: gave up after 1 s"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void unknownOptionIsBadInput() {
        Run r = run("solve", "x[n+1] = x[n]; x[0] = 1", "--frobnicate");
        assertEquals(2, r.code());
    }

    @ParameterizedTest(name = "[{index}] {0} {1}")
    @CsvSource(delimiter = '|', value = {
        "--class|class", "--class|A;B", "--package|a.int", "--function|int", "--function|f();x"})
    void badCodeNamesAreBadInput(String option, String name) {
        Run r = run("solve", "x[n+1] = 2x[n]; x[0] = 1", "--format", "java", option, name);
        assertEquals(2, r.code(), r.err());
        assertEquals("", r.out());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void writesCWithASeparateHeader(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("fib.c");
        Run r = run("solve", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "--format", "c", "--function", "fib",
                "-o", c.toString(), "--header", dir.resolve("fib.h").toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.readString(c).contains("#include \"fib.h\""));
        assertTrue(Files.readString(dir.resolve("fib.h")).contains("double fib(long n);"));
    }
}
