package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.OptionalDouble;

/**
 * A {@link ModeSum} with its weights and rates rounded to double once: Re Σ w·u^p·e^{zu} per point
 * in double arithmetic. Approximate, with an estimate of its own rounding error: about 2^-52 times
 * Σ |mode|·(|z·u| + p + modes + 8) (the rate's rounding grows with |z·u| through the exponential and
 * the cosine; the rest is a few roundings per mode and the summation).
 */
final class DoubleModes {
    private static final double UNIT = Math.ulp(1.0);

    private final double start;
    private final double[] wr;
    private final double[] wi;
    private final double[] zr;
    private final double[] zi;
    private final int[] p;

    DoubleModes(Rational origin, List<ModeSum.Mode> modes) {
        int size = modes.size();
        start = origin.doubleValue();
        wr = new double[size];
        wi = new double[size];
        zr = new double[size];
        zi = new double[size];
        p = new int[size];
        for (int k = 0; k < size; k++) {
            ModeSum.Mode m = modes.get(k);
            wr[k] = m.weight().real().doubleValue();
            wi[k] = m.weight().imag().doubleValue();
            zr[k] = m.rate().real().doubleValue();
            zi[k] = m.rate().imag().doubleValue();
            p[k] = m.power();
        }
    }

    /** The value at t (error about 1e-16 times the largest mode; may overflow to ±∞ or NaN). */
    double value(double t) {
        return valueAndError(t)[0];
    }

    /**
     * The value at t when its estimated error is at most {@code relative}·max(1, |value|), else empty
     * (a mode beyond the double range, or cancellation that leaves too few digits).
     */
    OptionalDouble accurate(double t, double relative) {
        double[] v = valueAndError(t);
        return Double.isFinite(v[0]) && Double.isFinite(v[1]) && v[1] <= relative * Math.max(1, Math.abs(v[0]))
                ? OptionalDouble.of(v[0]) : OptionalDouble.empty();
    }

    private double[] valueAndError(double t) {
        double u = t - start;
        double sum = 0;
        double error = 0;
        for (int k = 0; k < wr.length; k++) {
            double scale = Math.exp(zr[k] * u) * Math.pow(u, p[k]);
            double angle = zi[k] * u;
            sum += scale * (wr[k] * Math.cos(angle) - wi[k] * Math.sin(angle));
            error += Math.abs(scale) * Math.hypot(wr[k], wi[k]) * (Math.hypot(zr[k], zi[k]) * Math.abs(u) + p[k] + wr.length + 8);
        }
        return new double[] {sum, 2 * UNIT * error};
    }
}
