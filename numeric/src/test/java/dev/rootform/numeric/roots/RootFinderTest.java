package dev.rootform.numeric.roots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.testing.RandomPolynomials;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.List;
import java.util.Random;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

class RootFinderTest {

    @Test
    void rootsOfTwoMatchPolarForm() {
        // handbook (roots of a complex number): x^7 = 2 has roots 2^{1/7}·(cos 2πk/7 + i sin 2πk/7)
        int n = 7;
        long[] c = new long[n + 1];
        c[0] = -2;
        c[n] = 1;
        RationalPolynomial p = RationalPolynomial.ofIntegers(c);
        List<Enclosure> roots = new RootFinder(30).roots(p);
        assertEquals(n, roots.size());
        Apfloat modulus = ApfloatMath.pow(new Apfloat(2, 60), new Apfloat(1, 60).divide(new Apfloat(n, 60)));
        for (int k = 0; k < n; k++) {
            Apfloat angle = ApfloatMath.pi(60).multiply(new Apfloat(2 * k, 60)).divide(new Apfloat(n, 60));
            assertExactlyOneContains(roots, decimal(modulus.multiply(ApfloatMath.cos(angle))),
                    decimal(modulus.multiply(ApfloatMath.sin(angle))), "2^{1/7}·ω^" + k);
        }
        Checks.assertCertifiedShape(p, roots, 30);
    }

    @Test
    void ninthCyclotomicPolynomialHasPrimitiveNinthRoots() {
        // handbook identity: Φ_9 = x^6 + x^3 + 1, roots cos(2πk/9) + i sin(2πk/9) with gcd(k, 9) = 1
        RationalPolynomial p = RationalPolynomial.ofIntegers(1, 0, 0, 1, 0, 0, 1);
        List<Enclosure> roots = new RootFinder(40).roots(p);
        for (int k : new int[] {1, 2, 4, 5, 7, 8}) {
            Apfloat angle = ApfloatMath.pi(70).multiply(new Apfloat(2 * k, 70)).divide(new Apfloat(9, 70));
            assertExactlyOneContains(roots, decimal(ApfloatMath.cos(angle)), decimal(ApfloatMath.sin(angle)), "ζ9^" + k);
        }
        assertTrue(roots.stream().noneMatch(Enclosure::isReal), "Φ_9 has no real roots");
        Checks.assertCertifiedShape(p, roots, 40);
    }

    @Test
    void casusIrreducibilisToAThousandDigits() {
        // handbook (trigonometric solution of the cubic): x^3 − 3x + 1 has roots 2cos(2π/9), 2cos(4π/9), 2cos(8π/9)
        RationalPolynomial p = RationalPolynomial.ofIntegers(1, -3, 0, 1);
        List<Enclosure> roots = new RootFinder(1000).roots(p);
        Apfloat pi = ApfloatMath.pi(1030);
        Apfloat two = new Apfloat(2, 1030);
        int[] multiples = {2, 4, 8};
        for (int i = 0; i < 3; i++) {
            BigDecimal expected = decimal(two.multiply(ApfloatMath.cos(pi.multiply(new Apfloat(multiples[i], 1030))
                    .divide(new Apfloat(9, 1030)))));
            assertTrue(roots.get(i).isReal(), "real root " + i);
            assertTrue(roots.get(i).radius().compareTo(BigDecimal.ONE.scaleByPowerOfTen(-1000)) <= 0);
            assertTrue(roots.get(i).re().subtract(expected).abs()
                    .compareTo(roots.get(i).radius().add(BigDecimal.ONE.scaleByPowerOfTen(-1020))) <= 0,
                    "2cos(" + multiples[i] + "π/9)");
        }
        Checks.assertCertifiedShape(p, roots, 1000);
    }

    @Test
    void quinticRealRootMatchesSturmIsolation() {
        // value from an independent exact Sturm isolation of x^5 − x − 1 (its only real root)
        BigDecimal expected = new BigDecimal("1.1673039782614186842560458998548421807205603715255");
        RationalPolynomial p = RationalPolynomial.ofIntegers(-1, -1, 0, 0, 0, 1);
        List<Enclosure> roots = new RootFinder(45).roots(p);
        assertEquals(1, roots.stream().filter(Enclosure::isReal).count(), "one real root");
        Enclosure real = roots.get(0);
        assertTrue(real.isReal());
        assertTrue(real.re().subtract(expected).abs().compareTo(real.radius().add(new BigDecimal("1e-49"))) <= 0);
        Checks.assertCertifiedShape(p, roots, 45);
    }

    @Test
    void wilkinsonPolynomialRootsAreTheIntegers() {
        // common practice: (x−1)(x−2)…(x−20) expanded has the roots 1..20
        RationalPolynomial p = RationalPolynomial.ONE;
        for (int k = 1; k <= 20; k++) {
            p = p.multiply(RationalPolynomial.ofIntegers(-k, 1));
        }
        List<Enclosure> roots = new RootFinder(25).roots(p);
        for (int k = 1; k <= 20; k++) {
            Enclosure e = roots.get(20 - k);
            assertTrue(e.isReal() && e.contains(BigDecimal.valueOf(k), BigDecimal.ZERO), "root " + k);
        }
        Checks.assertCertifiedShape(p, roots, 25);
    }

