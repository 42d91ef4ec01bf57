package dev.rootform.symbolic.matrix;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.ArrayList;
import java.util.List;

/**
 * The characteristic polynomial χ(s) = det(sI − A) and the adjugate adj(sI − A) = Σ_k M_k s^k of a
 * square matrix, so that (sI − A)^(-1) = adj(sI − A)/χ(s), by the Faddeev–LeVerrier recursion
 * (exact over Q): N_1 = I, c_{n-1} = −tr(A); N_k = A·N_{k-1} + c_{n-k+1}·I,
 * c_{n-k} = −tr(A·N_k)/k; then adj(sI − A) = Σ_{k=1..n} N_k s^{n-k}. The minimal polynomial is
 * χ divided by the monic gcd of the adjugate's entries (the (n−1)-th determinantal divisor of sI − A).
 *
 * @param matrix A
 * @param characteristic χ, monic of degree n
 * @param adjugate M_0 .. M_{n-1}: the coefficient matrices of adj(sI − A), ascending in s
 * @since 0.3
 */
public record Resolvent(RationalMatrix matrix, RationalPolynomial characteristic, List<RationalMatrix> adjugate) {
    public Resolvent {
        adjugate = List.copyOf(adjugate);
    }

    /** @throws IllegalArgumentException if A is not square or is empty */
    public static Resolvent of(RationalMatrix a) {
        int n = a.rows();
        if (!a.isSquare() || n == 0) {
            throw new IllegalArgumentException("need a non-empty square matrix, got " + a.shape());
        }
        Rational[] c = new Rational[n + 1];
        c[n] = Rational.ONE;
        List<RationalMatrix> descending = new ArrayList<>();
        RationalMatrix identity = RationalMatrix.identity(n);
        RationalMatrix nk = identity;
        for (int k = 1; k <= n; k++) {
            if (k > 1) {
                nk = a.multiply(nk).add(identity.scale(c[n - k + 1]));
            }
            descending.add(nk);
            c[n - k] = a.multiply(nk).trace().divide(Rational.of(k)).negate();
        }
        List<RationalMatrix> ascending = new ArrayList<>();
        for (int k = n - 1; k >= 0; k--) {
            ascending.add(descending.get(k));
        }
        return new Resolvent(a, RationalPolynomial.of(c), ascending);
    }

    public int size() {
        return matrix.rows();
    }

    /** Entry (i, j) of adj(sI − A) as a polynomial in s. */
    public RationalPolynomial adjugateEntry(int i, int j) {
        Rational[] p = new Rational[adjugate.size()];
        for (int k = 0; k < p.length; k++) {
            p[k] = adjugate.get(k).get(i, j);
        }
        return RationalPolynomial.of(p);
    }

    /** The monic polynomial μ of least degree with μ(A) = 0. */
    public RationalPolynomial minimalPolynomial() {
        RationalPolynomial g = RationalPolynomial.ZERO;
        for (int i = 0; i < size() && !(g.degree() == 0); i++) {
            for (int j = 0; j < size(); j++) {
                g = g.gcd(adjugateEntry(i, j));
            }
        }
        return characteristic.divide(g.monic());
    }

    /**
     * True when (sI − A)·adj(sI − A) = χ(s)·I holds exactly, coefficient by coefficient:
     * M_{k-1} − A·M_k = c_k·I for k = 0..n (M_{-1} = M_n = 0).
     */
    public boolean adjugateIdentityHolds() {
        int n = size();
        RationalMatrix zero = RationalMatrix.zero(n, n);
        RationalMatrix identity = RationalMatrix.identity(n);
        for (int k = 0; k <= n; k++) {
            RationalMatrix lower = k == 0 ? zero : adjugate.get(k - 1);
            RationalMatrix upper = k == n ? zero : adjugate.get(k);
            if (!lower.subtract(matrix.multiply(upper)).equals(identity.scale(characteristic.coefficient(k)))) {
                return false;
            }
        }
        return true;
    }

    /** p(A) by Horner's rule. */
    public static RationalMatrix evaluate(RationalPolynomial p, RationalMatrix a) {
        RationalMatrix result = RationalMatrix.zero(a.rows(), a.columns());
        RationalMatrix identity = RationalMatrix.identity(a.rows());
        for (int k = p.degree(); k >= 0; k--) {
            result = a.multiply(result).add(identity.scale(p.coefficient(k)));
        }
        return result;
    }
}
