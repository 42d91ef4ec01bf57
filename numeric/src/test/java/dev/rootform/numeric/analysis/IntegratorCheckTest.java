package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Check;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The integrator cross-check follows the problem's time scale, and says so when it cannot run. */
class IntegratorCheckTest {
    private static LinearEquation equation(String text) {
        return ProblemParser.parse(text, List.of(), null).equation();
    }

    @Test
    void slowEquationsKeepTheUnitOffsetsAndFastOnesAreScaled() {
        assertArrayEquals(IntegratorCheck.OFFSETS, IntegratorCheck.offsets(equation("y'' + 3y' + 2y = 0")));
        // y'' + 10^12 y = 0: Fujiwara bound 2·10^6, scale 10/(2·10^6) = 5e-6
        double[] fast = IntegratorCheck.offsets(equation("y'' + 10^12 y = 0"));
        assertEquals(1e-5, fast[3], 1e-20);
    }

    @Test
    void anIntegrationBeyondItsBudgetIsNotRunAndNeverCountsAsPassed() {
        // y'' + 10^6 y = 0, y(0) = 1, y'(0) = 0 compared at t = 1000: some 160 000 periods, beyond the budget
        LinearEquation eq = equation("y'' + 1000000y = 0");
        Check c = IntegratorCheck.compare(eq, Rational.ZERO, List.of(Rational.ONE, Rational.ZERO), new double[] {1000},
                new double[] {Math.cos(1000 * 1000)}, "at t = 1000");
        assertFalse(c.ran());
        assertFalse(c.passed());
        assertFalse(c.failed());
        assertTrue(c.detail().startsWith("not run: "), c.detail());
    }
}
