package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;

/**
 * Exact decision whether a rational polynomial p is squarefree, i.e. gcd(p, p') = 1 over ℚ.
 *
 * <p>Fast path (a proof, not a heuristic): let P be the primitive integer multiple of p and q a
 * prime not dividing its leading coefficient. A common factor g of P and P' over ℚ can be taken
 * primitive in ℤ[x] (Gauss's lemma); its leading coefficient divides that of P, so g mod q keeps its
 * degree and divides both P mod q and P' mod q. Hence gcd(P mod q, P' mod q) = 1 in 𝔽_q implies
 * gcd(p, p') = 1. When every prime in {@link #PRIMES} is inconclusive, the exact rational Euclidean
 * algorithm of {@link RationalPolynomial#gcd} decides (slow for high degree).
 */
public final class SquarefreeTest {
    /** Known primes below 2^31, so that products of residues fit in a {@code long}. */
    static final long[] PRIMES = {2_147_483_647L, 2_147_483_563L, 2_147_483_399L, 1_000_000_007L, 998_244_353L};

    private SquarefreeTest() {
    }

    /** Whether gcd(p, p') is a non-zero constant; exact. */
    public static boolean isSquarefree(RationalPolynomial p) {
        BigInteger[] integer = integerMultiple(p);
        int d = integer.length - 1;
        for (long q : PRIMES) {
            Deadline.checkCurrent();
            BigInteger modulus = BigInteger.valueOf(q);
            if (integer[d].mod(modulus).signum() == 0) {
                continue;
            }
            long[] f = new long[d + 1];
            long[] df = new long[d];
            for (int i = 0; i <= d; i++) {
                f[i] = integer[i].mod(modulus).longValue();
                if (i > 0) {
                    df[i - 1] = f[i] * i % q;
                }
            }
            if (degree(gcd(f, df, q)) == 0) {
                return true;
            }
        }
        return p.gcd(p.derivative()).degree() == 0;
    }

    /** The coefficients of lcm(denominators)·p, an integer polynomial with the same roots. */
    private static BigInteger[] integerMultiple(RationalPolynomial p) {
        BigInteger lcm = BigInteger.ONE;
        for (Rational c : p.coefficients()) {
            BigInteger den = c.denominator();
            lcm = lcm.divide(lcm.gcd(den)).multiply(den);
        }
        BigInteger[] result = new BigInteger[p.degree() + 1];
        for (int i = 0; i < result.length; i++) {
            Rational c = p.coefficient(i);
            result[i] = c.numerator().multiply(lcm.divide(c.denominator()));
        }
        return result;
    }

    /** Euclid's algorithm in 𝔽_q; arrays are ascending coefficients and are consumed. */
    private static long[] gcd(long[] a, long[] b, long q) {
        while (degree(b) >= 0) {
            long[] r = remainder(a, b, q);
            a = b;
            b = r;
        }
        return a;
    }

    private static long[] remainder(long[] a, long[] b, long q) {
        long[] r = a.clone();
        int db = degree(b);
        long inverse = BigInteger.valueOf(b[db]).modInverse(BigInteger.valueOf(q)).longValue();
        for (int i = r.length - 1; i >= db; i--) {
            long factor = r[i] * inverse % q;
            if (factor == 0) {
                continue;
            }
            for (int j = 0; j <= db; j++) {
                r[i - db + j] = Math.floorMod(r[i - db + j] - factor * b[j] % q, q);
            }
        }
        return r;
    }

    /** Degree of a residue polynomial; -1 for zero. */
    private static int degree(long[] a) {
        int d = a.length - 1;
        while (d >= 0 && a[d] == 0) {
            d--;
        }
        return d;
    }
}
