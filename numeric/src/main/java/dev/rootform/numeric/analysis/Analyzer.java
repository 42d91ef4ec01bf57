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
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Component;
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
    /** Digits of the sample values when they are evaluated in apfloat. */
    static final int SAMPLE_DIGITS = 17;
    /**
     * Largest estimated error, relative, of a function's sample value taken in double precision:
     * the cancellation estimate needs the order of magnitude of the value, not its digits.
     */
    static final double SAMPLE_ERROR = 1e-6;
    /** Largest estimated size, in digits, of an exact sequence value that is computed exactly. */
    static final int EXACT_SIZE_LIMIT = 20_000;
    /** Digits of a state (y, y', …) that starts an integrator window away from t0. */
    static final int STATE_DIGITS = 30;

    private final int digits;
    private final boolean plots;
    private final boolean allDigits;

    /** @param digits significant digits of every numeric output, 1 or more */
    public Analyzer(int digits) {
        this(digits, false);
    }

    /**
     * @param digits significant digits of every numeric output, 1 or more
     * @param plots also sample the solution and its frequency response for plots ({@link Analysis#plots()})
     */
    public Analyzer(int digits, boolean plots) {
        this(digits, plots, false);
    }

    /**
     * @param digits significant digits of every numeric output, 1 or more
     * @param plots also sample the solution and its frequency response for plots ({@link Analysis#plots()})
     * @param allDigits give sequence values exactly with all their digits ({@link PointValue#allDigits()}),
     *     at indices that {@link ValueRequests#refusal(Solution, List, boolean)} accepts
     * @since 0.3
     */
    public Analyzer(int digits, boolean plots, boolean allDigits) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits (" + digits + ") must be >= 1");
        }
        this.digits = digits;
        this.plots = plots;
        this.allDigits = allDigits;
    }

    /**
     * @param points where to evaluate the solution
     * @throws IllegalArgumentException if {@link ValueRequests#refusal(Solution, List, boolean)} refuses the
     *     points (a general solution, or a sequence at a non-integer index or below its first index, or
     *     values with all their digits that cannot be given); callers check first
     */
    public Analysis analyze(Solution solution, List<Rational> points) {
        RootCache cache = new RootCache();
        ValueRequests.refusal(solution, points, allDigits, cache).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
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
                checks.add(bvp.integratorCheck(TimeScales.of(solution.problem().equation(), roots)));
            }
        }
        solution.radical().ifPresent(r -> points.forEach(p -> values.add(radicalValue(r, p, cache))));
        solution.sinusoid().ifPresent(s -> {
            points.forEach(p -> values.add(SinusoidValues.value(s, p, digits, cache)));
            checks.add(SinusoidValues.iterationCheck(s, solution.problem().equation(), digits, cache));
        });
        Optional<ExactSolution> exact = solution.exact();
        exact.ifPresent(s -> points.forEach(p -> values.add(exactValue(s, p, cache))));
        if (solution.problem().equation().domain() == Domain.DIFFERENTIAL) {
            exact.map(s -> FittedFunction.of(s, cache)).or(() -> solution.radical().map(r -> FittedFunction.of(r, cache)))
                    .ifPresent(f -> checks.add(f.integratorCheck(roots)));
        }
        List<SampleValue> samples = new ArrayList<>(values.stream().map(v -> new SampleValue(v.at(), v.value())).toList());
        exact.ifPresent(s -> samples.addAll(samples(s, cache)));
        Diagnostics diagnostics = new Diagnoser(digits).diagnose(solution, roots, samples);
        List<SteadyState> steady = diagnostics.stability().verdict() == Stability.Verdict.ASYMPTOTICALLY_STABLE
                ? FrequencyResponse.of(solution.problem().equation(), digits) : List.of();
        Optional<Plots> sampled = plots
                ? Optional.of(PlotSampler.sample(solution, diagnostics, fixed, values, !steady.isEmpty(), cache))
                : Optional.empty();
        return new Analysis(roots, values, checks, constants, steady, Optional.of(diagnostics), diagnostics.warnings(), sampled,
                ConjugateSumModes.of(solution.closedForm(), digits, cache));
    }

    /**
     * The values of exact roots to this analyzer's digits: exact forms rounded, implicit roots
     * from certified enclosures; in the order given.
     */
    public List<RootApproximation> approximate(List<ExactRoot> roots) {
        RootCache cache = new RootCache();
        return roots.stream().map(r -> approximate(r, cache)).toList();
    }

    /**
     * The solution's values at {@code points}, and nothing else: exact for sequences, to the
     * digits of this analyzer for functions (boundary-value constants are solved again).
     *
     * @throws IllegalArgumentException if {@link ValueRequests#refusal} refuses the points
     */
    public List<PointValue> values(Solution solution, List<Rational> points) {
        RootCache cache = new RootCache();
        ValueRequests.refusal(solution, points, allDigits, cache).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
        return valuesOfAnySize(solution, points, cache);
    }

    /**
     * Like {@link #values}, for points of any size that rootform chose itself, such as the sample
     * that measures generated code up to n = 10^15 (sequence values there come from certified
     * evaluation of the modes, never from a huge exact fraction).
     *
     * @throws IllegalArgumentException if the points are refused for a reason other than their size
     *     (a general solution, a non-integer index, an index below the first)
     */
    public List<PointValue> referenceValues(Solution solution, List<Rational> points) {
        ValueRequests.refusalOfAnySize(solution, points).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
        return valuesOfAnySize(solution, points, new RootCache());
    }

    private List<PointValue> valuesOfAnySize(Solution solution, List<Rational> points, RootCache cache) {
        List<PointValue> values = new ArrayList<>();
        if (solution.hasNumericConstants()) {
            BoundaryValues bvp = BoundaryValues.solve(solution, digits, cache);
            points.forEach(p -> values.add(boundaryValue(bvp, p)));
        }
        solution.radical().ifPresent(r -> points.forEach(p -> values.add(radicalValue(r, p, cache))));
        solution.sinusoid().ifPresent(s -> points.forEach(p -> values.add(SinusoidValues.value(s, p, digits, cache))));
        solution.exact().ifPresent(s -> points.forEach(p -> values.add(exactValue(s, p, cache))));
        return values;
    }

    private PointValue boundaryValue(BoundaryValues bvp, Rational p) {
        return new PointValue(p, Decimals.toBigDecimal(bvp.derivative(0, p), digits), Optional.empty());
    }

    private PointValue exactValue(ExactSolution s, Rational p, RootCache cache) {
        if (s.domain() == Domain.DIFFERENCE) {
            return allDigits ? allDigitsValue(s, p, cache) : sequenceValue(s, p, digits, cache);
        }
        return FittedFunction.of(s, cache).value(p, digits);
    }

    /**
     * x[n] with all its digits: the exact fraction while it is estimated at no more than
     * {@link #EXACT_SIZE_LIMIT} digits, else by {@link IndexPowering} (then without the binary
     * fraction, see {@link PointValue#allDigits()}).
     */
    private PointValue allDigitsValue(ExactSolution s, Rational at, RootCache cache) {
        long n = at.toBigInteger().longValueExact();
        MathContext rounding = new MathContext(digits);
        if (n < s.validFrom() || SequenceSum.exactDigits(s, n, cache) <= EXACT_SIZE_LIMIT) {
            Rational v = s.valueAt(n);
            return new PointValue(at, v.toBigDecimal(rounding), Optional.of(v), Optional.empty(), Optional.of(ExactDigits.of(v)));
        }
        ExactDigits v = IndexPowering.value(s, n);
        return new PointValue(at, v.toBigDecimal(rounding), Optional.empty(), Optional.empty(), Optional.of(v));
    }

    /**
     * Values at the first valid index or t0 plus {@link #SAMPLE_OFFSETS}, to size cancellation; a
     * function's sample beyond the range of numbers (y' = 10^20·y at t0 + 1) is left out.
     */
    private List<SampleValue> samples(ExactSolution s, RootCache cache) {
        List<SampleValue> samples = new ArrayList<>();
        for (long offset : SAMPLE_OFFSETS) {
            if (s.domain() == Domain.DIFFERENCE) {
                Rational n = Rational.of(s.validFrom() + offset);
                samples.add(new SampleValue(n, sequenceValue(s, n, SAMPLE_DIGITS, cache).value()));
                continue;
            }
            Rational t = s.origin().add(Rational.of(offset));
            try {
                samples.add(new SampleValue(t, FittedFunction.of(s, cache).sample(t, SAMPLE_ERROR)));
            } catch (InputException beyondRange) {
                // no sample there: its size is beyond any representable number
            }
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

    /**
     * x[n] = a + b·√r: exact (shown exact when b = 0) while both parts are small, else evaluated to
     * the digits asked ({@link #sequenceValue}).
     */
    private PointValue radicalValue(RadicalSolution r, Rational at, RootCache cache) {
        if (r.rational().domain() == Domain.DIFFERENTIAL) {
            return FittedFunction.of(r, cache).value(at, digits);
        }
        long n = at.toBigInteger().longValueExact();
        double size = Math.max(SequenceSum.exactDigits(r.rational(), n, cache), SequenceSum.exactDigits(r.radical(), n, cache));
        if (n < r.rational().validFrom() || size <= Math.max(EXACT_SIZE_LIMIT, digits)) {
            Surd v = r.valueAt(n);
            return new PointValue(at, v.toBigDecimal(new MathContext(digits)),
                    v.isRational() ? Optional.of(v.rational()) : Optional.empty(), v.isRational() ? Optional.empty() : Optional.of(v));
        }
        certifyRoots(r.rational(), cache, n, digits);
        certifyRoots(r.radical(), cache, n, digits);
        Apfloat[] value = settledSequence(n, digits, working -> {
            Apfloat root = ApfloatMath.sqrt(new Apfloat(r.radicand(), working));
            Apfloat[] a = SequenceSum.of(r.rational(), cache, working).valueAndLargest(n);
            Apfloat[] b = SequenceSum.of(r.radical(), cache, working).valueAndLargest(n);
            Apfloat scaled = b[1].multiply(root);
            return new Apfloat[] {a[0].add(root.multiply(b[0])), a[1].compareTo(scaled) > 0 ? a[1] : scaled};
        });
        return new PointValue(at, Decimals.toBigDecimal(value[0], digits), Optional.empty());
    }

    /**
     * x[n] at an index {@link ValueRequests} accepts, to {@code wanted} digits: exact while the exact
     * fraction is estimated at no more than {@link #EXACT_SIZE_LIMIT} digits (or the digits asked, when
     * more), else from the modes in apfloat, confirmed by two working precisions agreeing.
     */
    private static PointValue sequenceValue(ExactSolution s, Rational at, int wanted, RootCache cache) {
        long n = at.toBigInteger().longValueExact();
        if (n < s.validFrom() || SequenceSum.exactDigits(s, n, cache) <= Math.max(EXACT_SIZE_LIMIT, wanted)) {
            Rational v = s.valueAt(n);
            return new PointValue(at, v.toBigDecimal(new MathContext(wanted)), Optional.of(v));
        }
        certifyRoots(s, cache, n, wanted);
        Apfloat[] value = settledSequence(n, wanted, working -> SequenceSum.of(s, cache, working).valueAndLargest(n));
        return new PointValue(at, Decimals.toBigDecimal(value[0], wanted), Optional.empty());
    }

    /**
     * Certifies the roots of s once, at the higher precision of the first round of {@link #settledSequence},
     * so that both evaluations of that round reuse them (the cache keeps the tightest enclosures; a
     * root finder run per working precision cost more than the evaluation at n = 10^6).
     */
    private static void certifyRoots(ExactSolution s, RootCache cache, long n, int wanted) {
        for (Component c : s.components()) {
            if (c.factor().polynomial().degree() > 1) {
                cache.roots(c.factor().polynomial(), wanted + lostDigits(n) + 2 * WorkingPrecision.GUARD_DIGITS);
            }
        }
    }

    /** Digits that powering to the n-th power loses, about log10|n|. */
    private static int lostDigits(long n) {
        return (int) Math.ceil(Math.log10(Math.abs((double) n) + 1));
    }

    /** {value, largest mode} at the first two working precisions that agree; log10|n| digits more to start with. */
    private static Apfloat[] settledSequence(long n, int wanted, java.util.function.IntFunction<Apfloat[]> evaluate) {
        int lost = lostDigits(n);
        return WorkingPrecision.settle(wanted + lost, evaluate,
                (low, high, working) -> WorkingPrecision.agree(low, high, working, wanted),
                (working, high) -> working + WorkingPrecision.GUARD_DIGITS + lost, "value at n = " + n);
    }
}
