package dev.rootform.export.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.rootform.numeric.analysis.NumericFallback;
import dev.rootform.numeric.analysis.NumericSolution;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A numeric answer is labelled numeric in text and JSON, and refused in the other formats. */
class NumericDocumentTest {
    private static NumericSolution oscillator() {
        return NumericFallback.solve(ProblemParser.parse("y'' + 4y = 0; y(0) = 1; y'(0) = 0", List.of(), null), 20,
                List.of(Rational.ONE), "the exact path did not finish (test)");
    }

    @Test
    void textSaysNumericAndShowsModesValuesAndChecks() {
        String text = NumericDocument.render("text", oscillator());
        assertTrue(text.contains("NUMERIC, not exact: the exact path did not finish (test)"), text);
        assertTrue(text.contains("± 2"), text);
        // y = cos 2t (common practice); cos 2 = -0.41614683654714238700 (Taylor series summed to 50 digits)
        assertTrue(text.contains("y(1) ≈ -0.416146836547142387"), text);
        assertTrue(text.contains("verified numerically (not exact)"), text);
    }

    @Test
    void jsonCarriesTheLabelAndTheModes() throws Exception {
        JsonNode json = new ObjectMapper().readTree(NumericDocument.render("json", oscillator()));
        assertTrue(json.get("numeric").asBoolean());
        assertEquals(1, json.get("modes").size());
        assertTrue(json.get("verification").get("verified").asBoolean());
    }

    @Test
    void codeFormatsNeedAnExactAnswer() {
        for (String format : List.of("java", "c", "latex", "mathml")) {
            assertTrue(NumericDocument.refusal(format).orElseThrow().contains("needs an exact answer"), format);
        }
        assertTrue(NumericDocument.refusal("text").isEmpty());
    }
}
