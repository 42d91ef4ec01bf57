package dev.rootform.symbolic.recover;

import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;
import java.util.Arrays;
import java.util.List;

/**
 * The shortest linear recurrence of an integer sequence, by the Berlekamp–Massey algorithm
 * (J. L. Massey, "Shift-register synthesis and BCH decoding", IEEE Transactions on Information
 * Theory 15(1), 1969, pp. 122–127, "Algorithm" in section III), run fraction-free over Z.
 *
 * <p>Massey's update C(z) ← C(z) − (d/b)·z^m·B(z) divides by the discrepancy b of the last length
 * change; here it is C ← b·C − d·z^m·B instead, which scales the connection polynomial by the
 * nonzero integer b and so describes the same recurrence, and C is made primitive (divided by the
 * gcd of its coefficients, C_0 &gt; 0) after each update. Every number stays an integer no larger
 * than the Hankel minors of the sequence; no rational arithmetic is done. For a sequence of length
 * N whose shortest recurrence has order L the cost is O(N·L) multiplications of such integers.
 *
 * <p>Result, for s_0 … s_{N−1}: the length L and C(z) = C_0 + C_1 z + … + C_L z^L with C_0 ≠ 0
 * such that Σ_{i=0..L} C_i·s_{j−i} = 0 for every j in L … N−1, with L as small as possible
 * (Massey, section III). C is unique up to scale when N ≥ 2L (common practice).
 * C_L may be 0: then the recurrence skips its lowest terms (λ = 0 is a characteristic root).
 */
final class BerlekampMassey {
    private BerlekampMassey() {
    }

    /** The shortest recurrence of {@code s}: length L and primitive connection coefficients C_0..C_L. */
    record Register(int length, List<BigInteger> connection) {
        Register {
            connection = List.copyOf(connection);
        }
    }

    /**
     * @param s the sequence
     * @throws dev.rootform.symbolic.work.Cancelled if the current {@link Deadline} passes or the thread
     *     is interrupted
     */
    static Register shortest(List<BigInteger> s) {
        BigInteger[] c = {BigInteger.ONE};
        BigInteger[] b = {BigInteger.ONE};
        BigInteger lastDiscrepancy = BigInteger.ONE;
        int length = 0;
        int shift = 1;
        for (int j = 0; j < s.size(); j++) {
            Deadline.checkCurrent();
            BigInteger d = BigInteger.ZERO;
            for (int i = 0; i < c.length; i++) {
                d = d.add(c[i].multiply(s.get(j - i)));
            }
            if (d.signum() == 0) {
                shift++;
                continue;
            }
            BigInteger[] previous = c;
            c = primitive(combine(lastDiscrepancy, c, d, shift, b));
            if (2 * length <= j) {
                length = j + 1 - length;
                b = previous;
                lastDiscrepancy = d;
                shift = 1;
            } else {
                shift++;
            }
        }
        BigInteger[] connection = Arrays.copyOf(c, length + 1);
        Arrays.fill(connection, c.length, connection.length, BigInteger.ZERO);
        return new Register(length, Arrays.asList(connection));
    }

    /** p·c − q·z^shift·b. */
    private static BigInteger[] combine(BigInteger p, BigInteger[] c, BigInteger q, int shift, BigInteger[] b) {
        BigInteger[] r = new BigInteger[Math.max(c.length, b.length + shift)];
        for (int i = 0; i < r.length; i++) {
            BigInteger ci = i < c.length ? c[i].multiply(p) : BigInteger.ZERO;
            int k = i - shift;
            r[i] = k >= 0 && k < b.length ? ci.subtract(b[k].multiply(q)) : ci;
        }
        int n = r.length;
        while (n > 1 && r[n - 1].signum() == 0) {
            n--;
        }
        return n == r.length ? r : Arrays.copyOf(r, n);
    }

    /** c divided by the gcd of its entries, with c_0 &gt; 0 (c_0 is never 0). */
    private static BigInteger[] primitive(BigInteger[] c) {
        BigInteger g = BigInteger.ZERO;
        for (BigInteger x : c) {
            g = g.gcd(x);
            if (g.equals(BigInteger.ONE)) {
                break;
            }
        }
        if (c[0].signum() < 0) {
            g = g.negate();
        }
        if (g.equals(BigInteger.ONE)) {
            return c;
        }
        BigInteger[] r = new BigInteger[c.length];
        for (int i = 0; i < c.length; i++) {
            r[i] = c[i].divide(g);
        }
        return r;
    }
}
