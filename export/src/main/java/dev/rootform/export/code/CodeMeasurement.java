package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.CodeFacts.Limit;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

/**
 * Measures the floating-point formula of generated code ({@link CodeFacts}) in each C variant that
 * can evaluate it (the formula evaluated as that variant's code computes it,
 * {@link NumericForm#sum(double, CVariant)}). The valid range, per floating type: from the start
 * (t0, or the first index the formula holds for) outward until a term overflows, every term
 * underflows, or the rounding of rates and angles would make phase or growth drift by more than
 * {@link CodeFacts#driftLimit} (searched up to {@link CType#cap()}). The sample follows the
 * problem's own time scales (the waves' 1/|σ| and 1/ω; for sequences 1/|ln ρ| and periods 2π/θ):
 * dense near the start (halving steps down to 2^-44 of the shortest scale for functions, every index
 * of the first {@link #FIRST_INDICES} for sequences), quarter steps over the shortest and the longest
 * scale, then log-spaced ({@link #PER_DECADE} per decade) to both ends of the range, which are
 * included. Reference values come from the analysis to {@link #EXACT_DIGITS} digits (exact
 * sequence values, or certified evaluation at large n; function values raised until two working
 * precisions agree); errors are those of the double values the code computes at exactly those
 * inputs.
 */
final class CodeMeasurement {
    /** Significant digits of the reference values. */
    static final int EXACT_DIGITS = 30;
    /** Every index of a sequence from the first one up to this many. */
    static final int FIRST_INDICES = 64;
    /** Log-spaced sample points per decade out to the ends of the range. */
    static final int PER_DECADE = 8;
    /** Halving steps from the shortest time scale towards t0. */
    private static final int HALVINGS = 44;

    private CodeMeasurement() {
    }

    /** One end of the valid range. */
    private record Edge(double at, Limit limit) {
    }

    /**
     * The variants that can evaluate {@code form}: double, and float when every constant is finite in
     * float; each with libm, and without libm too when the formula needs no e^x or cos x.
     */
    static List<CVariant> variants(NumericForm form) {
        List<CVariant> out = new ArrayList<>();
        for (boolean libm : form.needsLibm() ? new boolean[] {true} : new boolean[] {true, false}) {
            for (CType type : CType.values()) {
                if (form.constants().allMatch(c -> Double.isFinite(type.round(c)))) {
                    out.add(new CVariant(type, libm));
                }
            }
        }
        return out;
    }

    /**
     * Measures {@code form}, the emitted formula of {@code solution}'s closed form (a fitted solution,
     * see {@link CodeRequests}, with origin t0), in every variant of {@link #variants}.
     */
    static Map<CVariant, CodeFacts> measure(Solution solution, NumericForm form, Rational origin) {
        double start = form.differential() ? 0 : form.validFrom();
        List<Double> scales = timeScales(form);
        Map<CType, Edge[]> ranges = new EnumMap<>(CType.class);
        Map<CType, List<Rational>> samples = new EnumMap<>(CType.class);
        TreeSet<Rational> all = new TreeSet<>();
        // the ends are found to 10^-12, or to 10^-6 of the shortest scale below that (y' = 10^20·y ends
        // at |t| ≈ 7·10^-18)
        double width = Math.min(1e-12, 1e-6 * scales.stream().mapToDouble(Double::doubleValue).min().orElse(1));
        for (CType type : CType.values()) {
            Edge high = edge(form, start, 1, type, width);
            Edge low = form.differential() ? edge(form, start, -1, type, width) : new Edge(form.first(), Limit.FIRST_INDEX);
            ranges.put(type, new Edge[] {low, high});
            samples.put(type, form.differential() ? functionPoints(origin, low.at(), high.at(), scales)
                    : sequencePoints(form, high.at(), scales));
            all.addAll(samples.get(type));
        }
        List<Rational> points = List.copyOf(all);
        List<PointValue> values = new Analyzer(EXACT_DIGITS).referenceValues(solution, points);
        Map<Rational, BigDecimal> exact = new LinkedHashMap<>();
        for (int i = 0; i < points.size(); i++) {
            exact.put(points.get(i), values.get(i).value());
        }
        Map<CVariant, CodeFacts> out = new LinkedHashMap<>();
        for (CVariant variant : variants(form)) {
            out.put(variant, facts(form, variant, ranges.get(variant.type()), scales, samples.get(variant.type()), exact));
        }
        return out;
    }

