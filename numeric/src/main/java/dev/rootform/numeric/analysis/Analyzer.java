package dev.rootform.numeric.analysis;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.numeric.diagnostics.Diagnoser;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.parse.InputException;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Numeric facts about an exact solution, each to a stated number of significant digits: root
 * values (exact forms rounded, or certified enclosures for roots kept implicit), values at points
 * (exact for sequences; for functions, evaluated in apfloat at a working precision that is raised
 * until two precisions agree), and an independent cross-check of differential equations against
 * Commons Math's Dormand–Prince 8(5,3) integrator.
 *
 * @since 0.1
 */
public final class Analyzer {
    public static final int DEFAULT_DIGITS = 30;
    /** Guard digits above the requested ones for function values. */
    static final int GUARD_DIGITS = 20;
    /** Highest working precision tried for one function value. */
    static final int MAX_WORKING_DIGITS = 5000;
    /** Points t0 + h where the integrator cross-check compares values. */
    static final double[] CHECK_OFFSETS = {0.25, 0.5, 1.0, 2.0};
    /** Relative agreement required of the double-precision integrator. */
    static final double CHECK_TOLERANCE = 1e-7;
    /** Offsets from the first index (sequences) or from t0 (functions) of the cancellation samples. */
    static final long[] SAMPLE_OFFSETS = {1, 10, 100};
    /** Digits of the sample values: enough to size a double-precision evaluation's error. */
    static final int SAMPLE_DIGITS = 17;

    private final int digits;

