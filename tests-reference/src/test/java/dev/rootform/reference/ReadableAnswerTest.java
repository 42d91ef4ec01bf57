package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.Report;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Labels that are true and numbers that read well, on whole answers. */
class ReadableAnswerTest {
    /**
     * "Transient" and "steady state" only for an asymptotically stable system whose input neither
     * decays nor grows (common practice: the homogeneous response dies out and the particular one
     * remains); otherwise the parts are named homogeneous and particular.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "y'' + 3y' + 2y = 2sin(3t); y(0) = 0; y'(0) = 0 | true",
        "x[n+1] = x[n]/2 + 1; x[0] = 0 | true",
        "b[n] = 1.004 b[n-1] - 900; b[0] = 60000 | false",
        "T[n] = 2T[n-1] + n; T[0] = 1 | false",
        "y'' + 3y' + 2y = e^(-2t); y(0) = 0; y'(0) = 0 | false",
        "w'''' = 0.002; w(0) = 0; w''(0) = 0; w(10) = 0; w''(10) = 0 | false",
    })
    void transientAndSteadyOnlyWhereTheyAreTrue(String input, boolean settles) {
        String text = TextRenderer.render(Answers.report(input, 20, List.of()));
        assertEquals(settles, text.contains("transient (homogeneous) part:"), text);
        assertEquals(settles, text.contains("steady (particular) part:"), text);
        assertEquals(!settles, text.contains("\n                homogeneous part:"), text);
    }

    /** A function named e would print as e(t) = 1 - e^(-t) next to Euler's number: refused, naming the place. */
    @Test
    void aFunctionNamedEIsRefused() {
        Result result = Rootform.solve(SolveRequest.of("e''' + 3e'' + 3e' + e = 1; e(0) = 0; e'(0) = 0; e''(0) = 0"));
        assertTrue(result instanceof Result.Refused, result.toString());
        assertTrue(((Result.Refused) result).message().contains("Euler"), result.toString());
    }

    /** --numeric: signs between the terms, no coefficient 1 and no factor 1 written out. */
    @Test
    void numericFormHasNoSignOrUnitArtefacts() {
        Report r = Rootform.solve(SolveRequest.of("x[n+1] = 2x[n] - 5; x[0] = 0").with(Options.builder().numeric(true).digits(6).build()))
                .answer().orElseThrow();
        String text = TextRenderer.render(r);
        assertTrue(text.contains("x[n] ≈ -5·2^n + 5"), text);
        assertFalse(text.contains("(-"), text);
        assertFalse(text.contains("·1\n"), text);
    }

    /**
     * --numeric writes an irreducible quartic with complex roots mode by mode: y'''' + y' + y = 0 has
     * two complex pairs, so two cos/sin pairs and no sum over the roots; their coefficients at t = 0
     * add up to y(0) = 1 (the cos coefficients of the two pairs).
     */
    @Test
    void numericFormWritesQuarticsAsModes() {
        Report r = Rootform.solve(SolveRequest.of("y'''' + y' + y = 0; y(0)=1; y'(0)=0; y''(0)=0; y'''(0)=0")
                .with(Options.builder().numeric(true).digits(12).build())).answer().orElseThrow();
        String solution = TextRenderer.render(r).lines().filter(l -> l.startsWith("solution")).findFirst().orElseThrow();
        assertFalse(solution.contains("Σ"), solution);
        assertEquals(2, solution.split("cos\\(", -1).length - 1, solution);
        List<dev.rootform.numeric.analysis.DecimalMode> modes = r.analysis().conjugateSumModes().get(0);
        assertEquals(2, modes.size());
        assertEquals(1.0, modes.get(0).cosine().doubleValue() + modes.get(1).cosine().doubleValue(), 1e-11);
    }

    /** Roots of unity have |λ| = 1 exactly: 0 dB per step, no steps to halve. */
    @Test
    void unitModulusIsExact() {
        String text = TextRenderer.render(Answers.report("x[n+2] = x[n+1] - x[n]; x[0] = 1; x[1] = 0", 20, List.of(Rational.ONE)));
        assertTrue(text.contains("dB/step = 0"), text);
        assertFalse(text.contains("steps to halve"), text);
    }
}
