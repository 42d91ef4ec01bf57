package dev.rootform.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.Options;
import dev.rootform.api.ParametricExporters;
import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ParametricReport;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Batch lines with parameters ({@code params}, {@code where}, {@code at}): the answer is that of
 * {@link Rootform#solveWithParameters} called directly, rendered in the line's format; bad lines are
 * error objects. Scenarios of our own.
 */
class ParametricLineTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** A door closer: mass m, damping c, spring k, opened by x0 and let go. */
    private static final String CLOSER = "m y'' + c y' + k y = 0; y(0) = x0; y'(0) = 0";

    private static JsonNode answer(String line) throws Exception {
        return MAPPER.readTree(BatchRequest.parse(line, 3).answer(BatchRequest.DEFAULT_TIME_LIMIT).json());
    }

    private static ParametricReport direct(ParametricRequest request) {
        ParametricResult r = Rootform.solveWithParameters(request);
        return assertInstanceOf(ParametricResult.Solved.class, r, r.toString()).report();
    }

    @Test
    void theJsonAnswerIsTheDirectCallsJson() throws Exception {
        JsonNode line = answer("{\"id\": \"closer\", \"problem\": \"" + CLOSER + "\", \"params\": \"m, c, k, x0\","
                + " \"where\": \"m > 0, c >= 0, k > 0\", \"at\": \"m=2, c=1/5, k=8, x0=1/100\", \"valuesAt\": [\"1\", \"5/2\"]}");
        ParametricReport report = direct(ParametricRequest.of(CLOSER, "m, c, k, x0").where("m > 0, c >= 0, k > 0")
                .at("m=2, c=1/5, k=8, x0=1/100").with(Options.builder().points("1", "5/2").build()));
        // the direct call's JSON as a batch line carries it (numbers read exactly, written on one line)
        JsonNode expected = MAPPER.readTree(Json.line(Json.read(ParametricExporters.byName("json").orElseThrow()
                .render(report, CodeNames.defaults()).text())));
        assertEquals(0, line.get("exit").asInt(), line.toString());
        ObjectNode body = ((ObjectNode) line.deepCopy());
        body.remove("id");
        body.remove("exit");
        assertEquals(expected, body);
        // c^2 = 1/25 < 4·m·k = 64: the underdamped case, the first of three
        assertEquals(3, line.get("cases").size(), line.toString());
        assertEquals(1, line.get("at").get("case").asInt(), line.toString());
        assertEquals(2, line.get("values").size(), line.toString());
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"text", "latex", "mathml", "html", "java", "c"})
    void otherFormatsCarryTheDirectCallsText(String format) throws Exception {
        // x[n+1] = a x[n] + 1, x[0] = 0: (a^n − 1)/(a − 1) for a ≠ 1 and n for a = 1 (geometric sum, common practice)
        JsonNode line = answer("{\"problem\": \"x[n+1] = a x[n] + 1; x[0] = 0\", \"params\": \"a\", \"at\": \"a=1\","
                + " \"valuesAt\": \"5\", \"format\": \"" + format + "\", \"function\": \"sum_of_powers\", \"class\": \"SumOfPowers\"}");
        ParametricReport report = direct(ParametricRequest.of("x[n+1] = a x[n] + 1; x[0] = 0", "a").at("a=1")
                .with(Options.builder().points("5").build()));
        String expected = ParametricExporters.byName(format).orElseThrow()
                .render(report, new CodeNames(Optional.empty(), "SumOfPowers", "sum_of_powers", Optional.empty())).text();
        assertEquals(3, line.get("id").asInt(), "the id defaults to the line number");
        assertEquals(0, line.get("exit").asInt(), line.toString());
        assertEquals(format, line.get("format").asText());
        assertEquals(expected, line.get("text").asText());
        assertEquals(2, report.at().orElseThrow().caseNumber());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
        {"id": "b", "problem": "m y'' + q y = 0", "params": "m, k"}                          | undeclared parameter 'q'
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "where": "a > 0"}                | "where" needs "params"
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "at": "a=2"}                     | "at" needs "params"
        {"id": "b", "problem": "x[n+1] = a x[n]", "params": "a", "given": "x[0] = 1"}        | "given" is not taken with "params"
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "params": "a", "format": "pdf"}  | "format" pdf is not available with "params" (text, json, latex, mathml, html, java, c)
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "params": "a", "format": "c", "header": "a.h"} | "header" is not taken with "params"
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "params": "a", "wher": "a > 0"}  | unknown field "wher" for solve
        {"id": "b", "problem": "x[n+1] = a x[n]; x[0] = 1", "params": 7}                     | "params" must be a string
        {"id": "b", "problem": "x[n+1] = a x[n]", "params": "a", "format": "java"}           | this is a general solution
        {"id": "b", "problem": "m y'' + k y = 0", "params": "m, k", "where": "m > 0", "at": "m=-1, k=1"} | do not satisfy --where (m > 0)
        """)
    void aBadParametricLineIsAnErrorObjectWithExitCodeTwo(String line, String message) throws Exception {
        JsonNode j = answer(line);
        assertEquals("b", j.get("id").asText());
        assertEquals(2, j.get("exit").asInt(), j.toString());
        assertTrue(j.get("error").asText().contains(message), j.toString());
        assertEquals(3, j.size(), "only id, error, exit: " + j);
    }
}
