package dev.rootform.numeric.response;

import dev.rootform.numeric.analysis.ModeSum;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.IntPredicate;

/**
 * Rise time, peak and overshoot, and settling time of a stable step response, from its exact
 * closed form.
 *
 * <p>Continuous time: a horizon T is chosen where the envelope of the decaying modes
 * ({@link ModeTable#envelope}) is below {@link #TAIL} of |y∞| and every mode is past its maximum,
 * so no crossing of the 2 % band lies beyond T. A grid finer than a twentieth of the fastest time
 * constant and of the shortest half period brackets the sign changes in double precision; each
 * crossing (y = c·y∞) and each peak (y' = 0) is then refined by Newton's method kept inside its
 * bracket by bisection, on the closed form evaluated in apfloat at the requested digits plus
 * {@link #GUARD_DIGITS}, after the sign change is confirmed at that precision.
 *
 * <p>Discrete time: the same horizon in samples; the figures are sample counts decided on the
 * exact values y[n] wherever a double is within {@link #NEAR} of a threshold.
 *
 * <p>Every loop checks the current {@link Deadline}.
 *
 * @since 0.3
 */
public final class StepFigureFinder {
    static final int GUARD_DIGITS = 20;
    /** Envelope of the transient at the horizon, relative to |y∞|. */
    static final double TAIL = 0.002;
    /** Largest number of grid points. */
    static final int MAX_POINTS = 200_000;
    /** Double values this close to a threshold are decided exactly. */
    static final double NEAR = 1e-9;
    private static final Rational LOW = Rational.of(1, 10);
    private static final Rational HIGH = Rational.of(9, 10);
    private static final Rational BAND = Rational.of(1, 50);
    private static final Rational HUNDRED = Rational.of(100);
    private static final int MAX_ITERATIONS = 400;
    /** Grid points between two deadline checks. */
    private static final int CHECK_EVERY = 1024;

    private final int digits;

    /** @param digits significant digits of the figures */
    public StepFigureFinder(int digits) {
        this.digits = digits;
    }