    @Test
    void tightClusterAroundOne() {
        // from memory: (x−1)^5 = 10^{−30} gives x = 1 + 10^{−6}·(cos 2πk/5 + i sin 2πk/5)
        RationalPolynomial p = RationalPolynomial.ofIntegers(-1, 1).pow(5)
                .subtract(RationalPolynomial.constant(Rational.of(BigInteger.ONE, BigInteger.TEN.pow(30))));
        List<Enclosure> roots = new RootFinder(30).roots(p);
        Apfloat scale = new Apfloat(new BigDecimal("1e-6"), 80);
        for (int k = 0; k < 5; k++) {
            Apfloat angle = ApfloatMath.pi(80).multiply(new Apfloat(2 * k, 80)).divide(new Apfloat(5, 80));
            assertExactlyOneContains(roots, decimal(scale.multiply(ApfloatMath.cos(angle)).add(Apfloat.ONE)),
                    decimal(scale.multiply(ApfloatMath.sin(angle))), "1 + 10^-6·ω^" + k);
        }
        Checks.assertCertifiedShape(p, roots, 30);
    }

    @Test
    void hugeCoefficients() {
        // common practice: random coefficients of size up to 10^50 change nothing in the guarantees
        Random random = new Random(5);
        Rational[] c = new Rational[31];
        for (int i = 0; i < c.length; i++) {
            c[i] = Rational.of(new BigInteger(167, random).subtract(BigInteger.ONE.shiftLeft(166)));
        }
        RationalPolynomial p = RationalPolynomial.of(c);
        List<Enclosure> roots = new RootFinder(40).roots(p);
        assertEquals(30, roots.size());
        Checks.assertCertifiedShape(p, roots, 40);
    }

    @Test
    void degreeTwoHundredRandomPolynomial() {
        // common practice: a seeded random integer polynomial of degree 200
        RationalPolynomial p = randomPolynomial(200, 11);
        List<Enclosure> roots = new RootFinder(30).roots(p);
        assertEquals(200, roots.size());
        Checks.assertCertifiedShape(p, roots, 30);
    }

    @Test
    void linearAndQuadraticCases() {
        // common practice: 3x − 1 has the root 1/3; x^2 + x + 1 has the roots −1/2 ± i·√3/2
        List<Enclosure> third = new RootFinder(20).roots(RationalPolynomial.ofIntegers(-1, 3));
        assertEquals(1, third.size());
        Rational centre = Rational.of(third.get(0).re());
        assertTrue(centre.subtract(Rational.of(1, 3)).abs().compareTo(Rational.of(third.get(0).radius())) <= 0);
        List<Enclosure> roots = new RootFinder(20).roots(RationalPolynomial.ofIntegers(1, 1, 1));
        BigDecimal half = new BigDecimal("-0.5");
        BigDecimal s = new BigDecimal(3).sqrt(new MathContext(40)).divide(BigDecimal.valueOf(2));
        assertExactlyOneContains(roots, half, s, "upper");
        assertExactlyOneContains(roots, half, s.negate(), "lower");
        assertTrue(roots.get(0).im().signum() > 0, "upper half first");
    }

    @Test
    void zeroRootIsExact() {
        // common practice: x^3 − 2x = x(x^2 − 2) has the roots 0, ±√2
        List<Enclosure> roots = new RootFinder(20).roots(RationalPolynomial.ofIntegers(0, -2, 0, 1));
        assertEquals(new Enclosure(BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO), roots.get(1));
        assertTrue(roots.get(0).isReal() && roots.get(2).isReal());
    }

    @Test
    void rejectsNonSquarefreeAndConstants() {
        RationalPolynomial square = RationalPolynomial.ofIntegers(-1, 1).pow(2).multiply(RationalPolynomial.ofIntegers(1, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> new RootFinder(10).roots(square));
        assertThrows(IllegalArgumentException.class, () -> new RootFinder(10).roots(RationalPolynomial.ONE));
        assertThrows(IllegalArgumentException.class, () -> new RootFinder(0));
    }

    @Test
    void modularPrimesArePrime() {
        for (long q : SquarefreeTest.PRIMES) {
            assertTrue(BigInteger.valueOf(q).isProbablePrime(60), q + " is prime");
        }
    }

    static RationalPolynomial randomPolynomial(int degree, long seed) {
        return RationalPolynomial.ofIntegers(RandomPolynomials.integerCoefficients(degree, seed));
    }

    private static void assertExactlyOneContains(List<Enclosure> roots, BigDecimal x, BigDecimal y, String what) {
        BigDecimal slack = new BigDecimal("1e-50");
        long count = roots.stream().filter(e -> new Enclosure(e.re(), e.im(), e.radius().add(slack)).contains(x, y))
                .count();
        assertEquals(1, count, what + " lies in exactly one enclosure");
    }

    private static BigDecimal decimal(Apfloat value) {
        return new BigDecimal(value.toString(false));
    }
}
