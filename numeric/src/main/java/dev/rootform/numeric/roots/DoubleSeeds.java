package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * Approximate zeros of a polynomial in {@code double} arithmetic, used only as starting points for
 * the multiprecision iteration (nothing here is certified).
 *
 * <p>Starting points lie on circles whose radii come from the Newton polygon of log|a_i| (the upper
 * convex hull of the points (i, log|a_i|)), as proposed by D. A. Bini, "Numerical computation of
 * polynomial zeros by means of Aberth's method", Numerical Algorithms 13 (1996) 179–200. They are
 * then improved by the Aberth–Ehrlich iteration (O. Aberth, Math. Comp. 27 (1973) 339–344;
 * L. W. Ehrlich, Comm. ACM 10 (1967) 107–108). The Newton quotient p/p' is evaluated by Horner's
 * rule on p for |z| ≤ 1 and on the reversed polynomial for |z| &gt; 1, so no power of z overflows.
 */
final class DoubleSeeds {
    /** Iteration budget of the double-precision phase. */
    static final int MAX_ITERATIONS = 500;
    /** Significant digits a settled double-precision approximation carries at best. */
    static final int DIGITS = 15;
    /** Relative correction below which a double approximation is considered settled. */
    static final double TOLERANCE = 8 * Math.ulp(1.0);
    /** Rotation (radians) applied to each circle of starting points, to break symmetry. */
    static final double ANGLE_OFFSET = 0.4;
    /** Starting radii outside [1/LIMIT, LIMIT] are not representable in this phase. */
    static final double LIMIT = 1e280;

    private DoubleSeeds() {
    }

    /**
     * Approximations of all zeros of p (degree ≥ 1, p(0) ≠ 0) as {re[], im[]}.
     *
     * @throws IllegalArgumentException if the root magnitudes exceed the {@code double} range
     */
    static double[][] of(RationalPolynomial p) {
        int d = p.degree();
        double[] log = new double[d + 1];
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= d; i++) {
            Rational c = p.coefficient(i);
            log[i] = c.isZero() ? Double.NEGATIVE_INFINITY : Bounds.log10(c.abs().toBigDecimal(MathContext.DECIMAL64));
            max = Math.max(max, log[i]);
        }
        double[] a = new double[d + 1];
        for (int i = 0; i <= d; i++) {
            a[i] = p.coefficient(i).toBigDecimal(MathContext.DECIMAL64)
                    .scaleByPowerOfTen(-(int) Math.round(max)).doubleValue();
        }
        double[][] z = startingPoints(log);
        iterate(a, z[0], z[1]);
        return z;
    }

    /** Points on the circles |z| = (|a_i|/|a_j|)^(1/(j−i)), one circle per Newton polygon edge. */
    private static double[][] startingPoints(double[] log) {
        int d = log.length - 1;
        List<Integer> hull = new ArrayList<>();
        for (int i = 0; i <= d; i++) {
            if (log[i] == Double.NEGATIVE_INFINITY) {
                continue;
            }
            while (hull.size() >= 2 && !turnsRight(hull.get(hull.size() - 2), hull.get(hull.size() - 1), i, log)) {
                hull.remove(hull.size() - 1);
            }
            hull.add(i);
        }
        double[] re = new double[d];
        double[] im = new double[d];
        int k = 0;
        for (int e = 0; e + 1 < hull.size(); e++) {
            int i = hull.get(e);
            int j = hull.get(e + 1);
            double radius = Math.pow(10, (log[i] - log[j]) / (j - i));
            if (!(radius < LIMIT && radius > 1 / LIMIT)) {
                throw new IllegalArgumentException("root magnitudes outside the supported range");
            }
            for (int m = 0; m < j - i; m++, k++) {
                double angle = 2 * Math.PI * m / (j - i) + ANGLE_OFFSET * (e + 1);
                re[k] = radius * Math.cos(angle);
                im[k] = radius * Math.sin(angle);
            }
        }
        return new double[][] {re, im};
    }

    /** Whether the hull chain a → b → c turns strictly clockwise (keeps b on the upper hull). */
    private static boolean turnsRight(int a, int b, int c, double[] log) {
        return (b - a) * (log[c] - log[a]) - (log[b] - log[a]) * (c - a) < 0;
    }

    /** Gauss–Seidel Aberth–Ehrlich sweeps in place until every correction is negligible. */
    private static void iterate(double[] a, double[] re, double[] im) {
        int d = re.length;
        boolean[] done = new boolean[d];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            Deadline.checkCurrent();
            boolean active = false;
            for (int i = 0; i < d; i++) {
                if (done[i]) {
                    continue;
                }
                double[] n = newtonQuotient(a, re[i], im[i]);
                double sr = 0;
                double si = 0;
                for (int j = 0; j < d; j++) {
                    if (j != i) {
                        double dr = re[i] - re[j];
                        double di = im[i] - im[j];
                        double q = dr * dr + di * di;
                        sr += dr / q;
                        si -= di / q;
                    }
                }
                // w = N / (1 − N·S)
                double br = 1 - (n[0] * sr - n[1] * si);
                double bi = -(n[0] * si + n[1] * sr);
                double q = br * br + bi * bi;
                double wr = (n[0] * br + n[1] * bi) / q;
                double wi = (n[1] * br - n[0] * bi) / q;
                if (!Double.isFinite(wr) || !Double.isFinite(wi)) {
                    done[i] = true;
                    continue;
                }
                re[i] -= wr;
                im[i] -= wi;
                done[i] = Math.hypot(wr, wi) <= TOLERANCE * Math.hypot(re[i], im[i]);
                active |= !done[i];
            }
            if (!active) {
                return;
            }
        }
    }

    /** p(z)/p'(z) as {re, im}, using the reversed polynomial when |z| &gt; 1. */
    private static double[] newtonQuotient(double[] a, double x, double y) {
        int d = a.length - 1;
        boolean reversed = x * x + y * y > 1;
        double zr = x;
        double zi = y;
        if (reversed) {
            double m = x * x + y * y;
            zr = x / m;
            zi = -y / m;
        }
        double pr = 0;
        double pi = 0;
        double dr = 0;
        double di = 0;
        for (int k = d; k >= 0; k--) {
            double c = reversed ? a[d - k] : a[k];
            double t = dr * zr - di * zi + pr;
            di = dr * zi + di * zr + pi;
            dr = t;
            t = pr * zr - pi * zi + c;
            pi = pr * zi + pi * zr;
            pr = t;
        }
        if (reversed) {
            // p/p' = z·q(w) / (d·q(w) − w·q'(w)) with w = 1/z
            double wdr = zr * dr - zi * di;
            double wdi = zr * di + zi * dr;
            double br = d * pr - wdr;
            double bi = d * pi - wdi;
            double nr = x * pr - y * pi;
            double ni = x * pi + y * pr;
            return divide(nr, ni, br, bi);
        }
        return divide(pr, pi, dr, di);
    }

    private static double[] divide(double ar, double ai, double br, double bi) {
        double q = br * br + bi * bi;
        return new double[] {(ar * br + ai * bi) / q, (ai * br - ar * bi) / q};
    }
}
