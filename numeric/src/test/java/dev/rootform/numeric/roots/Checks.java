package dev.rootform.numeric.roots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.List;

/** Independent checks of enclosure claims that do not reuse the certificate's code. */
final class Checks {
    private Checks() {
    }

    /**
     * Count, radius bound, canonical order, pairwise disjointness, conjugate pairing, exact sign
     * change of p across every real enclosure, and Vieta's formula Σ roots = −a_{d−1}/a_d within
     * Σ radii (handbook identity).
     */
    static void assertCertifiedShape(RationalPolynomial p, List<Enclosure> roots, int digits) {
        int d = p.degree();
        assertEquals(d, roots.size(), "one enclosure per root");
        BigDecimal target = BigDecimal.ONE.scaleByPowerOfTen(-digits);
        for (int i = 0; i < d; i++) {
            Enclosure e = roots.get(i);
            BigDecimal size = e.re().abs().max(e.im().abs()).max(BigDecimal.ONE);
            assertTrue(e.radius().compareTo(target.multiply(size)) <= 0, "radius bound at " + i);
            if (i > 0) {
                Enclosure previous = roots.get(i - 1);
                int byRe = previous.re().compareTo(e.re());
                assertTrue(byRe > 0 || byRe == 0 && previous.im().compareTo(e.im()) > 0, "order at " + i);
            }
            for (int j = i + 1; j < d; j++) {
                Enclosure f = roots.get(j);
                BigDecimal dx = e.re().subtract(f.re());
                BigDecimal dy = e.im().subtract(f.im());
                BigDecimal sum = e.radius().add(f.radius());
                assertTrue(dx.multiply(dx).add(dy.multiply(dy)).compareTo(sum.multiply(sum)) > 0, "disjoint " + i + "," + j);
            }
            if (e.isReal() && e.radius().signum() > 0) {
                int left = signAt(p, e.re().subtract(e.radius()));
                int right = signAt(p, e.re().add(e.radius()));
                assertTrue(left * right < 0, "sign change across real enclosure " + i);
            } else if (!e.isReal()) {
                BigDecimal re = e.re();
                BigDecimal im = e.im().negate();
                assertEquals(1, roots.stream().filter(f -> f.re().equals(re) && f.im().equals(im)
                        && f.radius().equals(e.radius())).count(), "exact conjugate of " + i);
            }
        }
        Rational expected = p.coefficient(d - 1).negate().divide(p.leadingCoefficient());
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal radii = BigDecimal.ZERO;
        for (Enclosure e : roots) {
            sum = sum.add(e.re());
            radii = radii.add(e.radius());
        }
        BigDecimal error = sum.subtract(expected.toBigDecimal(new MathContext(digits + 40))).abs();
        assertTrue(error.compareTo(radii.add(BigDecimal.ONE.scaleByPowerOfTen(-digits - 30))) <= 0, "Vieta sum");
    }

    /**
     * The exact sign of p(x) for a decimal x = N/D, as the sign of the integer
     * Σ c_i·N^i·D^(d−i) where c = lcm(denominators)·p (homogeneous Horner scheme).
     */
    static int signAt(RationalPolynomial p, BigDecimal x) {
        BigInteger lcm = BigInteger.ONE;
        for (Rational c : p.coefficients()) {
            lcm = lcm.divide(lcm.gcd(c.denominator())).multiply(c.denominator());
        }
        Rational r = Rational.of(x);
        BigInteger n = r.numerator();
        BigInteger den = r.denominator();
        BigInteger power = BigInteger.ONE;
        BigInteger value = BigInteger.ZERO;
        for (int i = p.degree(); i >= 0; i--) {
            Rational c = p.coefficient(i);
            value = value.multiply(n).add(c.numerator().multiply(lcm.divide(c.denominator())).multiply(power));
            power = power.multiply(den);
        }
        return value.signum();
    }
}
