package dev.rootform.numeric.analysis;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The independent cross-check of a differential equation's solution: Commons Math's
 * Dormand–Prince 8(5,3) integrator ({@link OdeReference}) starts at t0 from the solution's
 * derivatives there, and its values at the comparison points must agree with the closed form's
 * to {@link #TOLERANCE} relative to max(1, largest |y|). Used for exactly fitted solutions and for
 * numerically fixed constants alike.
 *
 * <p>The comparison points follow the problem's time scale: the offsets {@link #OFFSETS} are
 * shrunk by min(1, {@link #CYCLES}/B), where B bounds the fastest rate of the solution (the
 * Fujiwara bound 2·max_j |a_{k−j}/a_k|^{1/j} on the characteristic roots, and the forcing's rates
 * and frequencies), so a fast or stiff equation is compared over a few of its own time constants
 * instead of millions. An integration that still needs more than {@link #MAX_EVALUATIONS}
 * evaluations or too small a step (points far beyond the time scale, such as other condition
 * points of a boundary-value problem) is not run, and the check says so: it never counts as passed.
 */
final class IntegratorCheck {
    /** Name of the check. */
    static final String NAME = "agrees with numerical integration";
    /** Offsets h of the comparison points t0 + h, before scaling to the problem's time scale. */
    static final double[] OFFSETS = {0.25, 0.5, 1.0, 2.0};
    /** Radians of the fastest mode that the longest offset may span: about three periods. */
    static final double CYCLES = 10;
    /** Evaluations of the right-hand side allowed per integration (DOP853 takes 12 a step). */
    static final int MAX_EVALUATIONS = 300_000;
    /** Relative agreement required of the double-precision integrator. */
    static final double TOLERANCE = 1e-7;

    private IntegratorCheck() {
    }

    /** The offsets t − t0 of the comparison points for {@code eq}, scaled to its time scale. */
    static double[] offsets(LinearEquation eq) {
        double scale = new BigDecimal(Math.min(1, CYCLES / rateBound(eq))).round(new MathContext(2)).doubleValue();
        return Arrays.stream(OFFSETS).map(h -> h * scale).toArray();
    }

    /** The offsets as the check's detail writes them: {@code [0.25, 0.5, 1.0, 2.0]} (scale rounded to 2 digits). */
    static String offsetText(LinearEquation eq) {
        return Arrays.toString(offsets(eq));
    }

    /**
     * A bound on the fastest rate of a solution: the Fujiwara bound on the characteristic roots,
     * and |rate| + |frequency| of every forcing term.
     */
    static double rateBound(LinearEquation eq) {
        List<Rational> a = eq.coefficients();
        int k = a.size() - 1;
        double bound = 0;
        for (int j = 1; j <= k; j++) {
            double ratio = Math.abs(a.get(k - j).divide(a.get(k)).doubleValue());
            bound = Math.max(bound, 2 * Math.pow(ratio, 1.0 / j));
        }
        for (ForcingTerm t : eq.forcing()) {
            double frequency = Math.abs(t.frequency().doubleValue()) * (t.frequencyTimesPi() ? Math.PI : 1);
            bound = Math.max(bound, Math.abs(t.exponential().doubleValue()) + frequency);
        }
        return bound;
    }

    /**
     * @param initial y(t0), y'(t0), …, y^(k−1)(t0) of the solution
     * @param points the comparison points
     * @param closed the closed form's values there, in double precision
     * @param route where the comparison runs, for the detail, e.g. {@code "at t0 + [0.25, 0.5, 1.0, 2.0]"}
     */
    static Check compare(LinearEquation eq, Rational t0, List<Rational> initial, double[] points, double[] closed,
            String route) {
        Optional<double[]> integrated = OdeReference.values(eq.coefficients(), ForcingFunction.of(eq.forcing()), t0, initial,
                points, MAX_EVALUATIONS);
        if (integrated.isEmpty()) {
            return Check.notRun(NAME, String.format("Dormand-Prince 8(5,3) %s would need more than %d evaluations or steps "
                    + "below the smallest allowed (the solution or its forcing is much faster than the span); the other checks "
                    + "stand", route, MAX_EVALUATIONS));
        }
        double[] reference = integrated.get();
        double scale = 1;
        double worst = 0;
        for (int i = 0; i < points.length; i++) {
            scale = Math.max(scale, Math.abs(closed[i]));
            worst = Math.max(worst, Math.abs(closed[i] - reference[i]));
        }
        boolean passed = worst <= TOLERANCE * scale;
        return new Check(NAME, passed, String.format(
                "Dormand-Prince 8(5,3) (Commons Math) %s: largest difference %.2e (tolerance %.0e relative)",
                route, worst, TOLERANCE));
    }
}
