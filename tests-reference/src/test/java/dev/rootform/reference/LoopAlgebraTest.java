package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.ResponseReport;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Loops composed from named parts against hand algebra: unit feedback G/(1 + G) = N/(D + N) for
 * G = N/D, feedback through F: G/(1 + G F) = N_G D_F/(D_G D_F + N_G N_F), series C·P and parallel
 * A + B (common practice). A type-1 loop (an integrator in G) follows a step with no steady error,
 * so its closed-loop DC gain is 1 (final-value theorem, common practice).
 */
class LoopAlgebraTest {
    private static RationalFunction f(String num, String den) {
        return new RationalFunction(p(num), p(den));
    }

    private static RationalPolynomial p(String ascending) {
        return RationalPolynomial.of(java.util.Arrays.stream(ascending.trim().split("\\s+")).map(Rational::parse).toList());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        // G = 10/(s(s + 2)): N/(D + N) = 10/(s^2 + 2s + 10)
        "G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)                                   | 10          | 10 2 1",
        // G = (s + 1)/(s(s + 3)): (s + 1)/(s^2 + 4s + 1)
        "G(s) = (s + 1)/(s(s + 3)); H(s) = G/(1 + G)                              | 1 1         | 1 4 1",
        // G = 4/(s + 1), F = 1/(s + 5): 4(s + 5)/((s + 1)(s + 5) + 4) = (4s + 20)/(s^2 + 6s + 9)
        "G(s) = 4/(s + 1); F(s) = 1/(s + 5); H(s) = G/(1 + G F)                   | 20 4        | 9 6 1",
        // C = 2 + 3/s (PI), P = 1/(s + 1): CP/(1 + CP) = (2s + 3)/(s^2 + 3s + 3)
        "C(s) = 2 + 3/s; P(s) = 1/(s + 1); H(s) = C P/(1 + C P)                   | 3 2         | 3 3 1",
        // series and parallel of 1/(s + 1) and 2/(s + 3)
        "A(s) = 1/(s + 1); B(s) = 2/(s + 3); H(s) = A B                          | 2           | 3 4 1",
        "A(s) = 1/(s + 1); B(s) = 2/(s + 3); H(s) = A + B                        | 5 3         | 3 4 1",
        // discrete: an accumulator K z^-1/(1 - z^-1) with K = 0.5 in unit feedback: 0.5/(z - 0.5)
        "G(z) = 0.5z^-1/(1 - z^-1); H(z) = G/(1 + G)                              | 0.5         | -0.5 1",
    })
    void compositionIsTheHandAlgebra(String text, String num, String den) {
        ResponseReport r = Responses.report(text, "step", 20, List.of(), List.of());
        assertEquals(f(num, den), r.transfer().value(), text);
        assertTrue(r.facts().hiddenModes().isEmpty(), text);
    }

    @Test
    void typeOneLoopsHaveUnitDcGain() {
        for (String loop : List.of("G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)", "C(s) = 2 + 3/s; P(s) = 1/(s + 1); H(s) = C P/(1 + C P)",
                "G(z) = 0.5z^-1/(1 - z^-1); H(z) = G/(1 + G)")) {
            ResponseReport r = Responses.report(loop, "step", 20, List.of(), List.of());
            assertEquals(Rational.ONE, r.facts().dcGain().orElseThrow(), loop);
            assertEquals(Rational.ONE, r.stepFigures().orElseThrow().finalValue(), loop);
        }
    }
}
