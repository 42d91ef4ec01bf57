package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.ArrayList;
import java.util.List;

/**
 * Exact tests whether every root of a rational polynomial lies strictly inside the stability
 * region: the open left half-plane (Routh–Hurwitz) or the open unit disk (the same test after the
 * bilinear map z = (1 + w)/(1 − w)). Decided in exact rational arithmetic; no root is computed.
 *
 * <p>Routh's criterion as in any control text (common practice): p of degree n with a_n &gt; 0 is
 * Hurwitz iff the n + 1 entries of the first column of its Routh array are all positive; a zero
 * entry means a root on the imaginary axis or in the right half-plane.
 *
 * @since 0.3
 */
public final class StabilityTest {
    private StabilityTest() {
    }

    /**
     * True when every root of p has negative real part (true for a nonzero constant).
     *
     * @throws IllegalArgumentException if p is zero
     */
    public static boolean leftHalfPlane(RationalPolynomial p) {
        if (p.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has every number as a root");
        }
        int n = p.degree();
        RationalPolynomial q = p.leadingCoefficient().signum() < 0 ? p.negate() : p;
        List<Rational> above = row(q, n);
        List<Rational> current = row(q, n - 1);
        for (int i = 0; i < n; i++) {
            if (current.get(0).signum() <= 0) {
                return false;
            }
            List<Rational> next = new ArrayList<>();
            for (int j = 0; j + 1 < Math.max(above.size(), current.size() + 1); j++) {
                Rational a = j + 1 < above.size() ? above.get(j + 1) : Rational.ZERO;
                Rational b = j + 1 < current.size() ? current.get(j + 1) : Rational.ZERO;
                next.add(current.get(0).multiply(a).subtract(above.get(0).multiply(b)).divide(current.get(0)));
            }
            if (next.isEmpty()) {
                next.add(Rational.ZERO);
            }
            above = current;
            current = next;
        }
        return true;
    }

    /**
     * True when every root of p has modulus below 1 (true for a nonzero constant).
     *
     * @throws IllegalArgumentException if p is zero
     */
    public static boolean unitDisk(RationalPolynomial p) {
        if (p.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has every number as a root");
        }
        if (p.evaluate(Rational.MINUS_ONE).isZero()) {
            return false;
        }
        // q(w) = (1 - w)^n p((1 + w)/(1 - w)) = Σ a_k (1 + w)^k (1 - w)^(n - k), of degree n since p(-1) ≠ 0
        int n = p.degree();
        RationalPolynomial plus = RationalPolynomial.ofIntegers(1, 1);
        RationalPolynomial minus = RationalPolynomial.ofIntegers(1, -1);
        RationalPolynomial q = RationalPolynomial.ZERO;
        for (int k = 0; k <= n; k++) {
            q = q.add(plus.pow(k).multiply(minus.pow(n - k)).multiply(p.coefficient(k)));
        }
        return leftHalfPlane(q);
    }

    /** a_d, a_{d-2}, a_{d-4}, … (one row of the Routh array). */
    private static List<Rational> row(RationalPolynomial p, int d) {
        List<Rational> r = new ArrayList<>();
        for (int j = d; j >= 0; j -= 2) {
            r.add(p.coefficient(j));
        }
        if (r.isEmpty()) {
            r.add(Rational.ZERO);
        }
        return r;
    }
}
