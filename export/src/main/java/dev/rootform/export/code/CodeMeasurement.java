package dev.rootform.export.code;

import dev.rootform.export.CType;
import dev.rootform.export.CVariant;
import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.function.LongFunction;

/**
 * Measures the floating-point formula of generated code ({@link CodeFacts}) in each C variant that
 * can evaluate it: per floating type, the input range where every term stays finite and the largest
 * a normal number of that type (searched up to {@link CType#cap()}), and per variant the largest
 * relative error against exact values (sequences) or 30-digit values (functions) over a sample of
 * points inside that range, the formula evaluated as that variant's code computes it
 * ({@link NumericForm#sum(double, CVariant)}).
 */
final class CodeMeasurement {
    /** Significant digits of the reference values of functions. */
    static final int EXACT_DIGITS = 30;
    /** Offsets from the first index (sequences) or from t0 (functions) tried as sample points. */
    private static final double[] OFFSETS = {0, 0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 30, 50, 100, 200, 500, 1000, 2000};

    private CodeMeasurement() {
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
     * see {@link CodeRequests}), in every variant of {@link #variants}.
     */
    static Map<CVariant, CodeFacts> measure(Solution solution, NumericForm form) {
        Map<CType, double[]> ranges = new EnumMap<>(CType.class);
        Map<CType, List<Rational>> samples = new EnumMap<>(CType.class);
        TreeSet<Rational> all = new TreeSet<>();
        for (CType type : CType.values()) {
            double start = form.differential() ? 0 : form.validFrom();
            double high = form.differential() ? edge(form, start, 1, type) : Math.min(edge(form, start, 1, type), type.cap());
            double low = form.differential() ? edge(form, start, -1, type) : form.first();
            ranges.put(type, new double[] {low, high});
            samples.put(type, sample(solution, form, start, low, high));
            all.addAll(samples.get(type));
        }
        Map<Rational, BigDecimal> exact = exactValues(solution, form, List.copyOf(all));
        Map<CVariant, CodeFacts> out = new LinkedHashMap<>();
        for (CVariant variant : variants(form)) {
            CType type = variant.type();
            List<Rational> points = samples.get(type);
            double worst = 0;
            for (Rational p : points) {
                worst = Math.max(worst, relativeError(evaluate(form, p, variant), exact.get(p)));
            }
            double low = ranges.get(type)[0];
            double high = ranges.get(type)[1];
            out.put(variant, new CodeFacts(low, high, high < type.cap() || low > -type.cap(), points,
                    points.stream().map(exact::get).toList(), worst));
        }
        return out;
    }

    /** The sample points inside [low, high] (offsets from start, and every early index of a sequence). */
    private static List<Rational> sample(Solution solution, NumericForm form, double start, double low, double high) {
        Rational origin = solution.exact().map(ExactSolution::origin).orElse(Rational.ZERO);
        TreeSet<Rational> sample = new TreeSet<>();
        for (double d : OFFSETS) {
            for (double sign : form.differential() ? new double[] {1, -1} : new double[] {1}) {
                double v = start + sign * d;
                if (v <= high && v >= low && (form.differential() || d == Math.rint(d))) {
                    sample.add(Rational.of(BigDecimal.valueOf(v)).add(form.differential() ? origin : Rational.ZERO));
                }
            }
        }
        for (long n = form.first(); !form.differential() && n < form.validFrom() + 30 && n <= high; n++) {
            sample.add(Rational.of(n));
        }
        return List.copyOf(sample);
    }

    /** Exact values (sequences) or values to {@link #EXACT_DIGITS} digits (functions) at the points. */
    private static Map<Rational, BigDecimal> exactValues(Solution solution, NumericForm form, List<Rational> points) {
        MathContext mc = new MathContext(EXACT_DIGITS);
        Map<Rational, BigDecimal> out = new LinkedHashMap<>();
        if (form.differential()) {
            List<PointValue> values = new Analyzer(EXACT_DIGITS).values(solution, points);
            for (int i = 0; i < points.size(); i++) {
                out.put(points.get(i), values.get(i).value());
            }
            return out;
        }
        LongFunction<BigDecimal> sequence = solution.radical().<LongFunction<BigDecimal>>map(r -> n -> r.valueAt(n).toBigDecimal(mc))
                .orElse(n -> solution.exact().orElseThrow().valueAt(n).toBigDecimal(mc));
        points.forEach(p -> out.put(p, sequence.apply(p.toBigInteger().longValueExact())));
        return out;
    }

    /** The value of {@code form} at a sample point, as the generated code of {@code variant} computes it. */
    static double evaluate(NumericForm form, Rational point, CVariant variant) {
        return form.differential() ? form.valueAt(point.doubleValue(), variant)
                : form.valueAt(point.toBigInteger().longValueExact(), variant);
    }

    /** |value − exact|/|exact|; 0 when exact is 0 (such points are compared by the zero count instead). */
    static double relativeError(double value, BigDecimal exact) {
        if (exact.signum() == 0) {
            return 0;
        }
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            return Double.POSITIVE_INFINITY;
        }
        BigDecimal difference = new BigDecimal(value).subtract(exact).abs();
        return difference.divide(exact.abs(), MathContext.DECIMAL64).doubleValue();
    }

    /** The farthest v from start in {@code direction} (up to the type's cap) at which every term is finite and the largest normal. */
    private static double edge(NumericForm form, double start, int direction, CType type) {
        double good = start;
        for (double step = 1; step <= type.cap(); step *= 2) {
            double v = start + direction * step;
            if (!fits(form, v, type)) {
                return bisect(form, good, v, type);
            }
            good = v;
        }
        return start + direction * type.cap();
    }

    private static double bisect(NumericForm form, double good, double bad, CType type) {
        while (Math.abs(bad - good) > (form.differential() ? Math.ulp(Math.abs(good)) * 4 + 1e-12 : 1)) {
            double mid = form.differential() ? (good + bad) / 2 : Math.floor((good + bad) / 2);
            if (mid == good || mid == bad) {
                break;
            }
            if (fits(form, mid, type)) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    /** Whether the largest term at v lies below ln(max) − 1 and above ln(min normal) + 1 of the type (margins of a factor e). */
    private static boolean fits(NumericForm form, double v, CType type) {
        double m = form.logMagnitude(v);
        return m < Math.log(type.max()) - 1 && m > Math.log(type.minNormal()) + 1;
    }
}
