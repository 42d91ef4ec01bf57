package dev.rootform.numeric.roots;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;

/**
 * Turns approximate zeros of a real polynomial into a conjugation-closed {@link CentreSet}: each
 * approximation is rounded to {@code precision} significant digits (relative to its modulus), one
 * whose imaginary part is below 10^(−precision/2)·max(1, |z|) is put on the real axis, and the
 * others are matched greedily with the nearest approximation of their conjugate and replaced by the
 * mean of the pair and its conjugate. This is only a choice of centres; whether they are good is
 * decided by the certificate.
 */
final class ConjugateSymmetry {
    private ConjugateSymmetry() {
    }

    /** The symmetric centres, or empty when the approximations do not pair up. */
    static Optional<CentreSet> centres(Apcomplex[] z, long precision) {
        int d = z.length;
        BigDecimal[] re = new BigDecimal[d];
        BigDecimal[] im = new BigDecimal[d];
        int[] partner = new int[d];
        List<Integer> upper = new ArrayList<>();
        List<Integer> lower = new ArrayList<>();
        BigDecimal realThreshold = BigDecimal.ONE.scaleByPowerOfTen((int) -(precision / 2));
        for (int k = 0; k < d; k++) {
            long exponent = Math.max(z[k].real().scale(), z[k].imag().scale());
            int scale = (int) (precision - exponent);
            re[k] = decimal(z[k].real()).setScale(scale, RoundingMode.HALF_EVEN);
            im[k] = decimal(z[k].imag()).setScale(scale, RoundingMode.HALF_EVEN);
            BigDecimal size = re[k].abs().max(im[k].abs()).max(BigDecimal.ONE);
            if (im[k].abs().compareTo(realThreshold.multiply(size)) <= 0) {
                im[k] = BigDecimal.ZERO;
                partner[k] = k;
            } else {
                (im[k].signum() > 0 ? upper : lower).add(k);
            }
        }
        if (upper.size() != lower.size()) {
            return Optional.empty();
        }
        boolean[] used = new boolean[d];
        for (int u : upper) {
            int best = -1;
            double bestDistance = Double.POSITIVE_INFINITY;
            for (int l : lower) {
                double distance = re[u].subtract(re[l]).abs().add(im[u].add(im[l]).abs()).doubleValue();
                if (!used[l] && distance < bestDistance) {
                    bestDistance = distance;
                    best = l;
                }
            }
            if (best < 0) {
                return Optional.empty();
            }
            BigDecimal x = re[u].add(re[best]).divide(BigDecimal.valueOf(2));
            BigDecimal y = im[u].subtract(im[best]).divide(BigDecimal.valueOf(2));
            re[u] = x;
            im[u] = y;
            re[best] = x;
            im[best] = y.negate();
            used[best] = true;
            partner[u] = best;
            partner[best] = u;
        }
        return Optional.of(new CentreSet(re, im, partner));
    }

    private static BigDecimal decimal(Apfloat value) {
        return value.signum() == 0 ? BigDecimal.ZERO : new BigDecimal(value.toString(false));
    }
}
