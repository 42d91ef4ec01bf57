package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** End-to-end tests of {@code rootform response} through {@link Main#execute}. */
class ResponseCommandTest {
    @Test
    void stepResponseOfASecondOrderSection() {
        MainTest.Run r = MainTest.run("response", "H(s) = (s + 3)/(s^2 + 2s + 5)", "--to", "step", "--values-at", "0,1");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("DC gain         H(0) = 3/5"), r.out());
        assertTrue(r.out().contains("y'' + 2y' + 5y = u' + 3u"), r.out());
        assertTrue(r.out().contains("solved as       y'' + 2y' + 5y = 3; y(0) = 0; y'(0) = 1"), r.out());
        assertTrue(r.out().contains("steady (forced): 3/5"), r.out());
        // peak time of y = 3/5 − e^(−t)(3/5 cos 2t − 1/5 sin 2t): y' = e^(−t)(cos 2t + sin 2t) = 0 at 2t = 3π/4 (hand algebra)
        assertTrue(r.out().contains("peak time " + new java.math.BigDecimal(3 * Math.PI / 8).round(new java.math.MathContext(10))
                .toPlainString().substring(0, 10)), r.out());
        assertTrue(r.out().contains("verified"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void jsonHasTheContractKeys() throws Exception {
        MainTest.Run r = MainTest.run("response", "H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)", "--to", "step", "--format", "json",
                "--frequencies", "0,pi/2,pi", "--values-at", "0,5");
        assertEquals(0, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        for (String key : new String[] {"poles", "zeros", "dcGain", "stable", "equivalentEquation", "frequencyResponse", "stepFigures",
                "values", "solution", "verification", "roots", "warnings"}) {
            assertTrue(json.has(key), key);
        }
        assertTrue(json.get("stable").asBoolean());
        assertEquals("100/3", json.get("dcGain").get("exact").asText());
        assertEquals("y[n] - 1.5y[n-1] + 0.56y[n-2] = u[n] + u[n-1]", json.get("equivalentEquation").get("relation").asText());
        assertEquals("zero", json.get("frequencyResponse").get(2).get("kind").asText());
        // y[0] = b0 = 1 (the first sample of a step through H is H(∞) = 1, common practice)
        assertEquals("1", json.get("values").get(0).get("exact").asText());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "H(s) = e^(-s)/(s + 1)    | time delay",
        "H(s) = (s + 1)/(z + 2)   | mixes s and z",
        "H(s) = K/(s + 1)         | unknown name 'K'",
        "H(s) = (s + 1            | unbalanced",
        "H(z) = z^2/(z - 1/2)     | not causal",
    })
    void badTransferFunctionsAreRefusedWithExitCodeTwo(String transfer, String fragment) {
        MainTest.Run r = MainTest.run("response", transfer);
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().startsWith("rootform: "), r.err());
        assertTrue(r.err().contains(fragment), r.err());
        assertEquals("", r.out());
    }

    @Test
    void badInputsAndFrequenciesPointAtTheItem() {
        MainTest.Run input = MainTest.run("response", "H(s) = 1/(s + 1)", "--to", "sin(pi t)");
        assertEquals(2, input.code());
        assertTrue(input.err().contains("not rational"), input.err());
        MainTest.Run frequency = MainTest.run("response", "H(s) = 1/(s + 1)", "--frequencies", "1,two");
        assertEquals(2, frequency.code());
        assertTrue(frequency.err().contains("frequency 'two'"), frequency.err());
        assertTrue(frequency.err().contains("(at column 3)"), frequency.err());
    }

    @Test
    void theReportPageIsNotAResponseFormat() {
        MainTest.Run r = MainTest.run("response", "H(s) = 1/(s + 1)", "--format", "html");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("not available for a response"), r.err());
    }

    @Test
    void writesJavaThatNamesTheTransferFunction(@TempDir Path dir) throws Exception {
        Path java = dir.resolve("Step.java");
        MainTest.Run r = MainTest.run("response", "H(s) = 4/(s^2 + 2s + 4)", "--to", "step", "--format", "java", "--class", "Step",
                "-o", java.toString());
        assertEquals(0, r.code(), r.err());
        String source = Files.readString(java);
        assertTrue(source.contains("Response of H(s) = 4/(s^2 + 2s + 4)"), source);
        assertTrue(source.contains("public final class Step"), source);
    }
}