    /** The facts of one variant over its type's range and sample, forward and backward of t0. */
    private static CodeFacts facts(NumericForm form, CVariant variant, Edge[] range, List<Double> scales, List<Rational> points,
            Map<Rational, BigDecimal> exactValues) {
        List<BigDecimal> exact = points.stream().map(exactValues::get).toList();
        List<Integer> forward = new ArrayList<>();
        List<Integer> backward = new ArrayList<>();
        Rational t0 = form.differential() ? Rational.of(new BigDecimal(form.origin())) : Rational.ZERO;
        for (int i = 0; i < points.size(); i++) {
            (form.differential() && points.get(i).compareTo(t0) < 0 ? backward : forward).add(i);
        }
        Optional<CodeFacts.Accuracy> back = backward.isEmpty() ? Optional.empty()
                : Optional.of(accuracy(form, variant, points, exact, backward));
        return new CodeFacts(range[0].at(), range[1].at(), range[0].limit(), range[1].limit(), scales, points, exact,
                accuracy(form, variant, points, exact, forward), back);
    }

    /** The worst errors of the code over the points with the given indices. */
    private static CodeFacts.Accuracy accuracy(NumericForm form, CVariant variant, List<Rational> points, List<BigDecimal> exact,
            List<Integer> which) {
        double[] worst = new double[3];
        double maxDrift = 0;
        Rational first = points.get(which.get(0));
        Rational[] where = {first, first, first};
        boolean relative = false;
        for (int i : which) {
            Deadline.checkCurrent();
            Rational p = points.get(i);
            double value = evaluate(form, p, variant);
            BigDecimal difference = Double.isFinite(value) ? measurable(new BigDecimal(value).subtract(exact.get(i)).abs(), exact.get(i))
                    : BigDecimal.valueOf(Double.MAX_VALUE);
            double term = largestTerm(form, p);
            double v = form.differential() ? p.doubleValue() - form.origin() : p.doubleValue();
            double logLargest = form.logMagnitude(v);
            if (Double.isFinite(logLargest)) {
                maxDrift = Math.max(maxDrift, drift(form, v, logLargest, variant.type()));
            }
            double size = exact.get(i).abs().doubleValue();
            boolean measured = size != 0 && size * CodeFacts.CANCELLATION >= term;
            relative |= measured;
            double[] errors = {
                measured ? difference.divide(exact.get(i).abs(), MathContext.DECIMAL64).doubleValue() : 0,
                difference.doubleValue(),
                term == 0 ? 0 : difference.doubleValue() / term,
            };
            for (int k = 0; k < 3; k++) {
                if (errors[k] > worst[k]) {
                    worst[k] = errors[k];
                    where[k] = p;
                }
            }
        }
        return new CodeFacts.Accuracy(which.size(), worst[0], relative ? Optional.of(where[0]) : Optional.empty(), worst[1],
                where[1], worst[2], where[2], maxDrift);
    }

    /**
     * The difference, or 0 when it is below the resolution of the reference value (its last digit):
     * the double is then exact as far as can be told, and no bound is stated below that resolution.
     */
    static BigDecimal measurable(BigDecimal difference, BigDecimal reference) {
        BigDecimal resolution = reference.abs().movePointLeft(EXACT_DIGITS - 1);
        return difference.compareTo(resolution) <= 0 ? BigDecimal.ZERO : difference;
    }

    /** The largest term the code adds up at a sample point ({@link NumericForm#largestTerm}). */
    static double largestTerm(NumericForm form, Rational point) {
        return form.differential() ? form.largestTerm(point.doubleValue()) : form.largestTerm(point.toBigInteger().longValueExact());
    }

