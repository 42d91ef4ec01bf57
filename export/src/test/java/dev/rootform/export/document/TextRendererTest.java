package dev.rootform.export.document;

import static dev.rootform.export.Fixtures.at;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Fixtures;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class TextRendererTest {
    private static final String FIBONACCI = """
            equation        x[n+2] - x[n+1] - x[n] = 0
                            linear difference equation, order 2
            conditions      x[0] = 0, x[1] = 1
            characteristic  λ^2 - λ - 1
            factored        λ^2 - λ - 1
            roots           1/2 + 1/2·√5  ≈ 1.618033989    multiplicity 1
                            1/2 - 1/2·√5  ≈ -0.6180339887  multiplicity 1
            basis           (1/2 + 1/2·√5)^n, (1/2 - 1/2·√5)^n
            solution        x[n] = (1/5·√5)·(1/2 + 1/2·√5)^n - (1/5·√5)·(1/2 - 1/2·√5)^n
                            for n ≥ 0
            """;

    @Test
    void fibonacciAnswer() {
        String text = TextRenderer.render(Fixtures.report(Fixtures.fibonacci(), List.of(Fixtures.value(10, 55))));
        assertTrue(text.startsWith(FIBONACCI), text);
        assertTrue(text.contains("\n                verified\n"), text);
        assertTrue(text.endsWith("values          x[10] = 55\n"), text);
        assertTrue(text.lines().count() < 40, text);
    }

    @Test
    void dampedOscillatorWithNumericCheckAndDecimalValue() {
        PointValue y = new PointValue(Rational.of(3, 2), new BigDecimal("-0.20515311931292832"), Optional.empty());
        Check integration = new Check("agrees with numeric integration", true, "max deviation 3E-14 on [0, 10]");
        String text = TextRenderer.render(Fixtures.report(Fixtures.dampedOscillator(), List.of(y), List.of(integration), List.of()));
        assertTrue(text.startsWith("equation        y'' + 2y' + 5y = 0\n"), text);
        assertTrue(text.contains("conditions      y(0) = 1, y'(0) = 0\n"), text);
        assertTrue(text.contains("-1 + 2i  ≈ -1 + 2i  multiplicity 1"), text);
        assertTrue(text.contains("solution        y(t) = e^(-t)·(cos(2t) + 1/2·sin(2t))\n                for all t\n"), text);
        assertTrue(text.contains("[ok]     agrees with numeric integration: max deviation"), text);
        assertTrue(text.contains("values          y(1.5) ≈ -0.2051531193\n"), text);
    }

    @Test
    void failedCheckIsNamedAndWarningsShown() {
        Check bad = new Check("agrees with numeric integration", false, "deviation 0.3 at t = 2");
        String text = TextRenderer.render(Fixtures.report(Fixtures.dampedOscillator(), List.of(), List.of(bad), List.of("stiff")));
        assertTrue(text.contains("[FAILED] agrees with numeric integration: deviation 0.3"), text);
        assertTrue(text.contains("NOT verified: agrees with numeric integration\n"), text);
        assertFalse(text.contains("\n                verified"), text);
        assertTrue(text.endsWith("warnings        stiff\n"), text);
    }

    @Test
    void zeroRootListsTheLeadingValue() {
        String text = TextRenderer.render(Fixtures.report(Fixtures.difference(List.of(at(0, 5), at(1, 1)), 0, -2, 1), List.of()));
        assertTrue(text.contains("factored        λ·(λ - 2)\n"), text);
        assertTrue(text.contains("x[n] = 1/2·2^n\n                for n ≥ 1\n                x[0] = 5\n"), text);
    }

    @Test
    void generalSolutionSaysWhatIsFree() {
        String text = TextRenderer.render(Fixtures.report(Fixtures.difference(List.of(), 0, -2, 1), List.of()));
        assertTrue(text.contains("conditions      none (general solution)\n"), text);
        assertTrue(text.contains("x[0] free (any values)\n"), text);
        assertTrue(text.contains("general solution: C1 is a free constant\n"), text);
    }

    @Test
    void longExactValueFallsBackToDecimal() {
        Rational big = Rational.of(BigDecimal.TEN.pow(70).toBigInteger().add(BigInteger.ONE));
        PointValue v = new PointValue(Rational.of(340), new BigDecimal(big.toString()), Optional.of(big));
        String text = TextRenderer.render(Fixtures.report(Fixtures.fibonacci(), List.of(v)));
        assertTrue(text.contains("values          x[340] ≈ 1E+70\n"), text);
    }
}
