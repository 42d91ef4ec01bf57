package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Check;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The integrator cross-check follows the problem's own time scales (fast, stiff and slow modes
 * alike), integrates far points over a window from the closed form's state, and says so when it
 * cannot run. The closed forms are known by hand (common practice).
 */
class IntegratorCheckTest {
    private static LinearEquation equation(String text) {
        return ProblemParser.parse(text, List.of(), null).equation();
    }

    /** A closed form given by its value and first derivative. */
    private static IntegratorCheck.Solved solved(DoubleUnaryOperator y, DoubleUnaryOperator dy) {
        return new IntegratorCheck.Solved() {
            @Override
            public double value(double t) {
                return y.applyAsDouble(t);
            }

            @Override
            public List<Rational> state(Rational t) {
                double x = t.doubleValue();
                return List.of(Rational.of(new java.math.BigDecimal(y.applyAsDouble(x))), Rational.of(new java.math.BigDecimal(dy.applyAsDouble(x))));
            }
        };
    }

    /** y'' + 10^12 y = 0, y = cos(10^6 t): compared at 1/4, 1 and 4 microseconds, not at seconds. */
    @Test
    void highFrequencyIsComparedOnItsOwnTimeScale() {
        LinearEquation eq = equation("y'' + 10^12 y = 0");
        TimeScales scales = TimeScales.ofRoots(eq, List.of(new double[] {0, 1e6}, new double[] {0, -1e6}));
        assertEquals(List.of(1e-6), scales.scales());
        Check c = IntegratorCheck.compare(eq, Rational.ZERO, List.of(Rational.ONE, Rational.ZERO), scales, List.of(),
                solved(t -> Math.cos(1e6 * t), t -> -1e6 * Math.sin(1e6 * t)), "t0");
        assertTrue(c.passed(), c.detail());
        assertTrue(c.detail().contains("time scales 0.000001"), c.detail());
    }

    /**
     * y'' + 1000001y' + 10^6 y = 0 (roots −1 and −10^6), y = e^(−t) − e^(−10^6·t)/10^6 scaled: its slow
     * scale 1 lies 10^6 fastest time units from t0, so those points are integrated over a window from
     * the closed form's state instead of from t0.
     */
    @Test
    void stiffProblemsIntegrateFarPointsOverAWindow() {
        LinearEquation eq = equation("y'' + 1000001y' + 1000000y = 0");
        TimeScales scales = TimeScales.ofRoots(eq, List.of(new double[] {-1, 0}, new double[] {-1e6, 0}));
        DoubleUnaryOperator y = t -> (1e6 * Math.exp(-t) - Math.exp(-1e6 * t)) / (1e6 - 1);
        DoubleUnaryOperator dy = t -> (-1e6 * Math.exp(-t) + 1e6 * Math.exp(-1e6 * t)) / (1e6 - 1);
        Check c = IntegratorCheck.compare(eq, Rational.ZERO, List.of(Rational.ONE, Rational.ZERO), scales, List.of(), solved(y, dy),
                "t0");
        assertTrue(c.passed(), c.detail());
        assertTrue(c.detail().contains("far points from the closed form's state"), c.detail());
    }

    /** A time scale that hides the fast mode (R = 0) sends the integrator over 160 000 periods: beyond the budget, not run. */
    @Test
    void anIntegrationBeyondItsBudgetIsNotRunAndNeverCountsAsPassed() {
        LinearEquation eq = equation("y'' + 1000000y = 0");
        Check c = IntegratorCheck.compare(eq, Rational.ZERO, List.of(Rational.ONE, Rational.ZERO), new TimeScales(List.of(250.0), 0),
                List.of(), solved(t -> Math.cos(1000 * t), t -> -1000 * Math.sin(1000 * t)), "t0");
        assertFalse(c.ran());
        assertFalse(c.passed());
        assertFalse(c.failed());
        assertTrue(c.detail().startsWith("not run: "), c.detail());
    }
}
