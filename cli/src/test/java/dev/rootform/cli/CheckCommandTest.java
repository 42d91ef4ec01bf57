package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code rootform check} end to end: exit codes 0 / 4 / 2, the explanation, JSON keys, and refusals with a caret. */
class CheckCommandTest {
    @Test
    void aClaimThatHoldsExitsZero() {
        // Tower of Hanoi: T(n) = 2T(n−1) + 1, T(0) = 0 gives 2^n − 1 (OEIS A000225, from memory)
        MainTest.Run r = MainTest.run("check", "x[n] = 2x[n-1] + 1; x[0] = 0", "--claim", "2^n - 1");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("holds (exact)"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void aFailingClaimExitsFourWithItsExplanation() {
        MainTest.Run r = MainTest.run("check", "x[n] = 2x[n-1] + 1; x[0] = 0", "--claim", "2^(n+1) - 1");
        assertEquals(4, r.code(), r.err());
        assertTrue(r.out().contains("fails (exact)"), r.out());
        assertTrue(r.out().contains("first mismatch  n = 0: claimed 1, solution 0"), r.out());
        assertTrue(r.out().contains("index origin shifted"), r.out());
        assertTrue(r.out().contains("x[n] = 2^n - 1 for n ≥ 0"), r.out());
    }

    @Test
    void jsonHasTheContractKeys() throws Exception {
        MainTest.Run r = MainTest.run("check", "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0", "--claim",
                "e^(-t)(cos(2t) - 1/2 sin(2t))", "--format", "json");
        assertEquals(4, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        for (String key : new String[] {"verdict", "exact", "equation", "conditions", "firstMismatch", "slips", "solution"}) {
            assertTrue(json.has(key), key);
        }
        assertEquals("fails", json.get("verdict").asText());
        assertTrue(json.get("exact").asBoolean());
        assertTrue(json.get("equation").get("holds").asBoolean());
        JsonNode condition = json.get("conditions").get(1);
        assertEquals("y'(0) = 0", condition.get("condition").asText());
        assertEquals("-2", condition.get("claimed").asText());
        assertEquals("0", condition.get("required").asText());
        assertEquals(false, condition.get("holds").asBoolean());
        assertEquals("constant-sign", json.get("slips").get(0).get("kind").asText());
        assertTrue(json.get("largestDifference").has("difference"), r.out());
        assertEquals("y(t) = e^(-t)·(cos(2t) + 1/2·sin(2t))", json.get("solution").get("text").asText());
    }

    @Test
    void aResidualIsShownInClosedForm() {
        MainTest.Run r = MainTest.run("check", "x[n+1] = 2x[n] + 3^n; x[0] = 0", "--claim", "2·3^n");
        assertEquals(4, r.code(), r.err());
        assertTrue(r.out().contains("not satisfied: leaves 3^n"), r.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        2^(n+1                 | unbalanced '('            | 2
        tan(n) + 1             | unknown function 'tan'   | 0
        2^t - 1                | unknown name 't'         | 2
        """)
    void badClaimsExitTwoWithACaret(String claim, String message, int column) {
        MainTest.Run r = MainTest.run("check", "x[n+1] = 2x[n]; x[0] = 1", "--claim", claim);
        assertEquals(2, r.code(), r.err());
        assertEquals("", r.out());
        String[] lines = r.err().split("\\R");
        assertTrue(lines[0].contains(message), r.err());
        assertEquals("  " + claim, lines[1]);
        assertEquals("  " + " ".repeat(column) + "^", lines[2]);
    }

    @Test
    void aBadProblemAndAMissingClaimExitTwo() {
        assertEquals(2, MainTest.run("check", "x[n+1] = (2x[n]; x[0] = 1", "--claim", "2^n").code());
        assertEquals(2, MainTest.run("check", "x[n+1] = 2x[n]; x[0] = 1").code());
        assertEquals(2, MainTest.run("check", "x[n+2] = -x[n]; x[0] = 1; x[2] = 0", "--claim", "1").code());
    }

    @Test
    void aNumericVerdictSaysSo() {
        // y'' = y, y(0) = 0, y(1) = 1 has y = sinh t / sinh 1 (common practice)
        MainTest.Run r = MainTest.run("check", "y'' - y = 0; y(0) = 0; y(1) = 1", "--claim", "(e^t - e^(-t))/(e - e^(-1))",
                "--digits", "25");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("holds (numeric, 25 digits)"), r.out());
        assertTrue(r.out().contains("not a proof"), r.out());
    }
}
