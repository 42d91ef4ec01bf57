package dev.rootform.reference;

import java.math.BigInteger;

/**
 * F(n) by fast doubling on {@link BigInteger}: F(2k) = F(k)·(2F(k+1) − F(k)) and
 * F(2k+1) = F(k)² + F(k+1)², the addition formula F(m+n) = F(m)·F(n+1) + F(m−1)·F(n) with m = k,
 * n = k and n = k + 1 (Knuth, TAOCP vol. 1, §1.2.8, eq. 15). A route to F(n) that shares nothing
 * with rootform's.
 */
public final class FastDoubling {
    private FastDoubling() {
    }

    /** F(n), n ≥ 0. */
    public static BigInteger fibonacci(long n) {
        BigInteger a = BigInteger.ZERO;
        BigInteger b = BigInteger.ONE;
        for (int bit = 63 - Long.numberOfLeadingZeros(n); bit >= 0; bit--) {
            BigInteger c = a.multiply(b.shiftLeft(1).subtract(a));
            BigInteger d = a.multiply(a).add(b.multiply(b));
            if ((n >>> bit & 1L) == 0) {
                a = c;
                b = d;
            } else {
                a = d;
                b = c.add(d);
            }
        }
        return a;
    }
}