    /** @param digits significant digits of every numeric output, 1 or more */
    public Analyzer(int digits) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits (" + digits + ") must be >= 1");
        }
        this.digits = digits;
    }

    /**
     * @param points where to evaluate the solution
     * @throws InputException if values are asked of a general solution or a sequence at a
     *     non-integer index or below its first index
     */
    public Analysis analyze(Solution solution, List<Rational> points) {
        RootCache cache = new RootCache();
        List<RootApproximation> roots = new ArrayList<>();
        for (ExactRoot r : solution.roots()) {
            Deadline.checkCurrent();
            roots.add(approximate(r, cache));
        }
        List<PointValue> values = new ArrayList<>();
        List<Check> checks = new ArrayList<>();
        if (!points.isEmpty() && solution.exact().isEmpty() && solution.radical().isEmpty()
                && solution.problem().conditions().isEmpty()) {
            throw new InputException("values need conditions: the general solution has free constants", "", -1);
        }
        Map<String, BigDecimal> constants = new LinkedHashMap<>();
        if (solution.hasNumericConstants()) {
            BoundaryValues bvp = BoundaryValues.solve(solution, digits, cache);
            constants.putAll(bvp.constants(digits));
            for (Rational p : points) {
                values.add(new PointValue(p, Decimals.toBigDecimal(bvp.derivative(0, p), digits), Optional.empty()));
            }
            if (solution.numericParticular()) {
                checks.add(bvp.residualCheck(digits));
            }
            if (!solution.problem().conditions().isEmpty()) {
                checks.add(bvp.conditionsCheck(digits));
                checks.add(bvp.integratorCheck());
            }
        }
        solution.radical().ifPresent(r -> points.forEach(p -> values.add(radicalValue(r, p))));
        Optional<ExactSolution> exact = solution.exact();
        if (exact.isPresent()) {
            ExactSolution s = exact.get();
            for (Rational p : points) {
                values.add(s.domain() == Domain.DIFFERENCE ? sequenceValue(s, p) : functionValue(s, p, digits, cache));
            }
            if (s.domain() == Domain.DIFFERENTIAL) {
                checks.add(integratorCheck(s, cache));
            }
        }
        List<PointValue> samples = new ArrayList<>(values);
        exact.ifPresent(s -> samples.addAll(samples(s, cache)));
        Diagnostics diagnostics = new Diagnoser(digits).diagnose(solution, roots, samples);
        List<SteadyState> steady = diagnostics.stability().verdict() == Stability.Verdict.ASYMPTOTICALLY_STABLE
                ? FrequencyResponse.of(solution.problem().equation(), digits) : List.of();
        return new Analysis(roots, values, checks, constants, steady, Optional.of(diagnostics), diagnostics.warnings());
    }

    /** Values at the first valid index or t0 plus {@link #SAMPLE_OFFSETS}, to size cancellation. */
    private List<PointValue> samples(ExactSolution s, RootCache cache) {
        List<PointValue> samples = new ArrayList<>();
        for (long offset : SAMPLE_OFFSETS) {
            samples.add(s.domain() == Domain.DIFFERENCE ? sequenceValue(s, Rational.of(s.validFrom() + offset))
                    : functionValue(s, s.origin().add(Rational.of(offset)), SAMPLE_DIGITS, cache));
        }
        return samples;
    }

    private RootApproximation approximate(ExactRoot root, RootCache cache) {
        MathContext mc = new MathContext(digits);
        if (root instanceof ExactRoot.Explicit e) {
            return new RootApproximation(root, e.re().toBigDecimal(mc), e.im().toBigDecimal(mc), BigDecimal.ZERO);
        }
        if (root instanceof ExactRoot.OfUnity u) {
            long precision = digits + GUARD_DIGITS;
            Apfloat angle = ApfloatMath.pi(precision).multiply(new Apfloat(2L * u.k(), precision))
                    .divide(new Apfloat(u.order(), precision));
            // cos + i·sin by our own exponential: cancellable, and far faster than apfloat's cos and sin
            Apcomplex unit = ComplexExp.exp(new Apcomplex(Apfloat.ZERO, angle), precision);
            return new RootApproximation(root, Decimals.toBigDecimal(unit.real(), digits),
                    Decimals.toBigDecimal(unit.imag(), digits), BigDecimal.ZERO);
        }
        if (root instanceof ExactRoot.Implicit i) {
            Enclosure z = cache.roots(i.factor(), digits + GUARD_DIGITS).get(i.index() - 1);
            return new RootApproximation(root, z.re().round(mc), z.im().round(mc), z.radius());
        }
        throw new AssertionError(root);
    }

    /** x[n] = a + b·√r exactly; shown exact when b = 0. */
    private PointValue radicalValue(RadicalSolution r, Rational at) {
        Surd v = r.valueAt(at.toBigInteger().longValueExact());
        return new PointValue(at, v.toBigDecimal(new MathContext(digits)),
                v.isRational() ? Optional.of(v.rational()) : Optional.empty(), v.isRational() ? Optional.empty() : Optional.of(v));
    }

    private PointValue sequenceValue(ExactSolution s, Rational at) {
        if (!at.isInteger()) {
            throw new InputException("value at " + at + ": a sequence has values only at integer indices", "", -1);
        }
        long n = at.toBigInteger().longValueExact();
        if (n < s.origin().toBigInteger().longValueExact()) {
            throw new InputException("value at " + n + ": below the first index " + s.origin(), "", -1);
        }
        Rational v = s.valueAt(n);
        return new PointValue(at, v.toBigDecimal(new MathContext(digits)), Optional.of(v));
    }

    /** y(t) to {@code wanted} significant digits. */
    private static PointValue functionValue(ExactSolution s, Rational t, int wanted, RootCache cache) {
        if (t.equals(s.origin())) {
            Rational v = s.derivativeAtOrigin(0);
            return new PointValue(t, v.toBigDecimal(new MathContext(wanted)), Optional.of(v));
        }
        int working = wanted + GUARD_DIGITS;
        while (working <= MAX_WORKING_DIGITS) {
            Deadline.checkCurrent();
            Apfloat[] high = evaluate(s, t, working + GUARD_DIGITS, cache);
            Apfloat[] low = evaluate(s, t, working, cache);
            Apfloat difference = ApfloatMath.abs(low[0].subtract(high[0]));
            Apfloat relative = ApfloatMath.abs(high[0]).multiply(new Apfloat("1e-" + (wanted + 2), working));
            Apfloat floor = high[1].multiply(new Apfloat("1e-" + (working - GUARD_DIGITS / 2), working));
            if (difference.compareTo(relative) <= 0 || difference.compareTo(floor) <= 0) {
                return new PointValue(t, Decimals.toBigDecimal(high[0], wanted), Optional.empty());
            }
            working += GUARD_DIGITS + (int) Math.ceil(
                    ApfloatMath.log(high[1].add(Apfloat.ONE)).doubleValue() / Math.log(10));
        }
        throw new IllegalStateException("value at t = " + t + " did not settle within " + MAX_WORKING_DIGITS + " digits");
    }

    /** y(t) at {@code working} digits, and the largest mode magnitude there. */
    private static Apfloat[] evaluate(ExactSolution s, Rational t, int working, RootCache cache) {
        return ModeSum.of(s, cache, working).valueAndLargest(t);
    }

    private static Check integratorCheck(ExactSolution s, RootCache cache) {
        int k = s.equation().order();
        List<Rational> initial = new ArrayList<>(k);
        for (int d = 0; d < k; d++) {
            initial.add(s.derivativeAtOrigin(d));
        }
        double t0 = s.origin().doubleValue();
        double[] points = new double[CHECK_OFFSETS.length];
        for (int i = 0; i < points.length; i++) {
            points[i] = t0 + CHECK_OFFSETS[i];
        }
        double[] reference = OdeReference.values(s.equation().coefficients(),
                ForcingFunction.of(s.equation().forcing()), s.origin(), initial, points);
        double scale = 1;
        double worst = 0;
        for (int i = 0; i < points.length; i++) {
            double closed = functionValue(s, Rational.of(BigDecimal.valueOf(points[i])), 17, cache).value().doubleValue();
            scale = Math.max(scale, Math.abs(closed));
            worst = Math.max(worst, Math.abs(closed - reference[i]));
        }
        boolean passed = worst <= CHECK_TOLERANCE * scale;
        return new Check("agrees with numerical integration", passed, String.format(
                "Dormand-Prince 8(5,3) (Commons Math) at t0 + %s: largest difference %.2e (tolerance %.0e relative)",
                java.util.Arrays.toString(CHECK_OFFSETS), worst, CHECK_TOLERANCE));
    }
}
