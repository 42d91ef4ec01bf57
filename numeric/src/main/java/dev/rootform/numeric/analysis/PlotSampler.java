package dev.rootform.numeric.analysis;

import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.plot.FrequencyPlot;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.plot.Sample;
import dev.rootform.numeric.plot.TimePlot;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.solve.Solution;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import java.util.function.LongFunction;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Samples a solution for the report page's plots: over a {@link TimeRange}, the whole solution
 * and, for a forced equation, its transient and steady parts (the closed form's split: powers
 * below a root's multiplicity in χ are transient); sequences exactly at each index, functions by
 * their mode sums (weights and rates from {@value #PRECISION}-digit roots, summed in double
 * precision); and the frequency response around the natural and input frequencies. Approximate
 * (double precision), for drawing only.
 */
final class PlotSampler {
    /** Working digits of the roots and weights behind the function samples. */
    static final long PRECISION = 30;
    static final int FUNCTION_SAMPLES = 500;
    static final int FREQUENCY_SAMPLES = 300;
    /** The frequency sweep of a differential equation spans this factor below and above its frequencies. */
    private static final double DECADES = 20;

    private PlotSampler() {
    }

    /**
     * @param bvp the numerically fixed constants, when the solution has them
     * @param values the values at the requested points
     */
    static Plots sample(Solution s, Diagnostics d, Optional<BoundaryValues> bvp, List<PointValue> values,
            boolean steady, RootCache cache) {
        Optional<TimePlot> time = s.problem().conditions().isEmpty() && !s.hasNumericConstants() ? Optional.empty()
                : Optional.of(time(s, d, bvp, values, cache));
        LinearEquation eq = s.problem().equation();
        Optional<FrequencyPlot> frequency = steady && !FrequencyResponse.sinusoids(eq).isEmpty()
                ? Optional.of(frequency(eq, d)) : Optional.empty();
        return new Plots(time, frequency);
    }

    private static TimePlot time(Solution s, Diagnostics d, Optional<BoundaryValues> bvp, List<PointValue> values,
            RootCache cache) {
        TimeRange range = TimeRange.of(s, d, values.stream().map(PointValue::at).toList());
        List<Sample> marks = values.stream().map(v -> new Sample(v.at().doubleValue(), v.value().doubleValue()))
                .filter(m -> m.x() >= range.from() && m.x() <= range.to())
                .map(m -> range.log() ? new Sample(m.x(), Math.abs(m.y())) : m).toList();
        boolean forced = !s.closedForm().particularTerms().isEmpty() && !s.closedForm().transientTerms().isEmpty();
        List<List<Sample>> curves;
        if (s.problem().equation().domain() == Domain.DIFFERENCE) {
            curves = sequence(s, range, forced);
        } else {
            curves = function(s, bvp, range, forced, cache);
        }
        List<Sample> total = curves.get(0);
        List<Sample> steadyPart = curves.size() > 1 ? curves.get(1) : List.of();
        List<Sample> transientPart = new ArrayList<>();
        for (int i = 0; i < steadyPart.size(); i++) {
            transientPart.add(new Sample(steadyPart.get(i).x(), total.get(i).y() - steadyPart.get(i).y()));
        }
        if (range.log()) {
            return new TimePlot(!isFunction(s), true, magnitudes(total), List.of(), List.of(), marks, range.reason());
        }
        return new TimePlot(!isFunction(s), false, total, transientPart, steadyPart, marks, range.reason());
    }

    private static boolean isFunction(Solution s) {
        return s.problem().equation().domain() == Domain.DIFFERENTIAL;
    }

    /** [total] or [total, steady] at each index of the range, exactly, then rounded to double. */
    private static List<List<Sample>> sequence(Solution s, TimeRange range, boolean forced) {
        LongFunction<Double> total;
        Optional<ExactSolution> steady = Optional.empty();
        if (s.exact().isPresent()) {
            ExactSolution e = s.exact().get();
            total = n -> e.valueAt(n).doubleValue();
            steady = forced ? Optional.of(steadyPart(s, e)) : Optional.empty();
        } else if (s.sinusoid().isPresent()) {
            RootCache cache = new RootCache();
            total = n -> SinusoidValues.value(s.sinusoid().get(), Rational.of(n), Analyzer.SAMPLE_DIGITS, cache).value().doubleValue();
        } else {
            RadicalSolution r = s.radical().orElseThrow(() -> new IllegalStateException("no values for " + s.closedForm()));
            total = n -> r.valueAt(n).toBigDecimal(MathContext.DECIMAL64).doubleValue();
        }
        List<Sample> all = new ArrayList<>();
        List<Sample> particular = new ArrayList<>();
        long validFrom = s.closedForm().validFrom();
        for (long n = (long) range.from(); n <= (long) range.to(); n++) {
            all.add(new Sample(n, total.apply(n)));
            if (steady.isPresent()) {
                particular.add(new Sample(n, n < validFrom ? 0 : steady.get().valueAt(n).doubleValue()));
            }
        }
        return steady.isPresent() ? List.of(all, particular) : List.of(all);
    }

    /** [total] or [total, steady] at {@link #FUNCTION_SAMPLES} evenly spaced points. */
    private static List<List<Sample>> function(Solution s, Optional<BoundaryValues> bvp, TimeRange range, boolean forced,
            RootCache cache) {
        DoubleUnaryOperator total;
        Optional<DoubleUnaryOperator> steady;
        if (bvp.isPresent()) {
            total = bvp.get().inDoubles(false);
            steady = forced ? Optional.of(bvp.get().inDoubles(true)) : Optional.empty();
        } else if (s.exact().isPresent()) {
            ExactSolution e = s.exact().get();
            total = ModeSum.of(e, cache, PRECISION).inDoubles();
            steady = forced ? Optional.of(ModeSum.of(steadyPart(s, e), cache, PRECISION).inDoubles()) : Optional.empty();
        } else {
            // constants in Q(√r) (boundary conditions at multiples of π): the √r part is homogeneous
            RadicalSolution r = s.radical().orElseThrow(() -> new IllegalStateException("no values for " + s.closedForm()));
            total = ModeSum.of(r, cache, PRECISION).inDoubles();
            steady = forced ? Optional.of(ModeSum.of(steadyPart(s, r.rational()), cache, PRECISION).inDoubles()) : Optional.empty();
        }
        List<Sample> all = new ArrayList<>();
        List<Sample> particular = new ArrayList<>();
        for (int i = 0; i < FUNCTION_SAMPLES; i++) {
            double x = range.from() + (range.to() - range.from()) * i / (FUNCTION_SAMPLES - 1);
            all.add(new Sample(x, total.applyAsDouble(x)));
            steady.ifPresent(f -> particular.add(new Sample(x, f.applyAsDouble(x))));
        }
        return steady.isPresent() ? List.of(all, particular) : List.of(all);
    }

    /**
     * The steady (particular) part of an exact solution: in each component, the coefficients of
     * the powers from the factor's multiplicity in χ on (all of a factor that is not in χ).
     */
    static ExactSolution steadyPart(Solution s, ExactSolution e) {
        List<Component> kept = new ArrayList<>();
        for (Component c : e.components()) {
            int inChi = s.factors().stream().filter(f -> f.polynomial().equals(c.factor().polynomial()))
                    .mapToInt(Factor::multiplicity).findFirst().orElse(0);
            List<RationalPolynomial> coefficients = new ArrayList<>();
            for (int i = 0; i < c.coefficients().size(); i++) {
                coefficients.add(i < inChi ? RationalPolynomial.ZERO : c.coefficients().get(i));
            }
            kept.add(new Component(c.factor(), coefficients));
        }
        return e.withComponents(kept);
    }

    /** |y| with the zeros left out, for a log axis. */
    private static List<Sample> magnitudes(List<Sample> samples) {
        return samples.stream().map(p -> new Sample(p.x(), Math.abs(p.y()))).filter(p -> p.y() > Double.MIN_NORMAL).toList();
    }

    /**
     * |H| in dB and arg H (unwrapped) against ω: logarithmically spaced over the natural and input
     * frequencies times 1/{@value #DECADES} .. {@value #DECADES} (differential), or 0 &lt; θ &le; π
     * (difference).
     */
    private static FrequencyPlot frequency(LinearEquation eq, Diagnostics d) {
        boolean discrete = eq.domain() == Domain.DIFFERENCE;
        List<Double> inputs = FrequencyResponse.sinusoids(eq).stream()
                .map(t -> FrequencyResponse.angularFrequency(t, PRECISION).doubleValue()).distinct().toList();
        double low;
        double high;
        if (discrete) {
            low = Math.PI / FREQUENCY_SAMPLES;
            high = Math.PI;
        } else {
            List<Double> scales = new ArrayList<>(inputs);
            d.modes().forEach(m -> scales.add(Math.hypot(m.root().re().doubleValue(), m.root().im().doubleValue())));
            double smallest = scales.stream().filter(w -> w > 1e-12).mapToDouble(Double::doubleValue).min().orElse(1);
            double largest = scales.stream().mapToDouble(Double::doubleValue).max().orElse(1);
            low = smallest / DECADES;
            high = Math.max(largest, smallest) * DECADES;
        }
        List<Sample> magnitude = new ArrayList<>();
        List<Sample> phase = new ArrayList<>();
        double previous = Double.NaN;
        double turns = 0;
        for (int i = 0; i < FREQUENCY_SAMPLES; i++) {
            double f = i / (double) (FREQUENCY_SAMPLES - 1);
            double w = discrete ? low + (high - low) * f : low * Math.pow(high / low, f);
            Apcomplex h = FrequencyResponse.response(eq, new Apfloat(w, PRECISION), PRECISION);
            magnitude.add(new Sample(w, 20 * Math.log10(ApcomplexMath.abs(h).doubleValue())));
            double degrees = Math.toDegrees(ApfloatMath.atan2(h.imag(), h.real()).doubleValue());
            if (!Double.isNaN(previous)) {
                double jump = degrees + turns - previous;
                turns -= 360 * Math.round(jump / 360);
            }
            previous = degrees + turns;
            phase.add(new Sample(w, previous));
        }
        return new FrequencyPlot(discrete, magnitude, phase, inputs);
    }
}
