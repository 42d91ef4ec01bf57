package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;

/**
 * Partial fractions of P/χ at the roots of one irreducible factor, exactly in Q(α).
 *
 * <p>Step 1 (over Q, Chinese remainder theorem): with F = f^m and G = χ/F, the part of P/χ that
 * belongs to f is N/F with N = P·G^{-1} mod F. Step 2 (in K = Q(α)): writing f(s) = (s-α)·h(s),
 * N/F = Σ_{i=1..m} B_i/(s-α)^i + (terms regular at α), where B_i is the coefficient of u^{m-i} in
 * the Taylor series of N(α+u)/h(α+u)^m. The Taylor coefficients are Hasse derivatives:
 * N(α+u) = Σ N^[l](α)·u^l and h(α+u) = Σ f^[l+1](α)·u^l, since f(α) = 0.
 *
 * @since 0.1
 */
final class Residues {
    private Residues() {
    }

    /** The Laurent coefficients B_1..B_m of P/χ at a generic root α of {@code factor}, as elements of Q(α). */
    static List<RationalPolynomial> at(Factor factor, RationalPolynomial numerator, RationalPolynomial chi) {
        RationalPolynomial f = factor.polynomial();
        int m = factor.multiplicity();
        RationalPolynomial big = f.pow(m);
        RationalPolynomial cofactor = chi.divide(big);
        RationalPolynomial n = numerator.multiply(inverseModuloPower(cofactor, f, m)).mod(big);
        NumberField k = new NumberField(f);
        List<RationalPolynomial> top = new ArrayList<>(m);
        List<RationalPolynomial> h = new ArrayList<>(m);
        for (int l = 0; l < m; l++) {
            Deadline.checkCurrent();
            top.add(k.evaluate(hasse(n, l)));
            h.add(k.evaluate(hasse(f, l + 1)));
        }
        List<RationalPolynomial> hm = power(k, h, m);
        RationalPolynomial inverseLead = k.inverse(hm.get(0));
        List<RationalPolynomial> e = new ArrayList<>(m);
        for (int l = 0; l < m; l++) {
            Deadline.checkCurrent();
            RationalPolynomial s = top.get(l);
            for (int i = 1; i <= l; i++) {
                s = s.subtract(k.multiply(hm.get(i), e.get(l - i)));
            }
            e.add(k.multiply(s, inverseLead));
        }
        List<RationalPolynomial> b = new ArrayList<>(m);
        for (int i = 1; i <= m; i++) {
            b.add(e.get(m - i));
        }
        return b;
    }

    /**
     * g^{-1} mod f^m, for g coprime to f: the inverse mod f by the extended Euclidean algorithm,
     * then Newton's iteration u ← u·(2 − g·u), which takes g·u ≡ 1 mod f^k to mod f^{2k} (since
     * 1 − g·u' = (1 − g·u)^2; common practice, e.g. J. von zur Gathen and J. Gerhard, Modern Computer
     * Algebra, chapter 9 — chapter from memory). The same unique residue as Euclid's algorithm mod
     * f^m, without its growth of intermediate coefficients at high multiplicity.
     */
    static RationalPolynomial inverseModuloPower(RationalPolynomial g, RationalPolynomial f, int m) {
        RationalPolynomial u = g.inverseModulo(f);
        RationalPolynomial two = RationalPolynomial.constant(Rational.of(2));
        for (int have = 1; have < m; ) {
            Deadline.checkCurrent();
            have = Math.min(2 * have, m);
            RationalPolynomial modulus = f.pow(have);
            RationalPolynomial gu = g.mod(modulus).multiply(u).mod(modulus);
            u = u.multiply(two.subtract(gu)).mod(modulus);
        }
        return u;
    }

    /** The Hasse derivative p^[l](x) = Σ_j p_j·C(j,l)·x^{j-l} = p^(l)(x)/l!. */
    static RationalPolynomial hasse(RationalPolynomial p, int l) {
        Rational[] c = new Rational[Math.max(0, p.degree() - l + 1)];
        Rational binomial = Rational.ONE;
        for (int j = l; j <= p.degree(); j++) {
            c[j - l] = p.coefficient(j).multiply(binomial);
            binomial = binomial.multiply(Rational.of(j + 1, j + 1 - l));
        }
        return RationalPolynomial.of(c);
    }

    /** series^m truncated to the length of series, with coefficients in K. */
    private static List<RationalPolynomial> power(NumberField k, List<RationalPolynomial> series, int m) {
        int len = series.size();
        List<RationalPolynomial> result = new ArrayList<>(len);
        result.add(RationalPolynomial.ONE);
        for (int i = 1; i < len; i++) {
            result.add(RationalPolynomial.ZERO);
        }
        for (int p = 0; p < m; p++) {
            Deadline.checkCurrent();
            List<RationalPolynomial> next = new ArrayList<>(len);
            for (int i = 0; i < len; i++) {
                RationalPolynomial s = RationalPolynomial.ZERO;
                for (int j = 0; j <= i; j++) {
                    s = s.add(k.multiply(result.get(j), series.get(i - j)));
                }
                next.add(s);
            }
            result = next;
        }
        return result;
    }
}
