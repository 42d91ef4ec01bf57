package dev.rootform.symbolic.algebra;

import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The number field K = Q(α) = Q[x]/(f) of a monic irreducible polynomial f of degree d. Elements
 * are represented by their unique residue: a rational polynomial in α of degree &lt; d. All
 * operations are exact. Because every root of f gives an isomorphic field, an identity proved in K
 * holds for every root of f at once; {@link #trace} sums an element over all the roots.
 *
 * <p>Costs: multiplication O(d²) rational operations, by α O(d) ({@link #timesGenerator}); inverse
 * by the extended Euclidean algorithm; {@link #pow} by binary powering, O(d² log e).
 *
 * @since 0.1
 */
public final class NumberField {
    private final RationalPolynomial modulus;
    /** Power sums p_j = Σ α_i^j over the roots of the modulus, j = 0..d-1 (Newton's identities). */
    private final List<Rational> powerSums;

    /**
     * @param modulus monic polynomial of degree &ge; 1, assumed irreducible over Q (the caller's
     *     factorisation guarantees it; inverses fail with ArithmeticException otherwise)
     */
    public NumberField(RationalPolynomial modulus) {
        Objects.requireNonNull(modulus, "modulus");
        if (modulus.degree() < 1 || !modulus.leadingCoefficient().isOne()) {
            throw new IllegalArgumentException("modulus must be monic of degree >= 1: " + modulus);
        }
        this.modulus = modulus;
        this.powerSums = newtonPowerSums(modulus);
    }

    public RationalPolynomial modulus() {
        return modulus;
    }

    public int degree() {
        return modulus.degree();
    }

    /** The element α itself (reduced, so for a linear modulus x - r this is the constant r). */
    public RationalPolynomial generator() {
        return reduce(RationalPolynomial.X);
    }

    /** The residue of an arbitrary rational polynomial in α. */
    public RationalPolynomial reduce(RationalPolynomial p) {
        return p.degree() < degree() ? p : p.mod(modulus);
    }

    public RationalPolynomial multiply(RationalPolynomial a, RationalPolynomial b) {
        return reduce(a.multiply(b));
    }

    /**
     * α·a: the residue shifted up one power, with x^d replaced by −Σ f_l x^l once; O(d) rational
     * operations instead of a product and a division.
     */
    public RationalPolynomial timesGenerator(RationalPolynomial a) {
        RationalPolynomial r = reduce(a);
        int d = degree();
        Rational top = r.coefficient(d - 1);
        Rational[] c = new Rational[d];
        for (int l = 0; l < d; l++) {
            Rational shifted = r.coefficient(l - 1);
            c[l] = top.isZero() ? shifted : shifted.subtract(top.multiply(modulus.coefficient(l)));
        }
        return RationalPolynomial.of(c);
    }

    /** @throws ArithmeticException if {@code a} is zero */
    public RationalPolynomial inverse(RationalPolynomial a) {
        if (a.isZero()) {
            throw new ArithmeticException("zero has no inverse in Q(α)");
        }
        return reduce(a).inverseModulo(modulus);
    }

    /** a^e for any integer e (negative powers need a ≠ 0). */
    public RationalPolynomial pow(RationalPolynomial a, long e) {
        RationalPolynomial base = e < 0 ? inverse(a) : reduce(a);
        long k = Math.abs(e);
        RationalPolynomial result = RationalPolynomial.ONE;
        while (k > 0) {
            Deadline.checkCurrent();
            if ((k & 1) == 1) {
                result = multiply(result, base);
            }
            k >>= 1;
            if (k > 0) {
                base = multiply(base, base);
            }
        }
        return result;
    }

    /** The value of the rational polynomial p at α: p(α) reduced. */
    public RationalPolynomial evaluate(RationalPolynomial p) {
        RationalPolynomial v = RationalPolynomial.ZERO;
        RationalPolynomial alpha = generator();
        for (int i = p.degree(); i >= 0; i--) {
            v = multiply(v, alpha).add(RationalPolynomial.constant(p.coefficient(i)));
        }
        return v;
    }

    /** The trace Tr(a) = Σ over the d roots α_i of f of a(α_i); an exact rational. */
    public Rational trace(RationalPolynomial a) {
        RationalPolynomial r = reduce(a);
        Rational sum = Rational.ZERO;
        for (int j = 0; j <= r.degree(); j++) {
            sum = sum.add(r.coefficient(j).multiply(powerSums.get(j)));
        }
        return sum;
    }

    private static List<Rational> newtonPowerSums(RationalPolynomial f) {
        int d = f.degree();
        // f = x^d + c_{d-1} x^{d-1} + ... ; e_i = (-1)^i c_{d-i}; p_j = Σ_{i<j} (-1)^{i-1} e_i p_{j-i} + (-1)^{j-1} j e_j
        List<Rational> p = new ArrayList<>(d);
        p.add(Rational.of(d));
        for (int j = 1; j < d; j++) {
            Rational s = f.coefficient(d - j).multiply(j).negate();
            for (int i = 1; i < j; i++) {
                s = s.subtract(f.coefficient(d - i).multiply(p.get(j - i)));
            }
            p.add(s);
        }
        return List.copyOf(p);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NumberField k && modulus.equals(k.modulus);
    }

    @Override
    public int hashCode() {
        return modulus.hashCode();
    }

    @Override
    public String toString() {
        return "Q[x]/(" + modulus + ")";
    }
}
