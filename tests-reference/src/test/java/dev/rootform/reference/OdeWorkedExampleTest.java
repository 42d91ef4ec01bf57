package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Differential equations with known closed forms: the tool's values at several points must match
 * the published (or common-practice) solution evaluated independently in double precision.
 */
class OdeWorkedExampleTest {
    private static final List<Rational> POINTS = List.of(Rational.of(1, 2), Rational.ONE, Rational.of(2), Rational.of(7, 2));

    static Stream<Arguments> examples() {
        return Stream.of(
                // critical damping ζ = 1: y = (1 + t)e^{-t}; common practice (any ODE text, e.g. Boyce & DiPrima,
                // Elementary Differential Equations, section on repeated roots — from memory)
                Arguments.of("y'' + 2y' + y = 0; y(0) = 1; y'(0) = 0", (DoubleUnaryOperator) t -> (1 + t) * Math.exp(-t)),
                // harmonic oscillator: y = sin t (common practice)
                Arguments.of("y'' + y = 0; y(0) = 0; y'(0) = 1", (DoubleUnaryOperator) Math::sin),
                // distinct real roots 1, 2: y = e^{2t} - e^{t} (common practice)
                Arguments.of("y'' - 3y' + 2y = 0; y(0) = 0; y'(0) = 1", (DoubleUnaryOperator) t -> Math.exp(2 * t) - Math.exp(t)),
                // underdamped: y = e^{-2t}(cos 3t + (2/3) sin 3t) (common practice)
                Arguments.of("y'' + 4y' + 13y = 0; y(0) = 1; y'(0) = 0",
                        (DoubleUnaryOperator) t -> Math.exp(-2 * t) * (Math.cos(3 * t) + 2.0 / 3 * Math.sin(3 * t))),
                // series RLC with L = 1 H, R = 2 Ω, C = 1/5 F: q'' + 2q' + 5q = 0, q(0) = 1, q'(0) = 0 →
                // q = e^{-t}(cos 2t + ½ sin 2t) (standard circuit textbook example — from memory)
                Arguments.of("(D^2 + 2D + 5) q = 0; q(0) = 1; q'(0) = 0",
                        (DoubleUnaryOperator) t -> Math.exp(-t) * (Math.cos(2 * t) + 0.5 * Math.sin(2 * t))),
                // fourth order: y'''' - y = 0, y(0) = 1, others 0 → (cosh t + cos t)/2 (handbook identity)
                Arguments.of("y^(4) - y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0; y'''(0) = 0",
                        (DoubleUnaryOperator) t -> (Math.cosh(t) + Math.cos(t)) / 2),
                // Leibniz notation, conditions at t0 = 1: y = e^{-(t-1)} - e^{-2(t-1)} shifted (common practice)
                Arguments.of("d2y/dt2 + 3 dy/dt + 2y = 0; y(1) = 0; y'(1) = 1",
                        (DoubleUnaryOperator) t -> Math.exp(-(t - 1)) - Math.exp(-2 * (t - 1))),
                // repeated complex pair: (D^2 + 1)^2 y = 0, y(0)=0, y'(0)=0, y''(0)=0, y'''(0)=1 → (sin t - t cos t)/2
                // (common practice: resonance of an undamped oscillator)
                Arguments.of("(D^2 + 1)^2 y = 0; y(0) = 0; y'(0) = 0; y''(0) = 0; y'''(0) = 1",
                        (DoubleUnaryOperator) t -> (Math.sin(t) - t * Math.cos(t)) / 2),
                // a surd pair: y'' - 2y = 0, y(0) = 1, y'(0) = 0 → cosh(√2 t) (common practice)
                Arguments.of("y'' - 2y = 0; y(0) = 1; y'(0) = 0", (DoubleUnaryOperator) t -> Math.cosh(Math.sqrt(2) * t)),
                // roots 3 and -2 with data that cancels the growing mode: y = e^{-2t}
                // (textbook initial-value exercise, e.g. Boyce & DiPrima section 3.1 — from memory)
                Arguments.of("y'' - y' - 6y = 0; y(0) = 1; y'(0) = -2", (DoubleUnaryOperator) t -> Math.exp(-2 * t)),
                // triple root 1: y = (1 + t)e^t (textbook higher-order example — from memory)
                Arguments.of("y''' - 3y'' + 3y' - y = 0; y(0) = 1; y'(0) = 2; y''(0) = 3",
                        (DoubleUnaryOperator) t -> (1 + t) * Math.exp(t)),
                // roots ±1 ± i: y = cos t cosh t, the even solution of y'''' = -4y (beam-equation
                // handbook identity; common practice)
                Arguments.of("y'''' + 4y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0; y'''(0) = 0",
                        (DoubleUnaryOperator) t -> Math.cos(t) * Math.cosh(t)),
                // y = cos 3t + sin 3t (textbook undamped oscillator — from memory)
                Arguments.of("y'' + 9y = 0; y(0) = 1; y'(0) = 3", (DoubleUnaryOperator) t -> Math.cos(3 * t) + Math.sin(3 * t)),
                // root 0 and -1: y = 1 + e^{-t} (common practice: a constant mode)
                Arguments.of("y'' + y' = 0; y(0) = 2; y'(0) = -1", (DoubleUnaryOperator) t -> 1 + Math.exp(-t)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void valuesMatchTheKnownSolution(String input, DoubleUnaryOperator known) {
        Report report = Answers.report(input, 25, POINTS);
        assertTrue(report.verified(), input + ": " + report.solution().checks() + report.numericChecks());
        for (int i = 0; i < POINTS.size(); i++) {
            double t = POINTS.get(i).doubleValue();
            double expected = known.applyAsDouble(t);
            double actual = report.values().get(i).value().doubleValue();
            assertEquals(expected, actual, 1e-12 * Math.max(1, Math.abs(expected)), input + " at t = " + t);
        }
    }
}
