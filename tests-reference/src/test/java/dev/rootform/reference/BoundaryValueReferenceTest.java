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
 * Differential equations whose constants are fixed numerically (conditions at two points, at a
 * multiple of π, or transcendental forcing away from t = 0) against their known solutions.
 */
class BoundaryValueReferenceTest {
    private static final List<Rational> POINTS = List.of(Rational.of(1, 4), Rational.of(1, 2), Rational.of(3, 4));

    static Stream<Arguments> problems() {
        return Stream.of(
                // y'' + y = 0, y(0) = 0, y(1) = 1 → sin t / sin 1 (common practice)
                Arguments.of("y'' + y = 0; y(0) = 0; y(1) = 1", (DoubleUnaryOperator) t -> Math.sin(t) / Math.sin(1)),
                // both conditions at t = π: y'' + y = 0, y(π) = 1, y'(π) = 0 → -cos t (common practice)
                Arguments.of("y'' + y = 0; y(pi) = 1; y'(pi) = 0", (DoubleUnaryOperator) t -> -Math.cos(t)),
                // exponential forcing with conditions at t0 = 1: y'' + y = e^t, y(1) = y'(1) = 0 →
                // e^t/2 - (e/2)(cos(t - 1) + sin(t - 1)) (worked by hand: particular e^t/2, then fit at t = 1)
                Arguments.of("y'' + y = e^t; y(1) = 0; y'(1) = 0", (DoubleUnaryOperator) t ->
                        Math.exp(t) / 2 - Math.E / 2 * (Math.cos(t - 1) + Math.sin(t - 1))),
                // a point that is a multiple of π: y'' + y = 0, y(0) = 1, y(π/2) = 2 → cos t + 2 sin t (common practice)
                Arguments.of("y'' + y = 0; y(0) = 1; y(pi/2) = 2", (DoubleUnaryOperator) t -> Math.cos(t) + 2 * Math.sin(t)),
                // y'' = t, y(0) = y(1) = 0 → (t³ - t)/6: a simply supported beam-type problem (common practice)
                Arguments.of("y'' = t; y(0) = 0; y(1) = 0", (DoubleUnaryOperator) t -> (t * t * t - t) / 6),
                // y'' - y = 0, y(0) = 1, y(1) = 0 → sinh(1 - t)/sinh 1 (common practice)
                Arguments.of("y'' - y = 0; y(0) = 1; y(1) = 0", (DoubleUnaryOperator) t -> Math.sinh(1 - t) / Math.sinh(1)),
                // mixed conditions y(0) = 0, y'(1) = 0 for y'' + y = 1 → 1 - cos t - tan(1)·sin t
                // (worked by hand: y = 1 + A cos t + B sin t, A = -1, B = -sin 1/cos 1)
                Arguments.of("y'' + y = 1; y(0) = 0; y'(1) = 0",
                        (DoubleUnaryOperator) t -> 1 - Math.cos(t) - Math.tan(1) * Math.sin(t)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("problems")
    void boundaryValueProblemMatchesKnownSolution(String input, DoubleUnaryOperator known) {
        Report report = Answers.report(input, 25, POINTS);
        assertTrue(report.verified(), input + ": " + report.solution().checks() + report.numericChecks());
        for (int i = 0; i < POINTS.size(); i++) {
            double t = POINTS.get(i).doubleValue();
            assertEquals(known.applyAsDouble(t), report.values().get(i).value().doubleValue(), 1e-13, input + " at t = " + t);
        }
    }
}
