package dev.rootform.export;

import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.stream.DoubleStream;

/**
 * The floating-point formula that generated code evaluates, and the same formula evaluated here
 * with the same operations in the same order ({@link StrictMath}; in float or without the math
 * library as the C of a {@link CVariant} does), so that the accuracy stated in a generated file is
 * the accuracy of that file's code.
 *
 * <p>Near t0 a differential solution is evaluated from its Taylor series instead of its modes:
 * when |v| &le; {@code seriesRadius}, y = Σ_d series[d]·s^d with s = v/seriesRadius (exact, the
 * radius being a power of two) and series[d] = y^(d)(t0)·seriesRadius^d/d!. A step response from
 * rest is 1 − Σ modes, which cancels to nothing near t0 in floating point; its series starts with
 * the first nonzero derivative and keeps full relative accuracy there. A sequence's wave whose angle
 * per step is 2π·multiplier/modulus is reduced exactly in integers ({@link Wave#reducedStep}).
 *
 * @param domain differential (value(t), v = t − origin) or difference (value(n), v = n)
 * @param origin t0 of a differential equation, rounded; the first index of a sequence
 * @param first the first index of a sequence (0 for a differential equation)
 * @param validFrom the first index the formula holds for; values before it are {@code leading}
 * @param leading x[first .. validFrom − 1] rounded to double
 * @param waves the terms; never empty
 * @param series the scaled Taylor coefficients at t0 (empty: no series)
 * @param seriesRadius a power of two, the radius in v where the series is used (0 when there is none)
 * @since 0.2
 */
