package dev.rootform.numeric.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import org.junit.jupiter.api.Test;

class OdeReferenceTest {
    private static final double[] POINTS = {-3.0, -0.5, 0.0, 0.7, 2.0, 5.0};

    @Test
    void harmonicOscillatorGivesSine() {
        // common practice: y'' + y = 0, y(0) = 0, y'(0) = 1 has the solution sin t
        double[] y = OdeReference.values(List.of(Rational.ONE, Rational.ZERO, Rational.ONE), Rational.ZERO,
                List.of(Rational.ZERO, Rational.ONE), POINTS);
        for (int i = 0; i < POINTS.length; i++) {
            assertEquals(Math.sin(POINTS[i]), y[i], 1e-10, "sin at " + POINTS[i]);
        }
    }

    @Test
    void exponentialDecay() {
        // common practice: y' = −2y, y(0) = 1 gives e^{−2t}; written as 2y + y' = 0
        double[] y = OdeReference.values(List.of(Rational.of(2), Rational.ONE), Rational.ZERO,
                List.of(Rational.ONE), POINTS);
        for (int i = 0; i < POINTS.length; i++) {
            double expected = Math.exp(-2 * POINTS[i]);
            assertEquals(expected, y[i], 1e-10 * Math.max(1, expected), "e^{-2t} at " + POINTS[i]);
        }
    }

    @Test
    void fourthOrderGivesMeanOfCoshAndCos() {
        // handbook identity: y'''' − y = 0, y(0) = 1, y'(0) = y''(0) = y'''(0) = 0 gives (cosh t + cos t)/2
        double[] y = OdeReference.values(
                List.of(Rational.MINUS_ONE, Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.ONE),
                Rational.ZERO, List.of(Rational.ONE, Rational.ZERO, Rational.ZERO, Rational.ZERO), POINTS);
        for (int i = 0; i < POINTS.length; i++) {
            double expected = (Math.cosh(POINTS[i]) + Math.cos(POINTS[i])) / 2;
            assertEquals(expected, y[i], 1e-10 * Math.max(1, expected), "(cosh+cos)/2 at " + POINTS[i]);
        }
    }

    @Test
    void shiftedInitialTime() {
        // common practice: the sine solution started at t0 = 1 with y = sin 1, y' = cos 1 is still sin t
        Rational t0 = Rational.ONE;
        double[] y = OdeReference.values(List.of(Rational.ONE, Rational.ZERO, Rational.ONE), t0,
                List.of(Rational.of(java.math.BigDecimal.valueOf(Math.sin(1))),
                        Rational.of(java.math.BigDecimal.valueOf(Math.cos(1)))),
                new double[] {-2.0, 1.0, 4.0});
        assertEquals(Math.sin(-2.0), y[0], 1e-10);
        assertEquals(Math.sin(1.0), y[1], 0.0);
        assertEquals(Math.sin(4.0), y[2], 1e-10);
    }

    @Test
    void rejectsWrongNumberOfInitialValues() {
        assertThrows(IllegalArgumentException.class, () -> OdeReference.values(
                List.of(Rational.ONE, Rational.ONE), Rational.ZERO, List.of(), new double[] {1}));
    }
}
