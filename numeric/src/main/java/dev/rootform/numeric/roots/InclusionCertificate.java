package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Rigorous inclusion disks for all zeros of p of degree d from distinct exact centres z_1..z_d.
 *
 * <p>Theorem (D. Braess and K. P. Hadeler, "Simultaneous inclusion of the zeros of a polynomial",
 * Numer. Math. 21 (1973) 161–165): with the Weierstrass corrections
 * W_i = p(z_i) / (a_d·∏_{j≠i}(z_i − z_j)), every zero of p lies in the union of the disks
 * |z − z_i| ≤ d·|W_i|, and a connected component made of m disks contains exactly m zeros.
 * Disks that are pairwise disjoint therefore contain exactly one zero each.
 *
 * <p>Rounding: p(z_i) is evaluated by Horner's rule in {@link BigDecimal} with every step computed
 * exactly and rounded once to P digits (unit roundoff u = ½·10^(1−P)); then
 * |p̂(z) − p(z)| ≤ γ_{d+2}·Σ|a_j||z|^j (N. J. Higham, Accuracy and Stability of Numerical
 * Algorithms, 2nd ed., SIAM 2002, §5.1). We use the bound {@link #MARGIN}·(d+2)·u·Σ|a_j||z|^j, the
 * factor {@value #MARGIN} covering γ_n = nu/(1−nu) ≤ 1.01·nu. P is chosen per root so that this
 * term stays below 1% of the target radius. The remaining quantities are bounded with directed
 * rounding ({@link Bounds}), and the final radius is rounded up. Disjointness of disks is decided
 * exactly. With centres closed under conjugation and p real, a disk centred on the real axis that
 * holds exactly one zero holds a real zero, and conjugate disks hold conjugate zeros.
 */
final class InclusionCertificate {
    /** Safety factor on the first-order Horner rounding bound. */
    static final int MARGIN = 2;
    /** Least precision of the Horner evaluation. */
    static final int MIN_PRECISION = 20;
    /** Extra digits by which the rounding term must undercut the target radius. */
    static final int SLACK_DIGITS = 2;
    /** Significant digits of the published radii (rounded up). */
    static final int RADIUS_DIGITS = 5;

    private InclusionCertificate() {
    }

    /**
     * The outcome of a certification attempt: the enclosures when every radius is at most
     * 10^(−digits)·max(1, |root|) and the disks are pairwise disjoint; otherwise no enclosures and
     * the number of digits by which the widest disk missed the target ({@link #UNKNOWN} when disks
     * overlap or centres coincide).
     */
    record Outcome(Optional<List<Enclosure>> enclosures, int missingDigits) {
    }

    /** {@link Outcome#missingDigits} when the shortfall cannot be estimated. */
    static final int UNKNOWN = -1;

    static Outcome certify(RationalPolynomial p, CentreSet centres, int digits) {
        int d = p.degree();
        BigDecimal[] re = centres.re();
        BigDecimal[] im = centres.im();
        Bound[] bounds = new Bound[d];
        int maxPrecision = MIN_PRECISION;
        for (int i = 0; i < d; i++) {
            if (centres.partner()[i] >= i) {
                Deadline.checkCurrent();
                bounds[i] = bound(p, centres, i, digits);
                if (bounds[i] == null) {
                    return new Outcome(Optional.empty(), UNKNOWN);
                }
                maxPrecision = Math.max(maxPrecision, bounds[i].precision());
            }
        }
        BigDecimal[] coefficients = new BigDecimal[d + 1];
        MathContext coefficientContext = new MathContext(maxPrecision, RoundingMode.HALF_EVEN);
        for (int k = 0; k <= d; k++) {
            coefficients[k] = p.coefficient(k).toBigDecimal(coefficientContext);
        }
        BigDecimal[] radius = new BigDecimal[d];
        BigDecimal target = BigDecimal.ONE.scaleByPowerOfTen(-digits);
        double worst = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < d; i++) {
            Deadline.checkCurrent();
            int partner = centres.partner()[i];
            radius[i] = partner < i ? radius[partner] : radius(coefficients, re[i], im[i], bounds[i]);
            BigDecimal size = Bounds.modulusDown(re[i], im[i]).subtract(radius[i]).max(BigDecimal.ONE);
            BigDecimal allowed = target.multiply(size);
            if (radius[i].compareTo(allowed) > 0) {
                worst = Math.max(worst, Bounds.log10(radius[i]) - Bounds.log10(allowed));
            }
        }
        if (worst > Double.NEGATIVE_INFINITY) {
            return new Outcome(Optional.empty(), (int) Math.ceil(worst));
        }
        for (int i = 0; i < d; i++) {
            Deadline.checkCurrent();
            for (int j = i + 1; j < d; j++) {
                BigDecimal dx = re[i].subtract(re[j]);
                BigDecimal dy = im[i].subtract(im[j]);
                BigDecimal sum = radius[i].add(radius[j]);
                if (dx.multiply(dx).add(dy.multiply(dy)).compareTo(sum.multiply(sum)) <= 0) {
                    return new Outcome(Optional.empty(), UNKNOWN);
                }
            }
        }
        List<Enclosure> result = new ArrayList<>(d);
        for (int i = 0; i < d; i++) {
            result.add(new Enclosure(re[i], im[i], radius[i]));
        }
        return new Outcome(Optional.of(result), 0);
    }

    /**
     * Rounding-independent parts of the radius of disk i: a lower bound of |a_d|·∏_{j≠i}|z_i − z_j|,
     * an upper bound of Σ|a_j||z_i|^j, and the Horner precision; {@code null} if centres coincide.
     */
    private record Bound(BigDecimal denominator, BigDecimal absoluteSum, int precision) {
    }

    private static Bound bound(RationalPolynomial p, CentreSet centres, int i, int digits) {
        int d = p.degree();
        BigDecimal x = centres.re()[i];
        BigDecimal y = centres.im()[i];
        BigDecimal distanceSquared = BigDecimal.ONE;
        for (int j = 0; j < d; j++) {
            if (j != i) {
                BigDecimal dx = x.subtract(centres.re()[j]);
                BigDecimal dy = y.subtract(centres.im()[j]);
                distanceSquared = distanceSquared.multiply(
                        dx.multiply(dx, Bounds.DOWN).add(dy.multiply(dy, Bounds.DOWN), Bounds.DOWN), Bounds.DOWN);
            }
        }
        if (distanceSquared.signum() == 0) {
            return null;
        }
        BigDecimal denominator = Bounds.absDown(p.leadingCoefficient())
                .multiply(Bounds.sqrtDown(distanceSquared), Bounds.DOWN);
        BigDecimal modulus = Bounds.modulusUp(x, y);
        BigDecimal absoluteSum = BigDecimal.ZERO;
        for (int k = d; k >= 0; k--) {
            absoluteSum = absoluteSum.multiply(modulus, Bounds.UP).add(Bounds.absUp(p.coefficient(k)), Bounds.UP);
        }
        double targetLog = -digits - SLACK_DIGITS + Math.max(0, Bounds.log10(modulus));
        double needed = Math.log10(MARGIN * (d + 2.0) * d) + Bounds.log10(absoluteSum)
                - Bounds.log10(denominator) - targetLog;
        return new Bound(denominator, absoluteSum, Math.max(MIN_PRECISION, (int) Math.ceil(needed) + 2));
    }

    /**
     * An upper bound of d·|W_i| = d·|p(z)| / (|a_d|·∏|z − z_j|) at z = x + iy, from coefficients
     * rounded to at least {@code bound.precision()} digits.
     */
    private static BigDecimal radius(BigDecimal[] coefficients, BigDecimal x, BigDecimal y, Bound bound) {
        int d = coefficients.length - 1;
        int precision = bound.precision();
        BigDecimal[] value = horner(coefficients, x, y, new MathContext(precision, RoundingMode.HALF_EVEN));
        BigDecimal unitRoundoff = new BigDecimal("0.5").scaleByPowerOfTen(1 - precision);
        BigDecimal rounding = unitRoundoff.multiply(BigDecimal.valueOf(MARGIN * (d + 2L)))
                .multiply(bound.absoluteSum(), Bounds.UP);
        BigDecimal numerator = Bounds.modulusUp(value[0], value[1]).add(rounding, Bounds.UP)
                .multiply(BigDecimal.valueOf(d), Bounds.UP);
        return numerator.divide(bound.denominator(), new MathContext(RADIUS_DIGITS, RoundingMode.CEILING));
    }

    /** {re, im} of p(x + iy) by Horner's rule, each step exact then rounded once to {@code context}; the
     * coefficients are p's rounded to at least that precision. */
    private static BigDecimal[] horner(BigDecimal[] coefficients, BigDecimal x, BigDecimal y, MathContext context) {
        BigDecimal re = BigDecimal.ZERO;
        BigDecimal im = BigDecimal.ZERO;
        for (int k = coefficients.length - 1; k >= 0; k--) {
            BigDecimal nextRe = re.multiply(x).subtract(im.multiply(y)).add(coefficients[k]);
            BigDecimal nextIm = re.multiply(y).add(im.multiply(x));
            re = nextRe.round(context);
            im = nextIm.round(context);
        }
        return new BigDecimal[] {re, im};
    }
}
