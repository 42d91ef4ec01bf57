package dev.rootform.cli;

import static dev.rootform.cli.MainTest.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.rootform.cli.MainTest.Run;
import java.math.BigDecimal;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** `rootform solve` on recurrences forced at frequencies that are not rational multiples of π. */
class SampledSinusoidCommandTest {
    private static final String FILTER = "x[n+1] = 0.9x[n] + sin(0.3n); x[0] = 1";

    /**
     * The smoothing filter x[n+1] = 0.9x[n] + sin(0.3n): cos 0.3 and sin 0.3 appear by name, the answer
     * is verified, x[10] agrees with iteration in double precision (10 steps, error far below 1e-12),
     * and the steady-state amplitude is the gain |H(e^{iω})| = 1/|e^{iω} − 0.9| of a first-order
     * filter (common practice).
     */
    @Test
    void filterIsSolvedWithNamedCosineAndSine() {
        Run r = run("solve", FILTER, "--values-at", "10");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("cos(3/10)") && r.out().contains("sin(3/10)"), r.out());
        assertTrue(r.out().contains("\n                verified"), r.out());
        double x = 1;
        for (int n = 0; n < 10; n++) {
            x = 0.9 * x + Math.sin(0.3 * n);
        }
        assertEquals(x, number(r.out(), "x\\[10\\] ≈ ([-0-9.]+)"), 1e-12);
        double gain = 1 / Math.hypot(Math.cos(0.3) - 0.9, Math.sin(0.3));
        assertEquals(gain, number(r.out(), "amplitude ([0-9.]+)"), 1e-12);
    }

    @Test
    void everyDocumentFormatNamesTheExactQuantities() throws Exception {
        Run json = run("solve", "x[n+2] + x[n] = cos(0.4n); x[0] = 0; x[1] = 0", "--format", "json", "--values-at", "5");
        assertEquals(0, json.code(), json.err());
        JsonNode root = new ObjectMapper().readTree(json.out());
        assertTrue(root.get("solution").get("text").asText().contains("sin(2/5)/(2·cos(2/5))"), root.get("solution").toString());
        assertEquals(1, root.get("values").size());
        Run mathml = run("solve", FILTER, "--format", "mathml");
        assertEquals(0, mathml.code(), mathml.err());
        assertTrue(mathml.out().contains("<mi>cos</mi>"), mathml.out());
        Run latex = run("solve", FILTER, "--format", "latex");
        assertTrue(latex.out().contains("\\cos\\left(\\frac{3}{10}\\right)"), latex.out());
    }

    @Test
    void generatedCodeCarriesTheCoefficientsRoundedOnce() {
        Run java = run("solve", "x[n+1] = 3x[n] + n*sin(1.5n); x[0] = 0", "--format", "java");
        assertEquals(0, java.code(), java.err());
        assertTrue(java.out().contains("AMPLITUDE") && java.out().contains("cos(3/2)"), java.out());
        Run c = run("solve", FILTER, "--format", "c");
        assertEquals(0, c.code(), c.err());
        assertTrue(c.out().contains("rootform_value_frequency[] = {0.0, 0.3}"), c.out());
    }

    private static double number(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertTrue(m.find(), text);
        return new BigDecimal(m.group(1)).doubleValue();
    }
}