    /** The value of {@code form} at a sample point, as the generated code of {@code variant} computes it. */
    static double evaluate(NumericForm form, Rational point, CVariant variant) {
        return form.differential() ? form.valueAt(point.doubleValue(), variant)
                : form.valueAt(point.toBigInteger().longValueExact(), variant);
    }

    /** The value of {@code form} at a sample point, as the Java code (and the default C) computes it. */
    static double evaluate(NumericForm form, Rational point) {
        return evaluate(form, point, CVariant.DEFAULT);
    }

    /**
     * The time scales of the waves, ascending and distinct: 1/|growth| and 1/|frequency| (functions),
     * 1/|ln|growth|| and 2π/frequency (sequences); {1} when every wave is constant.
     */
    static List<Double> timeScales(NumericForm form) {
        TreeSet<Double> scales = new TreeSet<>();
        for (Wave w : form.waves()) {
            if (w.amplitude() == 0.0) {
                continue;
            }
            double rate = form.differential() ? Math.abs(w.growth()) : Math.abs(Math.log(Math.abs(w.growth())));
            if (rate > 0 && Double.isFinite(1 / rate)) {
                addScale(scales, 1 / rate);
            }
            if (w.frequency() != 0.0) {
                double angle = w.reduced() ? w.frequency() * w.multiplier() : Math.abs(w.frequency());
                addScale(scales, form.differential() ? 1 / angle : 2 * Math.PI / angle);
            }
        }
        return scales.isEmpty() ? List.of(1.0) : List.copyOf(scales);
    }

    /** Adds a scale unless one within 10^-9 of it is there already (the two modes of one decay, say). */
    private static void addScale(TreeSet<Double> scales, double scale) {
        if (scales.stream().noneMatch(s -> Math.abs(s - scale) <= 1e-9 * scale)) {
            scales.add(scale);
        }
    }

    /** t0 + v for v near 0, over the scales and log-spaced to both ends; each the exact value of the double t. */
    private static List<Rational> functionPoints(Rational origin, double low, double high, List<Double> scales) {
        double shortest = scales.get(0);
        double longest = scales.get(scales.size() - 1);
        TreeSet<Double> offsets = new TreeSet<>(List.of(0.0, low, high));
        for (int k = 1; k <= HALVINGS; k++) {
            offsets.add(Math.scalb(shortest, -k));
        }
        for (int j = 1; j <= 16; j++) {
            offsets.add(shortest * j / 4);
            offsets.add(longest * j / 4);
        }
        offsets.addAll(logSpaced(shortest, Math.max(Math.abs(low), high)));
        TreeSet<Rational> points = new TreeSet<>();
        double t0 = origin.doubleValue();
        for (double v : offsets) {
            for (double signed : new double[] {v, -v}) {
                if (signed >= low && signed <= high) {
                    double t = t0 + signed;
                    points.add(Rational.of(new BigDecimal(t)));
                }
            }
        }
        return List.copyOf(points);
    }

    /** The first indices, quarter steps over the scales, and log-spaced indices to the end. */
    private static List<Rational> sequencePoints(NumericForm form, double high, List<Double> scales) {
        long first = form.first();
        long start = form.validFrom();
        long last = (long) high;
        TreeSet<Long> indices = new TreeSet<>(List.of(last));
        for (long n = first; n <= Math.min(last, start + FIRST_INDICES); n++) {
            indices.add(n);
        }
        for (double s : List.of(scales.get(0), scales.get(scales.size() - 1))) {
            for (int j = 1; j <= 16; j++) {
                indices.add(start + Math.round(s * j / 4));
            }
        }
        for (double d : logSpaced(FIRST_INDICES, last - start)) {
            indices.add(start + Math.round(d));
        }
        List<Rational> points = new ArrayList<>();
        indices.stream().filter(n -> n >= first && n <= last).forEach(n -> points.add(Rational.of(n)));
        return points;
    }

    /** {@link #PER_DECADE} points per decade from {@code from} to {@code to} (both positive), and {@code to}. */
    private static List<Double> logSpaced(double from, double to) {
        List<Double> out = new ArrayList<>();
        if (!(from > 0) || !(to > from)) {
            return out;
        }
        double step = Math.pow(10, 1.0 / PER_DECADE);
        for (double x = from; x < to; x *= step) {
            out.add(x);
        }
        out.add(to);
        return out;
    }

