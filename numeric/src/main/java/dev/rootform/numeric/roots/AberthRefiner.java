package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Multiprecision Aberth–Ehrlich iteration z_i ← z_i − N_i / (1 − N_i·Σ_{j≠i} 1/(z_i − z_j)) with
 * N_i = p(z_i)/p'(z_i), in Gauss–Seidel order, in apfloat arithmetic at a fixed number of decimal
 * digits (O. Aberth, "Iteration methods for finding all zeros of a polynomial simultaneously",
 * Math. Comp. 27 (1973) 339–344; L. W. Ehrlich, "A modified Newton method for polynomials",
 * Comm. ACM 10 (1967) 107–108). The result is approximate; certification happens elsewhere.
 *
 * <p>The sum Σ 1/(z_i − z_j) only steers convergence (a fixed point with distinct z_i is a root
 * whatever its value), so it is accumulated in {@code double} except for pairs closer than
 * {@link #NEAR} relative to their size, which are summed in full precision.
 */
final class AberthRefiner {
    /** Relative distance under which a pair's term is computed in multiprecision. */
    static final double NEAR = 1e-6;
    /** A correction is negligible when |w| ≤ 10^(SETTLED_DIGITS − precision)·|z|. */
    static final int SETTLED_DIGITS = 3;

    private final Apfloat[] coefficients;
    private final long precision;
    private final Apfloat tolerance;

    /** An iteration for p at {@code precision} significant decimal digits. */
    AberthRefiner(RationalPolynomial p, long precision) {
        this.precision = precision;
        this.coefficients = new Apfloat[p.degree() + 1];
        for (int i = 0; i < coefficients.length; i++) {
            coefficients[i] = Seeds.toApfloat(p.coefficient(i), precision);
        }
        this.tolerance = ApfloatMath.pow(new Apfloat(10, precision), SETTLED_DIGITS - precision);
    }

    /** {@code value} raised to this iteration's precision. */
    Apcomplex lift(Apcomplex value) {
        return value.precision(precision);
    }

    /**
     * Runs at most {@code maxSweeps} sweeps on z (in place); a root stops moving once its correction
     * is negligible or has stopped shrinking below half the working precision.
     */
    void refine(Apcomplex[] z, int maxSweeps) {
        int d = z.length;
        double[] re = new double[d];
        double[] im = new double[d];
        for (int i = 0; i < d; i++) {
            z[i] = lift(z[i]);
            re[i] = z[i].real().doubleValue();
            im[i] = z[i].imag().doubleValue();
        }
        boolean[] done = new boolean[d];
        long[] lastScale = new long[d];
        java.util.Arrays.fill(lastScale, Long.MAX_VALUE);
        for (int sweep = 0; sweep < maxSweeps; sweep++) {
            boolean active = false;
            for (int i = 0; i < d; i++) {
                if (done[i]) {
                    continue;
                }
                Deadline.checkCurrent();
                Apcomplex w = correction(z, re, im, i);
                z[i] = z[i].subtract(w).precision(precision);
                re[i] = z[i].real().doubleValue();
                im[i] = z[i].imag().doubleValue();
                Apfloat size = norm1(w);
                Apfloat scale = norm1(z[i]);
                long relative = size.signum() == 0 || scale.signum() == 0 ? Long.MIN_VALUE : size.scale() - scale.scale();
                done[i] = size.compareTo(tolerance.multiply(scale)) <= 0
                        || (relative >= lastScale[i] && relative < -precision / 2);
                lastScale[i] = relative;
                active |= !done[i];
            }
            if (!active) {
                return;
            }
        }
    }

    /** The Aberth correction for z_i. */
    private Apcomplex correction(Apcomplex[] z, double[] re, double[] im, int i) {
        Apcomplex value = Apcomplex.ZERO;
        Apcomplex slope = Apcomplex.ZERO;
        for (int k = coefficients.length - 1; k >= 0; k--) {
            slope = slope.multiply(z[i]).add(value);
            value = value.multiply(z[i]).add(coefficients[k]);
        }
        if (value.equals(Apcomplex.ZERO)) {
            return Apcomplex.ZERO;
        }
        if (slope.equals(Apcomplex.ZERO)) {
            return new Apcomplex(tolerance.multiply(norm1(z[i]).add(Apfloat.ONE)));
        }
        Apcomplex newton = value.divide(slope);
        Apcomplex denominator = Apcomplex.ONE.subtract(newton.multiply(repulsion(z, re, im, i)));
        return denominator.equals(Apcomplex.ZERO) ? newton : newton.divide(denominator);
    }

    /** Σ_{j≠i} 1/(z_i − z_j). */
    private Apcomplex repulsion(Apcomplex[] z, double[] re, double[] im, int i) {
        double sr = 0;
        double si = 0;
        Apcomplex near = Apcomplex.ZERO;
        for (int j = 0; j < z.length; j++) {
            if (j == i) {
                continue;
            }
            double dr = re[i] - re[j];
            double di = im[i] - im[j];
            double q = dr * dr + di * di;
            double size = Math.abs(re[i]) + Math.abs(im[i]) + Math.abs(re[j]) + Math.abs(im[j]);
            if (Double.isFinite(q) && Double.isFinite(size) && Math.sqrt(q) > NEAR * size && q > Double.MIN_NORMAL) {
                sr += dr / q;
                si -= di / q;
            } else {
                Apcomplex difference = z[i].subtract(z[j]);
                if (!difference.equals(Apcomplex.ZERO)) {
                    near = near.add(Apcomplex.ONE.divide(difference.precision(precision)));
                }
            }
        }
        return near.add(new Apcomplex(new Apfloat(sr, precision), new Apfloat(si, precision)));
    }

    private static Apfloat norm1(Apcomplex c) {
        return ApfloatMath.abs(c.real()).add(ApfloatMath.abs(c.imag()));
    }
}
