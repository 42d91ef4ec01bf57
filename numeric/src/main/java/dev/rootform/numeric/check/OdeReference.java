package dev.rootform.numeric.check;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.work.Deadline;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.exception.NumberIsTooSmallException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * An independent numeric reference for the linear ODE Σ_{j=0..k} a_j·y^{(j)}(t) = g(t) with
 * constant rational coefficients (a_k ≠ 0): approximate values of the solution with given
 * initial derivatives at t0, obtained by integrating the equivalent first-order system
 * u_j' = u_{j+1} (j &lt; k−1), u_{k−1}' = (g(t) − Σ_{j&lt;k} a_j·u_j) / a_k.
 *
 * <p>Method: the embedded Runge–Kutta pair of J. R. Dormand and P. J. Prince, "A family of
 * embedded Runge–Kutta formulae", J. Comput. Appl. Math. 6 (1980) 19–26, in its 8(5,3) variant
 * DOP853 (E. Hairer, S. P. Nørsett, G. Wanner, Solving Ordinary Differential Equations I, 2nd ed.,
 * Springer 1993), as implemented by Commons Math, with step-size control at relative tolerance
 * {@link #RELATIVE_TOLERANCE} and absolute tolerance {@link #RELATIVE_TOLERANCE}·scale, where scale
 * is the largest of 1 and the |initial derivatives|. The points on each side of t0 are reached in
 * order of distance, each integration starting from the state the previous one reached (one
 * pass forward, one backward). The values are approximate: local errors are controlled, global
 * error is not bounded (it grows with |t − t0| and with the growth rate of the solution).
 *
 * <p>A step handler checks the current {@link Deadline} after every accepted step, so a long
 * integration can be cancelled.
 */
public final class OdeReference {
    /** Relative tolerance of the step-size control (absolute: this times the initial scale). */
    public static final double RELATIVE_TOLERANCE = 1e-12;
    /** Smallest step, relative to the integration span. */
    private static final double MIN_STEP_FRACTION = 1e-14;

    private OdeReference() {
    }

    /**
     * Approximations of y(points[i]).
     *
     * @param coefficients a_0, …, a_k with a_k ≠ 0 and k ≥ 1
     * @param t0 the initial time
     * @param initialDerivatives y(t0), y'(t0), …, y^{(k−1)}(t0)
     * @param points where to evaluate y
     * @throws IllegalArgumentException on an order below 1, a zero leading coefficient or a wrong
     *     number of initial values
     */
    public static double[] values(List<Rational> coefficients, Rational t0, List<Rational> initialDerivatives,
            double[] points) {
        return values(coefficients, t -> 0, t0, initialDerivatives, points);
    }

    /**
     * Approximations of y(points[i]) for the forced equation with right-hand side {@code forcing}.
     *
     * @throws IllegalArgumentException as {@link #values(List, Rational, List, double[])}
     */
    public static double[] values(List<Rational> coefficients, DoubleUnaryOperator forcing, Rational t0,
            List<Rational> initialDerivatives, double[] points) {
        return integrate(coefficients, forcing, t0, initialDerivatives, points, Integer.MAX_VALUE);
    }

    /**
     * As {@link #values(List, DoubleUnaryOperator, Rational, List, double[])}, but empty when an
     * integration cannot reach a point: it would need more than {@code maxEvaluations} evaluations
     * of the right-hand side, or a step below the smallest allowed (a solution far faster than the
     * span, such as ω = 10^31 over [0, π]).
     */
    public static Optional<double[]> values(List<Rational> coefficients, DoubleUnaryOperator forcing, Rational t0,
            List<Rational> initialDerivatives, double[] points, int maxEvaluations) {
        try {
            return Optional.of(integrate(coefficients, forcing, t0, initialDerivatives, points, maxEvaluations));
        } catch (MaxCountExceededException | NumberIsTooSmallException e) {
            return Optional.empty();
        }
    }

    private static double[] integrate(List<Rational> coefficients, DoubleUnaryOperator forcing, Rational t0,
            List<Rational> initialDerivatives, double[] points, int maxEvaluations) {
        int k = coefficients.size() - 1;
        if (k < 1 || coefficients.get(k).isZero()) {
            throw new IllegalArgumentException("need order ≥ 1 and a non-zero leading coefficient");
        }
        if (initialDerivatives.size() != k) {
            throw new IllegalArgumentException("expected " + k + " initial values, got " + initialDerivatives.size());
        }
        double[] ratios = new double[k];
        for (int j = 0; j < k; j++) {
            ratios[j] = coefficients.get(j).divide(coefficients.get(k)).doubleValue();
        }
        double[] start = new double[k];
        double scale = 1;
        for (int j = 0; j < k; j++) {
            start[j] = initialDerivatives.get(j).doubleValue();
            scale = Math.max(scale, Math.abs(start[j]));
        }
        double lead = coefficients.get(k).doubleValue();
        FirstOrderDifferentialEquations system = new CompanionSystem(ratios, t -> forcing.applyAsDouble(t) / lead);
        double begin = t0.doubleValue();
        double[] result = new double[points.length];
        sweep(system, begin, start, scale, points, result, 1, maxEvaluations);
        sweep(system, begin, start, scale, points, result, -1, maxEvaluations);
        return result;
    }

    /**
     * The points on one side of t0 ({@code direction} +1: at or after it, −1: before it), in order of
     * distance: each integration continues from the state the previous one reached, so the
     * integrator covers the farthest span once instead of every span from t0. The evaluation budget
     * counts from t0, as for a single integration to each point.
     */
    private static void sweep(FirstOrderDifferentialEquations system, double begin, double[] start, double scale,
            double[] points, double[] result, int direction, int maxEvaluations) {
        Integer[] order = java.util.stream.IntStream.range(0, points.length).boxed()
                .filter(i -> direction > 0 ? points[i] >= begin : points[i] < begin)
                .sorted(java.util.Comparator.comparingDouble(i -> Math.abs(points[i] - begin)))
                .toArray(Integer[]::new);
        double[] state = start.clone();
        double at = begin;
        int used = 0;
        for (int i : order) {
            double span = Math.abs(points[i] - begin);
            if (points[i] != at) {
                DormandPrince853Integrator integrator = new DormandPrince853Integrator(
                        MIN_STEP_FRACTION * span, Math.abs(points[i] - at), RELATIVE_TOLERANCE * scale, RELATIVE_TOLERANCE);
                integrator.setMaxEvaluations(maxEvaluations - used);
                integrator.addStepHandler(new DeadlineCheck());
                integrator.integrate(system, at, state, points[i], state);
                used += integrator.getEvaluations();
                at = points[i];
            }
            result[i] = state[0];
        }
    }

    /** Checks the current deadline at the start and after each accepted step. */
    private static final class DeadlineCheck implements StepHandler {
        @Override
        public void init(double t0, double[] y0, double t) {
            Deadline.checkCurrent();
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            Deadline.checkCurrent();
        }
    }

    /** u' = C·u + (0, …, 0, g(t)/a_k) for the companion matrix C of the normalised equation. */
    private record CompanionSystem(double[] ratios, DoubleUnaryOperator input) implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return ratios.length;
        }

        @Override
        public void computeDerivatives(double t, double[] u, double[] du) {
            int k = ratios.length;
            double last = input.applyAsDouble(t);
            for (int j = 0; j < k; j++) {
                last -= ratios[j] * u[j];
            }
            System.arraycopy(u, 1, du, 0, k - 1);
            du[k - 1] = last;
        }
    }
}
