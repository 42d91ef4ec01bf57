package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.JsonRenderer;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.math.MathContext;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/** Inputs in scope that used to crash or run out of time (issue 14) are answered. */
class InScopeAnswersTest {
    private static Result solve(String input, Options options) {
        return Rootform.solve(SolveRequest.of(input).with(options));
    }

    @Test
    void aRootBeyondTheDoubleRangeIsDiagnosedAndRendered() {
        Result r = solve("x[n+1] = 1e1000 x[n]; x[0] = 1", Options.builder().points("3").build());
        Result.Solved s = assertInstanceOf(Result.Solved.class, r);
        String text = TextRenderer.render(s.report());
        assertTrue(text.contains("|λ| = 1E+1000"), text);
        assertTrue(text.contains("dB/step = 20000"), text);
        assertTrue(JsonRenderer.render(s.report()).contains("\"modulus\""));
    }

    @Test
    void aFastOscillatorIsCheckedOnItsOwnTimeScale() {
        Result.Solved s = assertInstanceOf(Result.Solved.class, solve("y'' + 10^12 y = 0; y(0) = 1; y'(0) = 0",
                Options.builder().points("1").build()));
        Check integration = s.report().numericChecks().stream().filter(c -> c.name().contains("integration")).findFirst()
                .orElseThrow();
        assertTrue(integration.ran() && integration.passed(), integration.detail());
        // y = cos(10^6 t) (common practice)
        assertEquals(Math.cos(1e6), s.report().values().get(0).value().doubleValue(), 1e-12);
    }

    @Test
    void forcingWithManyTrialConstantsIsAnswered() {
        Result r = solve("y'' + y = t^2 e^(-t) sin(pi t) + t^2 sin(3t)", Options.defaults());
        assertTrue(r instanceof Result.General || r instanceof Result.Solved, r.toString());
    }

    @Test
    void tenThousandDigitsOfASmallValue() {
        Result.Solved s = assertInstanceOf(Result.Solved.class, solve("y' = -y; y(0) = 1",
                Options.builder().digits(Options.MAX_DIGITS).points("1").build()));
        // y(1) = e^-1 (common practice), referenced by apfloat's own exponential at 10 010 digits
        BigDecimal reference = new BigDecimal(ApfloatMath.exp(new Apfloat(-1, Options.MAX_DIGITS + 10)).toString(true))
                .round(new MathContext(Options.MAX_DIGITS));
        assertEquals(reference, s.report().values().get(0).value().round(new MathContext(Options.MAX_DIGITS)));
    }
}
