package dev.rootform.numeric.analysis;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import java.util.Arrays;
import java.util.List;

/**
 * The independent cross-check of a differential equation's solution: Commons Math's
 * Dormand–Prince 8(5,3) integrator ({@link OdeReference}) starts at t0 from the solution's
 * derivatives there, and its values at the comparison points must agree with the closed form's
 * to {@link #TOLERANCE} relative to max(1, largest |y|). Used for exactly fitted solutions and for
 * numerically fixed constants alike.
 */
final class IntegratorCheck {
    /** Offsets h of the comparison points t0 + h. */
    static final double[] OFFSETS = {0.25, 0.5, 1.0, 2.0};
    /** Relative agreement required of the double-precision integrator. */
    static final double TOLERANCE = 1e-7;

    private IntegratorCheck() {
    }

    /** The offsets as the check's detail writes them: {@code [0.25, 0.5, 1.0, 2.0]}. */
    static String offsets() {
        return Arrays.toString(OFFSETS);
    }

    /**
     * @param initial y(t0), y'(t0), …, y^(k−1)(t0) of the solution
     * @param points the comparison points
     * @param closed the closed form's values there, in double precision
     * @param route where the comparison runs, for the detail, e.g. {@code "at t0 + [0.25, 0.5, 1.0, 2.0]"}
     */
    static Check compare(LinearEquation eq, Rational t0, List<Rational> initial, double[] points, double[] closed,
            String route) {
        double[] reference = OdeReference.values(eq.coefficients(), ForcingFunction.of(eq.forcing()), t0, initial, points);
        double scale = 1;
        double worst = 0;
        for (int i = 0; i < points.length; i++) {
            scale = Math.max(scale, Math.abs(closed[i]));
            worst = Math.max(worst, Math.abs(closed[i] - reference[i]));
        }
        boolean passed = worst <= TOLERANCE * scale;
        return new Check("agrees with numerical integration", passed, String.format(
                "Dormand-Prince 8(5,3) (Commons Math) %s: largest difference %.2e (tolerance %.0e relative)",
                route, worst, TOLERANCE));
    }
}