    /** The farthest v from start in {@code direction} (up to the type's cap) at which the form fits, and what ends it there. */
    /** The end of the range from {@code start} in {@code direction}, to within {@code width} for functions. */
    private static Edge edge(NumericForm form, double start, int direction, CType type, double width) {
        double good = start;
        for (double step = 1; step <= type.cap(); step *= 2) {
            double v = start + direction * step;
            if (misfit(form, v, type) != null) {
                return bisect(form, good, v, type, width);
            }
            good = v;
        }
        double last = start + direction * type.cap();
        return misfit(form, last, type) == null ? new Edge(last, Limit.CAP) : bisect(form, good, last, type, width);
    }

    private static Edge bisect(NumericForm form, double good, double bad, CType type, double width) {
        while (Math.abs(bad - good) > (form.differential() ? Math.ulp(Math.abs(good)) * 4 + width : 1)) {
            double mid = form.differential() ? (good + bad) / 2 : Math.floor((good + bad) / 2);
            if (mid == good || mid == bad) {
                break;
            }
            if (misfit(form, mid, type) == null) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return new Edge(good, misfit(form, bad, type));
    }

    /**
     * Why the form does not fit at v in {@code type} (a term or a growth factor overflows, every term
     * underflows — margins of a factor e —, or it drifts), or null when it fits.
     */
    private static Limit misfit(NumericForm form, double v, CType type) {
        double m = form.logMagnitude(v);
        double lnMax = Math.log(type.max()) - 1;
        if (m >= lnMax || form.waves().stream().anyMatch(w -> growthExponent(form, w, v) >= lnMax)) {
            return Limit.OVERFLOW;
        }
        if (m <= Math.log(type.minNormal()) + 1) {
            return Limit.UNDERFLOW;
        }
        return drift(form, v, m, type) > CodeFacts.driftLimit(type) ? Limit.DRIFT : null;
    }

    /** ln of the growth factor alone, which the code computes before multiplying by the amplitude. */
    private static double growthExponent(NumericForm form, Wave w, double v) {
        return w.amplitude() == 0.0 ? Double.NEGATIVE_INFINITY
                : form.differential() ? w.growth() * v : v * Math.log(Math.abs(w.growth()));
    }

    /** Relative rounding of one operation in {@code type}. */
    private static double unit(CType type) {
        return type == CType.FLOAT ? 0x1p-24 : 0x1p-53;
    }

    /** Relative rounding of x·v per unit of v: none when x is 0 or a power of two (the product is exact). */
    private static double productRounding(double x, CType type) {
        return x == 0.0 || Math.abs(x) == Math.scalb(1.0, Math.getExponent(x)) ? 0 : Math.abs(x) * unit(type);
    }

    /**
     * The drift at v that the rounding of growth rates and angles to {@code type} causes, weighted by
     * each wave's size relative to the largest term (ln of it: {@code largest}): |v|·(growth error +
     * rounding of growth·v) for e^{growth·v}, |n|·growth error/|growth| for growth^n, and
     * |v|·(frequency error + rounding of frequency·v + phase) for an angle that is not reduced exactly.
     */
    private static double drift(NumericForm form, double v, double largest, CType type) {
        double total = 0;
        for (Wave w : form.waves()) {
            double size = Math.exp(form.logMagnitude(w, v) - largest);
            if (size == 0) {
                continue;
            }
            double growthError = w.growthError() + Math.abs(w.growth() - type.round(w.growth()));
            double frequencyError = w.frequencyError() + Math.abs(w.frequency() - type.round(w.frequency()));
            double growth = form.differential() ? growthError + productRounding(w.growth(), type) : growthError / Math.abs(w.growth());
            double angle = w.reduced() || w.frequency() == 0.0 ? 0
                    : frequencyError + (w.phase() == 0.0 ? productRounding(w.frequency(), type) : Math.abs(w.frequency()) * unit(type));
            total += size * Math.abs(v) * (growth + angle);
        }
        return total;
    }
}
