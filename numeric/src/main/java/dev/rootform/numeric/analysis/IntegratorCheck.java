package dev.rootform.numeric.analysis;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The independent cross-check of a differential equation's solution against Commons Math's
 * Dormand–Prince 8(5,3) integrator ({@link OdeReference}), on the problem's own time scales: the
 * solution is compared at t0 + m·s for m in {@link #MULTIPLES} and each representative time scale s
 * ({@link TimeScales#representative}: the transient is compared, not only the settled value), and at
 * the caller's extra points (the other condition points of a boundary-value problem). A point within
 * {@link #HORIZON}/R of t0 (R the fastest rate) is reached from t0 with the solution's derivatives
 * there; a farther point from the closed form's derivatives at the point minus HORIZON/R, so that no
 * integration is longer than about HORIZON fastest time units and stiff or high-frequency problems
 * stay cheap (an explicit integrator needs steps of order 1/R). The values must agree to
 * {@link #TOLERANCE} relative to max(1, largest |y|). An integration that still needs more than
 * {@link #MAX_EVALUATIONS} evaluations or too small a step is not run, and the check says so: it
 * never counts as passed. Used for exactly fitted solutions and for numerically fixed constants
 * alike.
 */
final class IntegratorCheck {
    /** Name of the check. */
    static final String NAME = "agrees with numerical integration";
    /** Evaluations of the right-hand side allowed per integration (DOP853 takes 12 a step). */
    static final int MAX_EVALUATIONS = 300_000;
    /** Multiples of each time scale at which the solution is compared. */
    static final double[] MULTIPLES = {0.25, 1, 4};
    /** Longest integration, in units of the fastest time scale 1/R. */
    static final double HORIZON = 2000;
    /** Relative agreement required of the double-precision integrator. */
    static final double TOLERANCE = 1e-7;
    /**
     * Largest error, relative to max(1, |y|), allowed of the closed form's value at a comparison
     * point: a thousandth of {@link #TOLERANCE}, so that the comparison measures the integrator.
     */
    static final double CLOSED_FORM_ERROR = TOLERANCE * 1e-3;

    /** The closed form being checked: its value, and its derivatives to start a window from. */
    interface Solved {
        /** y(t) in double precision. */
        double value(double t);

        /** y(t), y'(t), …, y^(k−1)(t), rounded to rationals. */
        List<Rational> state(Rational t);
    }

    private IntegratorCheck() {
    }

    /**
     * @param t0 where {@code initial} holds
     * @param initial y(t0), y'(t0), …, y^(k−1)(t0) of the solution
     * @param scales the problem's time scales
     * @param extra further comparison points
     * @param start how t0 is named in the detail, e.g. {@code "t0"} or {@code "t = 0"}
     */
    static Check compare(LinearEquation eq, Rational t0, List<Rational> initial, TimeScales scales, List<Double> extra,
            Solved closed, String start) {
        if (!Double.isFinite(scales.fastest())) {
            return notRun(start);
        }
        double begin = t0.doubleValue();
        TreeSet<Double> points = new TreeSet<>(extra);
        List<Double> used = scales.representative();
        for (double s : used) {
            for (double m : MULTIPLES) {
                points.add(begin + m * s);
            }
        }
        points.remove(begin);
        double horizon = scales.fastest() == 0 ? Double.POSITIVE_INFINITY : HORIZON / scales.fastest();
        List<Double> near = points.stream().filter(p -> Math.abs(p - begin) <= horizon).toList();
        double scale = 1;
        double worst = 0;
        int windows = 0;
        Optional<double[]> reference = OdeReference.values(eq.coefficients(), ForcingFunction.of(eq.forcing()), t0, initial,
                near.stream().mapToDouble(Double::doubleValue).toArray(), MAX_EVALUATIONS);
        if (reference.isEmpty()) {
            return notRun(start);
        }
        for (int i = 0; i < near.size(); i++) {
            double value = closed.value(near.get(i));
            scale = Math.max(scale, Math.abs(value));
            worst = Math.max(worst, Math.abs(value - reference.get()[i]));
        }
        for (double p : points) {
            if (Math.abs(p - begin) <= horizon) {
                continue;
            }
            Deadline.checkCurrent();
            Rational from = Rational.of(new BigDecimal(p - Math.signum(p - begin) * horizon));
            Optional<double[]> window = OdeReference.values(eq.coefficients(), ForcingFunction.of(eq.forcing()), from,
                    closed.state(from), new double[] {p}, MAX_EVALUATIONS);
            if (window.isEmpty()) {
                return notRun(start);
            }
            double value = closed.value(p);
            scale = Math.max(scale, Math.abs(value));
            worst = Math.max(worst, Math.abs(value - window.get()[0]));
            windows++;
        }
        boolean passed = worst <= TOLERANCE * scale;
        String scaleText = used.stream().map(IntegratorCheck::brief).collect(Collectors.joining(", "));
        return new Check(NAME, passed, String.format(
                "Dormand-Prince 8(5,3) (Commons Math) from %s at %d points, %s x the time scales %s%s%s: largest "
                        + "difference %.2e (tolerance %.0e relative)", start, points.size(), multiples(), scaleText,
                extra.isEmpty() ? "" : " and at the other condition points",
                windows == 0 ? "" : "; " + windows + " far points from the closed form's state " + brief(horizon) + " before them",
                worst, TOLERANCE));
    }

    private static Check notRun(String start) {
        return Check.notRun(NAME, String.format("Dormand-Prince 8(5,3) from %s would need more than %d evaluations or steps below "
                + "the smallest allowed (the solution or its forcing is much faster than the span); the other checks stand",
                start, MAX_EVALUATIONS));
    }

    private static String multiples() {
        return java.util.Arrays.stream(MULTIPLES).mapToObj(IntegratorCheck::brief).collect(Collectors.joining("/", "{", "}"));
    }

    /** x to 4 significant digits. */
    private static String brief(double x) {
        return new BigDecimal(x).round(new java.math.MathContext(4)).stripTrailingZeros().toString();
    }
}
