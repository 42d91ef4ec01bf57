package dev.rootform.export;

import dev.rootform.symbolic.model.Domain;
import java.util.List;

/**
 * The double-precision formula that generated code evaluates, and the same formula evaluated here
 * with the same operations in the same order ({@link StrictMath}), so that the accuracy stated in
 * a generated file is the accuracy of that file's Java code.
 *
 * <p>Near t0 a differential solution is evaluated from its Taylor series instead of its modes:
 * when |v| &le; {@code seriesRadius}, y = Σ_d series[d]·s^d with s = v/seriesRadius (exact, the
 * radius being a power of two) and series[d] = y^(d)(t0)·seriesRadius^d/d!. A step response from
 * rest is 1 − Σ modes, which cancels to nothing near t0 in double precision; its series starts with
 * the first nonzero derivative and keeps full relative accuracy there.
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
        return n < validFrom ? leading.get((int) (n - first)) : sum(n, n);
    }

    /** y(t) as the generated {@code value(double t)} computes it. */
    public double valueAt(double t) {
        double v = t - origin;
        if (Math.abs(v) <= seriesRadius) {
            double s = v / seriesRadius;
            double total = 0.0;
            for (int d = series.size() - 1; d >= 0; d--) {
                total = total * s + series.get(d);
            }
            return total;
        }
        return sum(v, 0);
    }

    /** Σ waves at v (and index n, for reduced angles), in the order and with the operations of the generated code's loop. */
    private double sum(double v, long n) {
        double total = 0.0;
        for (Wave w : waves) {
            double term = w.amplitude() * (differential() ? StrictMath.exp(w.growth() * v) : StrictMath.pow(w.growth(), v));
            if (w.power() > 0) {
                term *= StrictMath.pow(v, w.power());
            }
            if (w.frequency() != 0.0) {
                double angle = w.reduced() ? w.frequency() * (double) w.reducedStep(n) : w.frequency() * v;
                term *= StrictMath.cos(angle + w.phase());
            }
            total += term;
        }
        return total;
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
