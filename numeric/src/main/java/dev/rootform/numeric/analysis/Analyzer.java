package dev.rootform.numeric.analysis;

import dev.rootform.numeric.diagnostics.Diagnoser;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.diagnostics.SampleValue;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
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
    /** Offsets from the first index (sequences) or from t0 (functions) of the cancellation samples. */
    static final long[] SAMPLE_OFFSETS = {1, 10, 100};
    /** Digits of the sample values: enough to size a double-precision evaluation's error. */
    static final int SAMPLE_DIGITS = 17;

    private final int digits;
    private final boolean plots;

    /** @param digits significant digits of every numeric output, 1 or more */
    public Analyzer(int digits) {
        this(digits, false);
    }

    /**
     * @param digits significant digits of every numeric output, 1 or more
     * @param plots also sample the solution and its frequency response for plots ({@link Analysis#plots()})
     */
    public Analyzer(int digits, boolean plots) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits (" + digits + ") must be >= 1");
        }
        this.digits = digits;
        this.plots = plots;
    }

    /**
     * @param points where to evaluate the solution
     * @throws IllegalArgumentException if {@link ValueRequests#refusal} refuses the points (a
     *     general solution, or a sequence at a non-integer index or below its first index); callers
     *     check first
     */
    public Analysis analyze(Solution solution, List<Rational> points) {
        ValueRequests.refusal(solution, points).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
        RootCache cache = new RootCache();
        List<RootApproximation> roots = new ArrayList<>();
        for (ExactRoot r : solution.roots()) {
            Deadline.checkCurrent();
            roots.add(approximate(r, cache));
        }
        List<PointValue> values = new ArrayList<>();
        List<Check> checks = new ArrayList<>();
        Map<String, BigDecimal> constants = new LinkedHashMap<>();
        Optional<BoundaryValues> fixed = Optional.empty();
        if (solution.hasNumericConstants()) {
            BoundaryValues bvp = BoundaryValues.solve(solution, digits, cache);
            fixed = Optional.of(bvp);
            constants.putAll(bvp.constants(digits));
            points.forEach(p -> values.add(boundaryValue(bvp, p)));
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
            points.forEach(p -> values.add(exactValue(s, p, cache)));
            if (s.domain() == Domain.DIFFERENTIAL) {
                checks.add(integratorCheck(s, cache));
            }
        }
        List<PointValue> samples = new ArrayList<>(values);
        exact.ifPresent(s -> samples.addAll(samples(s, cache)));
        Diagnostics diagnostics = new Diagnoser(digits).diagnose(solution, roots,
                samples.stream().map(v -> new SampleValue(v.at(), v.value())).toList());
        List<SteadyState> steady = diagnostics.stability().verdict() == Stability.Verdict.ASYMPTOTICALLY_STABLE
                ? FrequencyResponse.of(solution.problem().equation(), digits) : List.of();
        Optional<Plots> sampled = plots
                ? Optional.of(PlotSampler.sample(solution, diagnostics, fixed, values, !steady.isEmpty(), cache))
                : Optional.empty();
        return new Analysis(roots, values, checks, constants, steady, Optional.of(diagnostics), diagnostics.warnings(), sampled);
    }

    /**
     * The solution's values at {@code points}, and nothing else: exact for sequences, to the
     * digits of this analyzer for functions (boundary-value constants are solved again).
     *
     * @throws IllegalArgumentException if {@link ValueRequests#refusal} refuses the points
     */
    public List<PointValue> values(Solution solution, List<Rational> points) {
        ValueRequests.refusal(solution, points).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
        RootCache cache = new RootCache();
        List<PointValue> values = new ArrayList<>();
        if (solution.hasNumericConstants()) {
            BoundaryValues bvp = BoundaryValues.solve(solution, digits, cache);
            points.forEach(p -> values.add(boundaryValue(bvp, p)));
        }
        solution.radical().ifPresent(r -> points.forEach(p -> values.add(radicalValue(r, p))));
        solution.exact().ifPresent(s -> points.forEach(p -> values.add(exactValue(s, p, cache))));
        return values;
    }

    private PointValue boundaryValue(BoundaryValues bvp, Rational p) {
        return new PointValue(p, Decimals.toBigDecimal(bvp.derivative(0, p), digits), Optional.empty());
    }

    private PointValue exactValue(ExactSolution s, Rational p, RootCache cache) {
        return s.domain() == Domain.DIFFERENCE ? sequenceValue(s, p) : functionValue(s, p, digits, cache);
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
            long precision = digits + WorkingPrecision.GUARD_DIGITS;
            Apfloat angle = ApfloatMath.pi(precision).multiply(new Apfloat(2L * u.k(), precision))
                    .divide(new Apfloat(u.order(), precision));
            // cos + i·sin by our own exponential: cancellable, and far faster than apfloat's cos and sin
            Apcomplex unit = ComplexExp.exp(new Apcomplex(Apfloat.ZERO, angle), precision);
            return new RootApproximation(root, Decimals.toBigDecimal(unit.real(), digits),
                    Decimals.toBigDecimal(unit.imag(), digits), BigDecimal.ZERO);
        }
        if (root instanceof ExactRoot.Implicit i) {
            Enclosure z = cache.roots(i.factor(), digits + WorkingPrecision.GUARD_DIGITS).get(i.index() - 1);
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

    /** x[n] exactly, at an index {@link ValueRequests} accepts. */
    private PointValue sequenceValue(ExactSolution s, Rational at) {
        Rational v = s.valueAt(at.toBigInteger().longValueExact());
        return new PointValue(at, v.toBigDecimal(new MathContext(digits)), Optional.of(v));
    }

    /** y(t) to {@code wanted} significant digits. */
    private static PointValue functionValue(ExactSolution s, Rational t, int wanted, RootCache cache) {
        if (t.equals(s.origin())) {
            Rational v = s.derivativeAtOrigin(0);
            return new PointValue(t, v.toBigDecimal(new MathContext(wanted)), Optional.of(v));
        }
        Apfloat[] settled = WorkingPrecision.settle(wanted, working -> ModeSum.of(s, cache, working).valueAndLargest(t),
                (low, high, working) -> agree(low, high, working, wanted),
                (working, high) -> working + WorkingPrecision.GUARD_DIGITS
                        + (int) Math.ceil(ApfloatMath.log(high[1].add(Apfloat.ONE)).doubleValue() / Math.log(10)),
                "value at t = " + t);
        return new PointValue(t, Decimals.toBigDecimal(settled[0], wanted), Optional.empty());
    }

    /**
     * Whether two evaluations {value, largest mode magnitude} agree to {@code wanted} digits, or to
     * the working precision's floor below the largest mode (a value that cancels to about 0).
     */
    private static boolean agree(Apfloat[] low, Apfloat[] high, int working, int wanted) {
        Apfloat difference = ApfloatMath.abs(low[0].subtract(high[0]));
        Apfloat relative = ApfloatMath.abs(high[0]).multiply(new Apfloat("1e-" + (wanted + 2), working));
        Apfloat floor = high[1].multiply(new Apfloat("1e-" + (working - WorkingPrecision.GUARD_DIGITS / 2), working));
        return difference.compareTo(relative) <= 0 || difference.compareTo(floor) <= 0;
    }

    /** The integrator cross-check from the exact derivatives at the origin t0, at t0 + {@link IntegratorCheck#offsets}. */
    private static Check integratorCheck(ExactSolution s, RootCache cache) {
        int k = s.equation().order();
        List<Rational> initial = new ArrayList<>(k);
        for (int d = 0; d < k; d++) {
            initial.add(s.derivativeAtOrigin(d));
        }
        double t0 = s.origin().doubleValue();
        double[] offsets = IntegratorCheck.offsets(s.equation());
        double[] points = new double[offsets.length];
        double[] closed = new double[points.length];
        for (int i = 0; i < points.length; i++) {
            points[i] = t0 + offsets[i];
            closed[i] = functionValue(s, Rational.of(BigDecimal.valueOf(points[i])), 17, cache).value().doubleValue();
        }
        return IntegratorCheck.compare(s.equation(), s.origin(), initial, points, closed, "at t0 + " + IntegratorCheck.offsetText(s.equation()));
    }
}
