package dev.rootform.api.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/** The batch's {@code check} command: the check's JSON with id and exit, and the command line's exit codes. */
class CheckLineTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private static JsonNode answer(String line) throws Exception {
        return MAPPER.readTree(BatchRequest.parse(line, 3).answer(BatchRequest.DEFAULT_TIME_LIMIT).json());
    }

    @Test
    void aClaimThatHoldsExitsZero() throws Exception {
        // Tower of Hanoi 2^n − 1 (OEIS A000225, from memory)
        JsonNode j = answer("{\"id\": \"h\", \"command\": \"check\", \"problem\": \"x[n] = 2x[n-1] + 1; x[0] = 0\", \"claim\": \"2^n - 1\"}");
        assertEquals(0, j.get("exit").asInt());
        assertEquals("holds", j.get("verdict").asText());
        assertTrue(j.get("exact").asBoolean());
    }

    @Test
    void aFailingClaimExitsFourWithItsSlips() throws Exception {
        JsonNode j = answer("{\"id\": \"f\", \"command\": \"check\", \"problem\": \"x[n] = 2x[n-1] + 1\", \"given\": [\"x[0] = 0\"],"
                + " \"claim\": \"2^(n+1) - 1\", \"digits\": 20}");
        assertEquals(4, j.get("exit").asInt());
        assertEquals("index-origin", j.get("slips").get(0).get("kind").asText());
        assertEquals("0", j.get("firstMismatch").get("at").asText());
    }

    @Test
    void aBadClaimAndAMissingOneAreErrors() throws Exception {
        JsonNode bad = answer("{\"command\": \"check\", \"problem\": \"x[n+1] = 2x[n]; x[0] = 1\", \"claim\": \"tan(n)\"}");
        assertEquals(2, bad.get("exit").asInt());
        assertTrue(bad.get("error").asText().contains("unknown function 'tan'"), bad.toString());
        JsonNode missing = answer("{\"command\": \"check\", \"problem\": \"x[n+1] = 2x[n]; x[0] = 1\"}");
        assertEquals(2, missing.get("exit").asInt());
        assertTrue(missing.get("error").asText().contains("\"claim\""), missing.toString());
    }
}
