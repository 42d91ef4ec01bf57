package dev.rootform.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Duration;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** One batch line in, one answer line out, for every kind of line. */
class BatchRequestTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private static BatchAnswer answer(String line) {
        return BatchRequest.parse(line, 7).answer(BatchRequest.DEFAULT_TIME_LIMIT);
    }

    private static JsonNode json(BatchAnswer a) throws Exception {
        assertFalse(a.json().contains("\n"), a.json());
        return MAPPER.readTree(a.json());
    }

    @Test
    void aSolveAnswerIsTheSolveJsonWithIdAndExit() throws Exception {
        BatchAnswer a = answer("{\"id\": \"a1\", \"command\": \"solve\", \"problem\": \"x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1\","
                + " \"digits\": 30, \"valuesAt\": [\"10\", 100], \"format\": \"json\"}");
        JsonNode j = json(a);
        assertEquals("a1", a.id());
        assertEquals(BatchAnswer.Status.SOLVED, a.status());
        assertEquals("a1", j.get("id").asText());
        assertEquals(0, j.get("exit").asInt());
        assertTrue(j.get("verification").get("verified").asBoolean());
        // F(10) = 55 and F(100) = 354224848179261915075 (OEIS A000045, from memory)
        assertEquals("55", j.get("values").get(0).get("exact").asText());
        assertEquals("354224848179261915075", j.get("values").get(1).get("exact").asText());
    }

    @Test
    void theCommandDefaultsToSolveAndTheIdToTheLineNumber() throws Exception {
        BatchAnswer a = answer("{\"problem\": \"x[n+1] = 2x[n]; x[0] = 3\", \"valuesAt\": \"5\"}");
        JsonNode j = json(a);
        assertEquals("7", a.id());
        assertEquals(7, j.get("id").asInt());
        // 3·2^5 = 96 (common practice)
        assertEquals("96", j.get("values").get(0).get("exact").asText());
    }

    /** 3·2^70000 has 21,073 digits: the exact form is given beyond 20,000 digits only when all digits are asked for. */
    @Test
    void allDigitsGivesTheExactValueBeyondTheUsualSize() throws Exception {
        String line = "{\"problem\": \"x[n+1] = 2x[n]; x[0] = 3\", \"valuesAt\": \"70000\"";
        JsonNode rounded = json(answer(line + "}")).get("values").get(0);
        assertTrue(rounded.get("exact").isNull(), rounded.toString());
        JsonNode all = json(answer(line + ", \"allDigits\": true}")).get("values").get(0);
        // 3·2^n (common practice)
        assertEquals(java.math.BigInteger.valueOf(3).shiftLeft(70000).toString(), all.get("exact").asText());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "digts": 3}    | unknown field "digts" for solve
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "digits": "3"} | "digits" must be a whole number in 1..10000
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "digits": 0}   | "digits" must be a whole number in 1..10000
        {"id": "b", "command": "tally", "problem": "x[n+1] = x[n]"}      | unknown command "tally" (one of check, recover, response, solve)
        {"id": "b"}                                                       | the request has no "problem"
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "format": "pdf"} | "format" pdf is not one of
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "header": "a.h"}  | "header" is for format c
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "class": "class"} | 'class' is not a Java class name
        {"id": "b", "problem": "x[n+1] = x[n]; x[0] = 1", "timeLimit": 0}   | "timeLimit" must be a number of seconds
        {"id": "b", "problem": "y'' + (2y' = 0"}                          | unbalanced '(' (at column 7 of "y'' + (2y' = 0")
        {"id": "b", "problem": "x[n+2] = -x[n]; x[0] = 1; x[2] = 0"}      | every solution has x[0] + x[2] = 0
        {"id": "b", "problem": "x[n+2] = -x[n]; x[0] = 1; x[2] = -1"}     | adding any multiple of sin(πn/2) keeps every condition
        {"id": "b", "problem": "(D+1) y = 0", "format": "java"}          | code output needs fitted constants
        """)
    void aRefusedLineIsAnErrorObjectWithExitCodeTwo(String line, String message) throws Exception {
        BatchAnswer a = answer(line);
        JsonNode j = json(a);
        assertEquals(2, a.exit(), a.json());
        assertEquals(BatchAnswer.Status.REFUSED, a.status());
        assertEquals("b", j.get("id").asText());
        assertEquals(2, j.get("exit").asInt());
        assertTrue(j.get("error").asText().contains(message), a.json());
        assertEquals(3, j.size(), "only id, error, exit: " + a.json());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
        {"id": "a1", "problem": | line 7 is not JSON
        [1, 2]                  | line 7 is not a JSON object
        {"id": 1.5}             | "id" must be a string or a whole number
        {"id": "x"} {"id": "y"} | line 7 is not JSON
        """)
    void aLineThatIsNoRequestIsAnsweredUnderItsLineNumber(String line, String message) throws Exception {
        BatchAnswer a = answer(line);
        assertEquals("7", a.id());
        assertEquals(2, a.exit());
        assertTrue(json(a).get("error").asText().contains(message), a.json());
    }

    @Test
    void aSlowLineStopsAtItsTimeLimitWithExitCodeOne() throws Exception {
        // factoring a degree-200 trinomial over Z takes far longer than half a second
        BatchAnswer a = answer("{\"id\": 9, \"problem\": \"x[n+200] = x[n+3] + x[n+1] + x[n]\", \"timeLimit\": 0.5}");
        assertEquals(1, a.exit(), a.json());
        assertEquals(BatchAnswer.Status.FAILED, a.status());
        assertEquals("gave up after 0.5 s (raise the time limit to allow more)", json(a).get("error").asText());
    }

    @Test
    void theRunnersDefaultTimeLimitAppliesWhenTheLineSetsNone() throws Exception {
        BatchAnswer a = BatchRequest.parse("{\"problem\": \"x[n+200] = x[n+3] + x[n+1] + x[n]\"}", 1).answer(Duration.ofMillis(300));
        assertEquals("gave up after 0.3 s (raise the time limit to allow more)", json(a).get("error").asText());
    }

    @Test
    void otherFormatsGiveTheirTextInTheAnswer() throws Exception {
        JsonNode java = json(answer("{\"id\": \"j\", \"problem\": \"x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1\", \"format\": \"java\","
                + " \"class\": \"Fibonacci\", \"package\": \"com.example\"}"));
        assertEquals("java", java.get("format").asText());
        assertTrue(java.get("text").asText().contains("public final class Fibonacci"), java.toString());
        JsonNode c = json(answer("{\"id\": \"c\", \"problem\": \"x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1\", \"format\": \"c\","
                + " \"function\": \"fib\", \"header\": \"fib.h\"}"));
        assertTrue(c.get("text").asText().contains("#include \"fib.h\""), c.toString());
        assertTrue(c.get("header").asText().contains("fib(long n)"), c.toString());
    }

    @Test
    void recoverGivesTheRecurrenceInFrontOfItsSolveAnswer() throws Exception {
        // 1, 1, 2, 3, 5, 8, ... are the Fibonacci numbers F(1), F(2), ... (OEIS A000045); F(30) = 832040 (from memory)
        JsonNode j = json(answer("{\"id\": \"rec\", \"command\": \"recover\", \"terms\": [1, 1, 2, 3, 5, 8, 13, 21, 34, 55],"
                + " \"start\": 1, \"valuesAt\": [\"30\"]}"));
        assertEquals(0, j.get("exit").asInt(), j.toString());
        assertEquals(2, j.get("recovered").get("order").asInt(), j.toString());
        assertEquals("832040", j.get("values").get(0).get("exact").asText());
        JsonNode few = json(answer("{\"id\": \"few\", \"command\": \"recover\", \"terms\": \"1, 2, 4\"}"));
        assertEquals(2, few.get("exit").asInt());
        assertTrue(few.get("error").asText().contains("too few"), few.toString());
        JsonNode java = json(answer("{\"id\": \"j\", \"command\": \"recover\", \"terms\": \"1, 2, 4, 8, 16, 32\", \"format\": \"java\","
                + " \"class\": \"Powers\"}"));
        assertTrue(java.get("text").asText().contains("public final class Powers"), java.toString());
        JsonNode none = json(answer("{\"id\": \"n\", \"command\": \"recover\", \"terms\": \"1, 2, 4, 8, 16, 32\", \"problem\": \"x[n+1] = x[n]\"}"));
        assertTrue(none.get("error").asText().contains("unknown field \"problem\" for recover"), none.toString());
    }

    @Test
    void responseGivesTheTransferFunctionsFactsAndResponse() throws Exception {
        // H(s) = 4/(s^2 + 2s + 4): ω_n = 2, ζ = 1/2; final value H(0) = 1 (final-value theorem) and
        // overshoot exp(−ζπ/√(1 − ζ²)) = exp(−π/√3) ≈ 16.30 % (common practice: the standard second-order formulas)
        JsonNode j = json(answer("{\"id\": \"r\", \"command\": \"response\", \"transfer\": \"H(s) = 4/(s^2 + 2s + 4)\","
                + " \"to\": \"step\", \"frequencies\": [\"0\", \"2\"], \"digits\": 12}"));
        assertEquals(0, j.get("exit").asInt(), j.toString());
        assertEquals("1", j.get("dcGain").get("exact").asText());
        assertEquals("1", j.get("stepFigures").get("finalValue").asText());
        assertEquals(100 * Math.exp(-Math.PI / Math.sqrt(3)), j.get("stepFigures").get("overshootPercent").asDouble(), 1e-9);
        assertEquals(2, j.get("frequencyResponse").size(), j.toString());
        JsonNode page = json(answer("{\"id\": \"p\", \"command\": \"response\", \"transfer\": \"H(z) = 1/(1 - 0.5z^-1)\","
                + " \"format\": \"html\"}"));
        assertTrue(page.get("text").asText().contains("poles-plot"), page.toString());
        JsonNode missing = json(answer("{\"id\": \"m\", \"command\": \"response\", \"to\": \"step\"}"));
        assertEquals(2, missing.get("exit").asInt());
        assertTrue(missing.get("error").asText().contains("transfer"), missing.toString());
        JsonNode delay = json(answer("{\"id\": \"d\", \"command\": \"response\", \"transfer\": \"H(s) = e^(-s)/(s + 1)\"}"));
        assertEquals(2, delay.get("exit").asInt(), delay.toString());
    }

    @Test
    void aGeneralSolutionIsAnswered() throws Exception {
        BatchAnswer a = answer("{\"id\": \"g\", \"problem\": \"(D+1)^2 (D^2+4) y = 0\"}");
        assertEquals(0, a.exit(), a.json());
        assertTrue(json(a).get("solution").get("general").asBoolean(), a.json());
    }

    @Test
    void theIdOfAWrittenAnswerIsReadBackAndATornLineHasNone() {
        BatchAnswer a = answer("{\"id\": \"r\", \"problem\": \"x[n+1] = 2x[n]; x[0] = 1\"}");
        assertEquals(Optional.of("r"), BatchAnswer.idOf(a.json()));
        assertEquals(Optional.of("12"), BatchAnswer.idOf("{\"id\": 12, \"error\": \"e\", \"exit\": 2}"));
        assertEquals(Optional.empty(), BatchAnswer.idOf(a.json().substring(0, a.json().length() / 2)));
        assertEquals(Optional.empty(), BatchAnswer.idOf("{\"exit\": 0}"));
    }
}