    /** The figures of y(t) = s for t &gt; 0, a stable step response with final value y∞. */
    public StepFigures continuous(ExactSolution s, Rational finalValue) {
        if (finalValue.isZero()) {
            return undefined(finalValue, false);
        }
        ModeTable table = ModeTable.of(s);
        double yInf = finalValue.doubleValue();
        double horizon = horizon(table, yInf);
        double h = Math.max(step(table, horizon), horizon / MAX_POINTS);
        int n = (int) Math.ceil(horizon / h);
        double[] f = new double[n + 1];
        double[] df = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            if (k % CHECK_EVERY == 0) {
                Deadline.checkCurrent();
            }
            f[k] = table.value(k * h) / yInf;
            df[k] = table.derivative(k * h) / yInf;
        }
        Refiner refiner = new Refiner(ModeSum.of(s, digits + GUARD_DIGITS), digits + GUARD_DIGITS, digits);
        List<String> notes = new ArrayList<>();
        notes.add(String.format("crossings and peaks bracketed on a grid of %d points up to t = %.4g, where the decaying modes"
                + " are below %.1f %% of the final value, and refined by bracketed Newton steps in %d-digit arithmetic",
                n + 1, horizon, TAIL * 100, digits + GUARD_DIGITS));
        Optional<BigDecimal> t10 = firstReach(f, h, LOW, finalValue, refiner);
        Optional<BigDecimal> t90 = firstReach(f, h, HIGH, finalValue, refiner);
        Optional<BigDecimal> rise = t10.isPresent() && t90.isPresent() ? Optional.of(t90.get().subtract(t10.get())) : Optional.empty();
        Optional<BigDecimal[]> peak = peak(f, df, h, finalValue, refiner);
        Optional<BigDecimal> overshoot = Optional.of(peak.map(p -> p[1].divide(finalValue.toBigDecimal(refiner.mc), refiner.mc)
                .subtract(BigDecimal.ONE).multiply(BigDecimal.valueOf(100))).orElse(BigDecimal.ZERO));
        if (peak.isEmpty()) {
            notes.add("no overshoot: y never exceeds its final value");
        }
        Optional<BigDecimal> settling = settling(f, h, finalValue, refiner);
        return new StepFigures(finalValue, false, rise.map(this::round), peak.map(p -> round(p[0])), peak.map(p -> round(p[1])),
                overshoot.map(this::round), Optional.empty(), settling.map(this::round), notes);
    }

    /** The figures of y[n] (all n ≥ 0 from s, its listed first values included), a stable step response. */
    public StepFigures discrete(ExactSolution s, Rational finalValue) {
        if (finalValue.isZero()) {
            return undefined(finalValue, true);
        }
        ModeTable table = ModeTable.of(s);
        double yInf = finalValue.doubleValue();
        long first = s.validFrom();
        int n = (int) Math.min(MAX_POINTS, Math.max(first, (long) Math.ceil(horizon(table, yInf))));
        double[] f = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            if (k % CHECK_EVERY == 0) {
                Deadline.checkCurrent();
            }
            f[k] = (k < first ? s.valueAt(k).doubleValue() : table.value(k)) / yInf;
        }
        Exact exact = new Exact(s, finalValue);
        int n10 = firstIndex(n, k -> exact.atLeast(f[k], k, LOW));
        int n90 = firstIndex(n, k -> exact.atLeast(f[k], k, HIGH));
        double top = Double.NEGATIVE_INFINITY;
        for (double v : f) {
            top = Math.max(top, v);
        }
        int peak = -1;
        Rational best = null;
        for (int k = 0; k <= n; k++) {
            if (f[k] >= top - NEAR * Math.max(1, Math.abs(top))) {
                Rational v = exact.relative(k);
                if (best == null || v.compareTo(best) > 0) {
                    best = v;
                    peak = k;
                }
            }
        }
        boolean overshoots = best != null && best.compareTo(Rational.ONE) > 0;
        int last = -1;
        for (int k = n; k >= 0 && last < 0; k--) {
            if (exact.outside(f[k], k)) {
                last = k;
            }
        }
        List<String> notes = new ArrayList<>();
        notes.add("sample counts decided on the exact values y[n] for n <= " + n + ", past which the decaying modes stay below "
                + TAIL * 100 + " % of the final value");
        Rational over = overshoots ? best.subtract(Rational.ONE).multiply(HUNDRED) : Rational.ZERO;
        if (!overshoots) {
            notes.add("no overshoot: y never exceeds its final value");
        }
        Optional<BigDecimal> rise = n10 >= 0 && n90 >= 0 ? Optional.of(BigDecimal.valueOf(n90 - n10)) : Optional.empty();
        int peakIndex = peak;
        return new StepFigures(finalValue, true, rise, overshoots ? Optional.of(BigDecimal.valueOf(peakIndex)) : Optional.empty(),
                overshoots ? Optional.of(round(s.valueAt(peakIndex).toBigDecimal(new MathContext(digits + GUARD_DIGITS))))
                        : Optional.empty(),
                Optional.of(round(over.toBigDecimal(new MathContext(digits + GUARD_DIGITS)))), Optional.of(over),
                Optional.of(BigDecimal.valueOf(last + 1L)), notes);
    }

    private StepFigures undefined(Rational finalValue, boolean discrete) {
        return new StepFigures(finalValue, discrete, Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), Optional.empty(), List.of("final value 0: rise time, overshoot and settling time are"
                        + " relative to the final value and undefined"));
    }

    /** A time (or index) past every mode's maximum where the envelope of the decaying modes is below TAIL·|y∞|. */
    private static double horizon(ModeTable table, double yInf) {
        double start = 1;
        for (ModeTable.Mode m : table.modes()) {
            if (!m.steady()) {
                double rate = decay(table, m);
                if (!(rate > 0)) {
                    throw new IllegalArgumentException("step figures need a stable response");
                }
                start = Math.max(start, Math.max(m.power() / rate, 1 / rate));
            }
        }
        double t = start;
        for (int i = 0; i < 200 && table.envelope(t) > TAIL * Math.abs(yInf); i++) {
            t *= 2;
        }
        return t;
    }

    /** The decay rate of a mode: −Re α for functions, −ln|α| for sequences. */
    private static double decay(ModeTable table, ModeTable.Mode m) {
        double magnitude = Math.hypot(m.aRe(), m.aIm());
        return table.isContinuous() ? -m.aRe() : -Math.log(magnitude);
    }

    /** A twentieth of the shortest time constant and half period. */
    private static double step(ModeTable table, double horizon) {
        double h = horizon / 400;
        for (ModeTable.Mode m : table.modes()) {
            if (!m.steady()) {
                h = Math.min(h, 1 / -m.aRe() / 20);
                if (m.aIm() != 0) {
                    h = Math.min(h, Math.PI / Math.abs(m.aIm()) / 20);
                }
            }
        }
        return h;
    }

    /** The first t with y(t) = level·y∞ coming from below (0 when y(0+) is already there). */
    private Optional<BigDecimal> firstReach(double[] f, double h, Rational level, Rational yInf, Refiner refiner) {
        double l = level.doubleValue();
        if (f[0] >= l) {
            return Optional.of(BigDecimal.ZERO);
        }
        for (int k = 1; k < f.length; k++) {
            if (f[k] >= l) {
                Optional<BigDecimal> t = refiner.root(0, level.multiply(yInf), (k - 1) * h, k * h);
                if (t.isPresent()) {
                    return t;
                }
            }
        }
        return Optional.empty();
    }

    /** {time, value} of the largest local maximum of y/y∞ above 1. */
    private Optional<BigDecimal[]> peak(double[] f, double[] df, double h, Rational yInf, Refiner refiner) {
        double top = Double.NEGATIVE_INFINITY;
        for (int k = 1; k < f.length; k++) {
            if (df[k - 1] > 0 && df[k] <= 0) {
                top = Math.max(top, Math.max(f[k - 1], f[k]));
            }
        }
        BigDecimal[] best = null;
        BigDecimal scale = yInf.toBigDecimal(refiner.mc);
        for (int k = 1; k < f.length; k++) {
            if (df[k - 1] > 0 && df[k] <= 0 && Math.max(f[k - 1], f[k]) >= top - 1e-6 && top > 1) {
                Optional<BigDecimal> t = refiner.root(1, Rational.ZERO, (k - 1) * h, k * h);
                if (t.isPresent()) {
                    BigDecimal value = refiner.value(0, t.get());
                    if (best == null || value.divide(scale, refiner.mc).compareTo(best[1].divide(scale, refiner.mc)) > 0) {
                        best = new BigDecimal[] {t.get(), value};
                    }
                }
            }
        }
        return best == null || best[1].divide(scale, refiner.mc).compareTo(BigDecimal.ONE) <= 0
                ? Optional.empty() : Optional.of(best);
    }

    /** The last t with |y − y∞| = 0.02·|y∞|; 0 when y stays inside the band from the start. */
    private Optional<BigDecimal> settling(double[] f, double h, Rational yInf, Refiner refiner) {
        double band = BAND.doubleValue();
        for (int k = f.length - 1; k >= 0; k--) {
            if (Math.abs(f[k] - 1) > band) {
                if (k == f.length - 1) {
                    return Optional.empty();
                }
                Rational level = f[k] > 1 ? Rational.ONE.add(BAND) : Rational.ONE.subtract(BAND);
                return refiner.root(0, level.multiply(yInf), k * h, (k + 1) * h);
            }
        }
        return Optional.of(BigDecimal.ZERO);
    }

    private static int firstIndex(int n, IntPredicate test) {
        for (int k = 0; k <= n; k++) {
            if (test.test(k)) {
                return k;
            }
        }
        return -1;
    }

    private BigDecimal round(BigDecimal x) {
        return x.round(new MathContext(digits));
    }

    /** Exact decisions on y[n]/y∞, used where the double is close to a threshold. */
    private static final class Exact {
        private final ExactSolution s;
        private final Rational yInf;

        Exact(ExactSolution s, Rational yInf) {
            this.s = s;
            this.yInf = yInf;
        }

        Rational relative(int n) {
            return s.valueAt(n).divide(yInf);
        }

        boolean atLeast(double approx, int n, Rational level) {
            double l = level.doubleValue();
            return Math.abs(approx - l) < NEAR ? relative(n).compareTo(level) >= 0 : approx >= l;
        }

        boolean outside(double approx, int n) {
            double distance = Math.abs(approx - 1) - BAND.doubleValue();
            return Math.abs(distance) < NEAR ? relative(n).subtract(Rational.ONE).abs().compareTo(BAND) > 0 : distance > 0;
        }
    }

    /** Roots of y^(d)(t) − target in a bracket, at high precision. */
    private static final class Refiner {
        private final ModeSum sum;
        private final MathContext mc;
        private final BigDecimal tolerance;

        /**
         * @param precision working digits of the evaluations
         * @param digits requested digits: iteration stops once a step is below 10^-(digits + 5)
         *     relative, when Newton's quadratic convergence leaves an error of about its square
         */
        Refiner(ModeSum sum, int precision, int digits) {
            this.sum = sum;
            this.mc = new MathContext(precision);
            this.tolerance = BigDecimal.ONE.movePointLeft(digits + 5);
        }

        BigDecimal value(int d, BigDecimal t) {
            return sum.derivativeAt(d, t);
        }

        /**
         * The root in [a, b] when y^(d) − target changes sign there at high precision; when the
         * double scan put the sign change on the wrong side of a grid point (a root within rounding
         * of it), in the bracket widened by its width on that side.
         */
        Optional<BigDecimal> root(int d, Rational target, double a0, double b0) {
            double w = b0 - a0;
            return root(d, target, new BigDecimal(a0), new BigDecimal(b0))
                    .or(() -> root(d, target, new BigDecimal(Math.max(0, a0 - w)), new BigDecimal(a0)))
                    .or(() -> root(d, target, new BigDecimal(b0), new BigDecimal(b0 + w)));
        }

        private Optional<BigDecimal> root(int d, Rational target, BigDecimal left, BigDecimal right) {
            BigDecimal c = target.toBigDecimal(mc);
            BigDecimal a = left;
            BigDecimal b = right;
            int sa = value(d, a).subtract(c).signum();
            int sb = value(d, b).subtract(c).signum();
            if (sa == 0) {
                return Optional.of(a);
            }
            if (sb == 0) {
                return Optional.of(b);
            }
            if (sa == sb) {
                return Optional.empty();
            }
            BigDecimal two = BigDecimal.valueOf(2);
            BigDecimal x = a.add(b).divide(two, mc);
            for (int i = 0; i < MAX_ITERATIONS; i++) {
                Deadline.checkCurrent();
                BigDecimal fx = value(d, x).subtract(c);
                if (fx.signum() == 0) {
                    return Optional.of(x);
                }
                if (fx.signum() == sa) {
                    a = x;
                } else {
                    b = x;
                }
                BigDecimal slope = value(d + 1, x);
                BigDecimal next = slope.signum() == 0 ? null : x.subtract(fx.divide(slope, mc), mc);
                if (next == null || next.compareTo(a) <= 0 || next.compareTo(b) >= 0) {
                    next = a.add(b).divide(two, mc);
                }
                BigDecimal moved = next.subtract(x).abs();
                x = next;
                if (moved.compareTo(tolerance.multiply(x.abs().max(BigDecimal.ONE))) <= 0
                        || b.subtract(a).compareTo(tolerance.multiply(x.abs().max(BigDecimal.ONE))) <= 0) {
                    return Optional.of(x);
                }
            }
            return Optional.of(x);
        }
    }
}
