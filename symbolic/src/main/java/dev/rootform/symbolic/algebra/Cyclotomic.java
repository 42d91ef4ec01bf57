package dev.rootform.symbolic.algebra;

import java.util.OptionalInt;

/**
 * Recognises cyclotomic polynomials: a monic irreducible f is the N-th cyclotomic polynomial Φ_N,
 * whose roots are the primitive N-th roots of unity e^{2πik/N} (gcd(k, N) = 1), exactly when N is
 * the least positive integer with x^N ≡ 1 (mod f). Since φ(N) = deg f and φ(N) &ge; √(N/2), it is
 * enough to try N &le; 2·deg(f)² (the elementary bound φ(N) &ge; √(N/2); common practice).
 *
 * @since 0.1
 */
public final class Cyclotomic {
    private Cyclotomic() {
    }

    /** N if {@code f} = Φ_N, else empty. Cost O(d³) rational operations for degree d. */
    public static OptionalInt order(RationalPolynomial f) {
        int d = f.degree();
        if (d < 1 || !f.leadingCoefficient().isOne() || !f.coefficient(0).abs().isOne()) {
            return OptionalInt.empty();
        }
        for (Rational c : f.coefficients()) {
            if (!c.isInteger()) {
                return OptionalInt.empty();
            }
        }
        RationalPolynomial power = RationalPolynomial.ONE;
        for (int n = 1; n <= 2 * d * d + 2; n++) {
            power = power.multiply(RationalPolynomial.X).mod(f);
            if (power.equals(RationalPolynomial.ONE)) {
                return totient(n) == d ? OptionalInt.of(n) : OptionalInt.empty();
            }
        }
        return OptionalInt.empty();
    }

    /** Euler's φ(n). */
    public static int totient(int n) {
        int result = n;
        int m = n;
        for (int p = 2; p * p <= m; p++) {
            if (m % p == 0) {
                while (m % p == 0) {
                    m /= p;
                }
                result -= result / p;
            }
        }
        return m > 1 ? result - result / m : result;
    }

    /** N such that e^{iπq} is a primitive N-th root of unity: q = r/s gives N = 2s/gcd(r, 2s). */
    public static int orderOfPiMultiple(Rational q) {
        java.math.BigInteger r = q.numerator().abs();
        java.math.BigInteger twoS = q.denominator().shiftLeft(1);
        return twoS.divide(r.gcd(twoS)).intValueExact();
    }

    /** Φ_N = (x^N - 1)/Π_{d | N, d < N} Φ_d. */
    public static RationalPolynomial polynomial(int n) {
        RationalPolynomial p = RationalPolynomial.monomial(Rational.ONE, n).subtract(RationalPolynomial.ONE);
        for (int d = 1; d < n; d++) {
            if (n % d == 0) {
                p = p.divide(polynomial(d));
            }
        }
        return p;
    }
}
