package dev.rootform.export.code;

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
import java.util.List;
import java.util.function.LongFunction;
import java.util.TreeSet;

/**
 * Measures the double formula of generated code ({@link CodeFacts}): the input range where every
 * term stays finite and the largest a normal double (searched up to {@link CodeFacts#CAP}), and the
 * largest relative error against exact values (sequences) or 30-digit values (functions) over a
 * sample of points inside that range.
 */
final class CodeMeasurement {
    /** Significant digits of the reference values of functions. */
    static final int EXACT_DIGITS = 30;
    /** ln(Double.MAX_VALUE) with a margin: a term above it overflows. */
    private static final double LN_MAX = Math.log(Double.MAX_VALUE) - 1;
    /** ln(Double.MIN_NORMAL) with a margin: when every term is below it, the value is subnormal. */
    private static final double LN_MIN = Math.log(Double.MIN_NORMAL) + 1;
    /** Offsets from the first index (sequences) or from t0 (functions) tried as sample points. */
    private static final double[] OFFSETS = {0, 0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 30, 50, 100, 200, 500, 1000, 2000};

    private CodeMeasurement() {
    }

    /** Measures {@code form}, the emitted formula of {@code solution}'s closed form (a fitted solution, see {@link CodeRequests}). */
    static CodeFacts measure(Solution solution, NumericForm form) {
        MathContext mc = new MathContext(EXACT_DIGITS);
        Rational origin = solution.exact().map(ExactSolution::origin).orElse(Rational.ZERO);
        LongFunction<BigDecimal> sequence = solution.radical().<LongFunction<BigDecimal>>map(r -> n -> r.valueAt(n).toBigDecimal(mc))
                .orElse(n -> solution.exact().orElseThrow().valueAt(n).toBigDecimal(mc));
        double start = form.differential() ? 0 : form.validFrom();
        double high = edge(form, start, 1);
        double low = form.differential() ? edge(form, start, -1) : form.first();
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
        List<Rational> points = List.copyOf(sample);
        List<BigDecimal> exact = new ArrayList<>();
        if (form.differential()) {
            new Analyzer(EXACT_DIGITS).values(solution, points).stream().map(PointValue::value).forEach(exact::add);
        } else {
            points.forEach(p -> exact.add(sequence.apply(p.toBigInteger().longValueExact())));
        }
        double worst = 0;
        for (int i = 0; i < points.size(); i++) {
            worst = Math.max(worst, relativeError(evaluate(form, points.get(i)), exact.get(i)));
        }
        boolean bounded = high < CodeFacts.CAP || low > -CodeFacts.CAP;
        return new CodeFacts(low, high, bounded, points, exact, worst);
    }

    /** The double value of {@code form} at a sample point, as generated code computes it. */
    static double evaluate(NumericForm form, Rational point) {
        return form.differential() ? form.valueAt(point.doubleValue()) : form.valueAt(point.toBigInteger().longValueExact());
    }

    /** |value − exact|/|exact|; 0 when exact is 0 (such points are compared by the zero count instead). */
    static double relativeError(double value, BigDecimal exact) {
        BigDecimal difference = new BigDecimal(value).subtract(exact).abs();
        if (exact.signum() == 0) {
            return 0;
        }
        return difference.divide(exact.abs(), MathContext.DECIMAL64).doubleValue();
    }

    /** The farthest v from start in {@code direction} (up to the cap) at which every term is finite and the largest normal. */
    private static double edge(NumericForm form, double start, int direction) {
        double good = start;
        for (double step = 1; step <= CodeFacts.CAP; step *= 2) {
            double v = start + direction * step;
            if (!fits(form, v)) {
                return bisect(form, good, v);
            }
            good = v;
        }
        return start + direction * CodeFacts.CAP;
    }

    private static double bisect(NumericForm form, double good, double bad) {
        while (Math.abs(bad - good) > (form.differential() ? Math.ulp(Math.abs(good)) * 4 + 1e-12 : 1)) {
            double mid = form.differential() ? (good + bad) / 2 : Math.floor((good + bad) / 2);
            if (mid == good || mid == bad) {
                break;
            }
            if (fits(form, mid)) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    private static boolean fits(NumericForm form, double v) {
        double m = form.logMagnitude(v);
        return m < LN_MAX && m > LN_MIN;
    }
}