public record NumericForm(Domain domain, double origin, long first, long validFrom, List<Double> leading, List<Wave> waves,
        List<Double> series, double seriesRadius) {
    public NumericForm {
        leading = List.copyOf(leading);
        waves = List.copyOf(waves);
        series = List.copyOf(series);
        if (series.isEmpty() != (seriesRadius == 0.0)) {
            throw new IllegalArgumentException("a series needs a radius and a radius a series");
        }
    }

    /** A form without a series near t0. */
    public NumericForm(Domain domain, double origin, long first, long validFrom, List<Double> leading, List<Wave> waves) {
        this(domain, origin, first, validFrom, leading, waves, List.of(), 0.0);
    }

    public boolean differential() {
        return domain == Domain.DIFFERENTIAL;
    }

    /** Whether some wave reduces its angle exactly in integers (the code then carries MODULUS and MULTIPLIER). */
    public boolean reduces() {
        return waves.stream().anyMatch(Wave::reduced);
    }

    /** x[n] as the generated {@code value(long n)} computes it; n &ge; first. */
    public double valueAt(long n) {
        return valueAt(n, CVariant.DEFAULT);
    }

    /** y(t) as the generated {@code value(double t)} computes it. */
    public double valueAt(double t) {
        return valueAt(t, CVariant.DEFAULT);
    }

    /** x[n] as the generated C of {@code variant} computes it; n &ge; first. */
    public double valueAt(long n, CVariant variant) {
        return n < validFrom ? variant.type().round(leading.get((int) (n - first))) : sum(n, variant);
    }

    /** y(t) as the generated C of {@code variant} computes it, t passed in that variant's type. */
    public double valueAt(double t, CVariant variant) {
        CType type = variant.type();
        double v = type.round(type.round(t) - type.round(origin));
        if (Math.abs(v) <= seriesRadius) {
            double s = type.round(v / seriesRadius);
            double total = 0.0;
            for (int d = series.size() - 1; d >= 0; d--) {
                total = type.round(type.round(total * s) + type.round(series.get(d)));
            }
            return total;
        }
        return sum(v, variant);
    }

    /** Σ waves at v, in the order and with the operations of the generated code's loop. */
    public double sum(double v) {
        return sum(v, CVariant.DEFAULT);
    }

    /**
     * Σ waves at v (for a sequence v = n) as the generated C of {@code variant} computes it: constants,
     * v and every result rounded to its type, the math functions taken as correctly rounded to it
     * (StrictMath's double result rounded once more), and without libm powers by the generated
     * repeated squaring.
     *
     * @throws IllegalArgumentException for a variant without libm when {@link #needsLibm()}
     */
    public double sum(double v, CVariant variant) {
        if (!variant.libm() && needsLibm()) {
            throw new IllegalArgumentException("the formula needs the math library");
        }
        CType type = variant.type();
        double x = type.round(v);
        double total = 0.0;
        for (Wave w : waves) {
            double g = type.round(w.growth());
            double growth = differential() ? type.round(StrictMath.exp(type.round(g * x)))
                    : variant.libm() ? type.round(StrictMath.pow(g, x)) : power(g, (long) v, type);
            double term = type.round(type.round(w.amplitude()) * growth);
            if (w.power() > 0) {
                double p = variant.libm() ? type.round(StrictMath.pow(x, w.power())) : power(x, w.power(), type);
                term = type.round(term * p);
            }
            if (w.frequency() != 0.0) {
                double steps = w.reduced() ? (double) w.reducedStep((long) v) : x;
                double angle = type.round(type.round(type.round(w.frequency()) * steps) + type.round(w.phase()));
                term = type.round(term * type.round(StrictMath.cos(angle)));
            }
            total = type.round(total + term);
        }
        return total;
    }

    /**
     * base^e by the repeated squaring of generated C without libm: e &lt; 0 gives 1/base^(−e); each
     * product is rounded to {@code type}.
     */
    public static double power(double base, long e, CType type) {
        long k = e < 0 ? -e : e;
        double result = 1.0;
        double b = base;
        while (k != 0) {
            if ((k & 1L) != 0) {
                result = type.round(result * b);
            }
            b = type.round(b * b);
            k >>>= 1;
        }
        return e < 0 ? type.round(1.0 / result) : result;
    }

    /**
     * Every constant the code holds: origin, leading values, each wave's amplitude, growth, frequency
     * and phase, and the series with its radius.
     */
    public DoubleStream constants() {
        return DoubleStream.concat(DoubleStream.concat(DoubleStream.concat(DoubleStream.of(origin, seriesRadius),
                leading.stream().mapToDouble(Double::doubleValue)), series.stream().mapToDouble(Double::doubleValue)),
                waves.stream().flatMapToDouble(w -> DoubleStream.of(w.amplitude(), w.growth(), w.frequency(), w.phase())));
    }

    /** Whether evaluating the formula needs e^x or cos x: a differential equation, or a sequence with an oscillating term. */
    public boolean needsLibm() {
        return differential() || waves.stream().anyMatch(w -> w.frequency() != 0.0);
    }

    /**
     * The size of the largest summand the generated code adds up for input t: |series[d]·s^d| inside
     * the series radius, else the largest |amplitude·v^power·G(v)|; the scale against which an
     * absolute error is judged where the terms cancel.
     */
    public double largestTerm(double t) {
        double v = t - origin;
        if (Math.abs(v) <= seriesRadius) {
            double s = Math.abs(v / seriesRadius);
            double largest = 0;
            double power = 1;
            for (double b : series) {
                largest = Math.max(largest, Math.abs(b) * power);
                power *= s;
            }
            return largest;
        }
        return Math.exp(logMagnitude(v));
    }

    /** The largest |amplitude·n^power·growth^n| of the terms at index n (the listed value before validFrom). */
    public double largestTerm(long n) {
        return n < validFrom ? Math.abs(leading.get((int) (n - first))) : Math.exp(logMagnitude((double) n));
    }

    /** ln of the largest term magnitude at v (−∞ if every term vanishes there). */
    public double logMagnitude(double v) {
        double largest = Double.NEGATIVE_INFINITY;
        for (Wave w : waves) {
            largest = Math.max(largest, logMagnitude(w, v));
        }
        return largest;
    }

    /** ln |amplitude·v^power·G(v)| of one wave (−∞ for a zero amplitude). */
    public double logMagnitude(Wave w, double v) {
        if (w.amplitude() == 0.0) {
            return Double.NEGATIVE_INFINITY;
        }
        double g = differential() ? w.growth() * v : v * Math.log(Math.abs(w.growth()));
        double p = w.power() == 0 ? 0.0 : w.power() * Math.log(Math.abs(v));
        return Math.log(Math.abs(w.amplitude())) + p + g;
    }
}
