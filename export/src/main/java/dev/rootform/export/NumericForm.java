package dev.rootform.export;

import dev.rootform.symbolic.model.Domain;
import java.util.List;

/**
 * The floating-point formula that generated code evaluates, and the same formula evaluated here
 * with the same operations in the same order ({@link StrictMath}; in float or without the math
 * library as the C of a {@link CVariant} does), so that the accuracy stated in a generated file is
 * the accuracy of that file's code.
 *
 * @param domain differential (value(t), v = t − origin) or difference (value(n), v = n)
 * @param origin t0 of a differential equation, rounded; the first index of a sequence
 * @param first the first index of a sequence (0 for a differential equation)
 * @param validFrom the first index the formula holds for; values before it are {@code leading}
 * @param leading x[first .. validFrom − 1] rounded to double
 * @param waves the terms; never empty
 * @since 0.2
 */
public record NumericForm(Domain domain, double origin, long first, long validFrom, List<Double> leading, List<Wave> waves) {
    public NumericForm {
        leading = List.copyOf(leading);
        waves = List.copyOf(waves);
    }

    public boolean differential() {
        return domain == Domain.DIFFERENTIAL;
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
        return sum(type.round(type.round(t) - type.round(origin)), variant);
    }

    /** Σ waves at v, in the order and with the operations of the generated code's loop. */
    public double sum(double v) {
        return sum(v, CVariant.DEFAULT);
    }

    /**
     * Σ waves at v as the generated C of {@code variant} computes it: constants, v and every result
     * rounded to its type, the math functions taken as correctly rounded to it (StrictMath's double
     * result rounded once more), and without libm powers by the generated repeated squaring.
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
                double angle = type.round(type.round(type.round(w.frequency()) * x) + type.round(w.phase()));
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

    /** Every constant the code holds: origin, leading values, and each wave's amplitude, growth, frequency and phase. */
    public java.util.stream.DoubleStream constants() {
        return java.util.stream.DoubleStream.concat(java.util.stream.DoubleStream.concat(java.util.stream.DoubleStream.of(origin),
                leading.stream().mapToDouble(Double::doubleValue)), waves.stream()
                        .flatMapToDouble(w -> java.util.stream.DoubleStream.of(w.amplitude(), w.growth(), w.frequency(), w.phase())));
    }

    /** Whether evaluating the formula needs e^x or cos x: a differential equation, or a sequence with an oscillating term. */
    public boolean needsLibm() {
        return differential() || waves.stream().anyMatch(w -> w.frequency() != 0.0);
    }

    /** ln of the largest term magnitude at v (−∞ if every term vanishes there). */
    public double logMagnitude(double v) {
        double largest = Double.NEGATIVE_INFINITY;
        for (Wave w : waves) {
            if (w.amplitude() == 0.0) {
                continue;
            }
            double g = differential() ? w.growth() * v : v * Math.log(Math.abs(w.growth()));
            double p = w.power() == 0 ? 0.0 : w.power() * Math.log(Math.abs(v));
            largest = Math.max(largest, Math.log(Math.abs(w.amplitude())) + p + g);
        }
        return largest;
    }
}
