package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;

/**
 * Newton's iteration z ← z − p(z)/p'(z) on each approximate root separately, at a working
 * precision that doubles from the accuracy of the starting points up to the target: near a simple
 * root every step doubles the correct digits (common practice), so only the last step runs at the
 * full precision. At the target precision the step is repeated, at most {@link #FINAL_STEPS} times,
 * until the correction is below the square root of the precision's resolution.
 *
 * <p>Arithmetic: binary fixed point on {@link BigInteger} (a number x is held as round(x·2^S)),
 * with p scaled to integer coefficients (same roots). With integer coefficients and p(0) ≠ 0 the
 * absolute rounding of a Horner step, about 2^−S·max(1, |z|)^d, stays below 2^−S·Σ|a_j||z|^j, the
 * scale of a floating-point evaluation's error; S = level·log2(10) + log2(d + 1) + {@link #GUARD_BITS}.
 * The result is approximate, and two starting points may even reach the same root: certification
 * decides.
 */
final class NewtonPolisher {
    /** Most Newton steps at the target precision. */
    static final int FINAL_STEPS = 3;
    /** Bits carried above each level of the doubling. */
    static final int GUARD_BITS = 24;
    /** Least working precision of a level of the doubling, in digits. */
    static final int LOWEST_LEVEL = 24;
    private static final double BITS_PER_DIGIT = Math.log(10) / Math.log(2);

    private final BigInteger[] a;

    private NewtonPolisher(RationalPolynomial p) {
        BigInteger common = BigInteger.ONE;
        for (int j = 0; j <= p.degree(); j++) {
            BigInteger q = p.coefficient(j).denominator();
            common = common.divide(common.gcd(q)).multiply(q);
        }
        a = new BigInteger[p.degree() + 1];
        for (int j = 0; j <= p.degree(); j++) {
            Rational c = p.coefficient(j);
            a[j] = c.numerator().multiply(common.divide(c.denominator()));
        }
    }

    /**
     * Refined copies of z (p of degree ≥ 1 with p(0) ≠ 0).
     *
     * @param accurate about how many digits the approximations z already have
     * @param precision the target working precision, in digits
     */
    static Apcomplex[] polish(RationalPolynomial p, Apcomplex[] z, long accurate, long precision) {
        List<Long> levels = new ArrayList<>();
        for (long level = precision; levels.isEmpty() || level > accurate; level = (level + 1) / 2) {
            levels.add(0, Math.max(level, LOWEST_LEVEL));
            if (level == 1) {
                break;
            }
        }
        NewtonPolisher newton = new NewtonPolisher(p);
        Apcomplex[] result = new Apcomplex[z.length];
        for (int i = 0; i < z.length; i++) {
            Deadline.checkCurrent();
            int bits = newton.bits(levels.get(0));
            BigInteger[] x = {fixed(z[i].real(), bits), fixed(z[i].imag(), bits)};
            for (int l = 0; l < levels.size(); l++) {
                int next = newton.bits(levels.get(l));
                x = new BigInteger[] {x[0].shiftLeft(next - bits), x[1].shiftLeft(next - bits)};
                bits = next;
                boolean last = l == levels.size() - 1;
                for (int step = 0; step < (last ? FINAL_STEPS : 1); step++) {
                    if (!newton.step(x, bits, (int) Math.ceil(levels.get(l) * BITS_PER_DIGIT / 2))) {
                        break;
                    }
                }
            }
            result[i] = new Apcomplex(floating(x[0], bits, precision), floating(x[1], bits, precision));
        }
        return result;
    }

    private int bits(long digits) {
        return (int) Math.ceil(digits * BITS_PER_DIGIT) + 32 - Integer.numberOfLeadingZeros(a.length) + GUARD_BITS;
    }

    /** x·2^−bits rounded to {@code precision} digits: exactly x·5^bits·10^−bits as a decimal first. */
    private static Apfloat floating(BigInteger x, int bits, long precision) {
        BigDecimal exact = new BigDecimal(x.multiply(BigInteger.valueOf(5).pow(bits)), bits);
        return new Apfloat(exact.round(new MathContext((int) precision)), precision);
    }

    private static BigInteger fixed(Apfloat x, int bits) {
        return new BigDecimal(x.toString(true)).multiply(new BigDecimal(BigInteger.ONE.shiftLeft(bits))).toBigInteger();
    }

    /**
     * One Newton step on x = {re, im} (scaled by 2^bits), in place; false when p'(x) = 0 or the
     * correction was below 2^−half·max(1, |x|) (the step is then taken, and the next is not needed).
     */
    private boolean step(BigInteger[] x, int bits, int half) {
        BigInteger vr = BigInteger.ZERO;
        BigInteger vi = BigInteger.ZERO;
        BigInteger sr = BigInteger.ZERO;
        BigInteger si = BigInteger.ZERO;
        for (int k = a.length - 1; k >= 0; k--) {
            BigInteger nsr = sr.multiply(x[0]).subtract(si.multiply(x[1])).shiftRight(bits).add(vr);
            si = sr.multiply(x[1]).add(si.multiply(x[0])).shiftRight(bits).add(vi);
            sr = nsr;
            BigInteger nvr = vr.multiply(x[0]).subtract(vi.multiply(x[1])).shiftRight(bits).add(a[k].shiftLeft(bits));
            vi = vr.multiply(x[1]).add(vi.multiply(x[0])).shiftRight(bits);
            vr = nvr;
        }
        BigInteger norm = sr.multiply(sr).add(si.multiply(si));
        if (norm.signum() == 0) {
            return false;
        }
        BigInteger cr = vr.multiply(sr).add(vi.multiply(si)).shiftLeft(bits).divide(norm);
        BigInteger ci = vi.multiply(sr).subtract(vr.multiply(si)).shiftLeft(bits).divide(norm);
        x[0] = x[0].subtract(cr);
        x[1] = x[1].subtract(ci);
        int size = Math.max(bits, Math.max(x[0].bitLength(), x[1].bitLength()));
        return Math.max(cr.bitLength(), ci.bitLength()) > size - half;
    }
}
