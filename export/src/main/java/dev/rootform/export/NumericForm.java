package dev.rootform.export;

import dev.rootform.symbolic.model.Domain;
import java.util.List;

/**
 * The double-precision formula that generated code evaluates, and the same formula evaluated here
 * with the same operations in the same order ({@link StrictMath}), so that the accuracy stated in
 * a generated file is the accuracy of that file's Java code.
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
        return n < validFrom ? leading.get((int) (n - first)) : sum(n);
    }

    /** y(t) as the generated {@code value(double t)} computes it. */
    public double valueAt(double t) {
        return sum(t - origin);
    }

    /** Σ waves at v, in the order and with the operations of the generated code's loop. */
    public double sum(double v) {
        double total = 0.0;
        for (Wave w : waves) {
            double term = w.amplitude() * (differential() ? StrictMath.exp(w.growth() * v) : StrictMath.pow(w.growth(), v));
            if (w.power() > 0) {
                term *= StrictMath.pow(v, w.power());
            }
            if (w.frequency() != 0.0) {
                term *= StrictMath.cos(w.frequency() * v + w.phase());
            }
            total += term;
        }
        return total;
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
