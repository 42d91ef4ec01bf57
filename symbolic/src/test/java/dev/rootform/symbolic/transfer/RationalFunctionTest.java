package dev.rootform.symbolic.transfer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class RationalFunctionTest {
    private static RationalPolynomial p(long... c) {
        return RationalPolynomial.ofIntegers(c);
    }

    private static Rational r(String q) {
        return Rational.parse(q);
    }

    @Test
    void reducesToLowestTermsWithMonicDenominator() {
        // (2x + 2)/(4x^2 + 8x + 4) = (1/2)/(x + 1)
        RationalFunction f = new RationalFunction(p(2, 2), p(4, 8, 4));
        assertEquals(RationalPolynomial.constant(r("1/2")), f.numerator());
        assertEquals(p(1, 1), f.denominator());
    }

    @Test
    void lowestTermsNamesTheCancelledFactors() {
        // (x^2 - 1)(x - 2) / ((x - 1)^2 (x + 3)): x - 1 cancels once
        LowestTerms t = RationalFunctions.lowestTerms(p(-1, 0, 1).multiply(p(-2, 1)), p(-1, 1).pow(2).multiply(p(3, 1)));
        assertEquals(List.of(new Factor(p(-1, 1), 1)), t.cancelled());
        assertEquals(new RationalFunction(p(1, 1).multiply(p(-2, 1)), p(-1, 1).multiply(p(3, 1))), t.value());
        assertEquals(List.of(), RationalFunctions.lowestTerms(p(1), p(0, 1)).cancelled());
    }

    @Test
    void arithmeticIsThatOfFunctions() {
        RationalFunction a = new RationalFunction(p(1), p(1, 1));
        RationalFunction b = new RationalFunction(p(1), p(2, 1));
        // 1/(x+1) - 1/(x+2) = 1/((x+1)(x+2))
        assertEquals(new RationalFunction(p(1), p(2, 3, 1)), a.subtract(b));
        assertEquals(RationalFunction.ONE, a.divide(a));
        assertEquals(new RationalFunction(p(1, 1).pow(3), p(1)), a.pow(-3));
        assertThrows(ArithmeticException.class, () -> a.divide(RationalFunction.ZERO));
        // (1/(x+1))' = -1/(x+1)^2
        assertEquals(new RationalFunction(p(-1), p(1, 2, 1)), a.derivative());
    }

    @Test
    void evaluatesExactlyAndReportsPoles() {
        RationalFunction f = new RationalFunction(p(3, 1), p(5, 2, 1));
        assertEquals(r("3/5"), f.evaluate(Rational.ZERO));
        assertThrows(ArithmeticException.class, () -> new RationalFunction(p(1), p(0, 1)).evaluate(Rational.ZERO));
        assertEquals(List.of(new Factor(p(5, 2, 1), 1)), RationalFunctions.poles(f));
        assertEquals(List.of(new Factor(p(3, 1), 1)), RationalFunctions.zeros(f));
        assertEquals(1, f.relativeDegree());
        assertTrue(f.isProper());
    }

    @Test
    void seriesAtInfinityIsLongDivisionInOneOverX() {
        // 1/(x - a) = Σ a^(k-1) x^(-k): the Laplace pair 1/(s - a) <-> e^(at) has derivatives a^k at 0
        // (textbook pair, from memory)
        RationalFunction f = new RationalFunction(p(1), p(-3, 1));
        assertEquals(List.of(r("1"), r("3"), r("9"), r("27")), f.seriesAtInfinity(4));
        // (x^2 + 1)/(x^2 - 1) = 1 + 2/(x^2 - 1): strictly proper part 2x^-2 + 2x^-4 + ...
        RationalFunction g = new RationalFunction(p(1, 0, 1), p(-1, 0, 1));
        assertEquals(RationalPolynomial.ONE, g.polynomialPart());
        assertEquals(List.of(r("0"), r("2"), r("0"), r("2")), g.seriesAtInfinity(4));
    }

    @Test
    void seriesAtZeroGivesFibonacciForOneOverOneMinusXMinusXSquared() {
        // x/(1 - x - x^2) = Σ F(n) x^n, OEIS A000045
        RationalFunction f = new RationalFunction(p(0, 1), p(1, -1, -1));
        assertEquals(List.of(0, 1, 1, 2, 3, 5, 8, 13).stream().map(i -> Rational.of(i)).toList(), f.seriesAtZero(8));
        assertThrows(ArithmeticException.class, () -> new RationalFunction(p(1), p(0, 1)).seriesAtZero(2));
    }

    @Test
    void reciprocalArgumentTurnsZIntoZInverse() {
        // H(z) = (z^2 + z)/(z^2 - 1.5z + 0.56) is (1 + w)/(1 - 1.5w + 0.56w^2) in w = 1/z
        RationalFunction h = new RationalFunction(p(0, 1, 1), RationalPolynomial.of(r("0.56"), r("-1.5"), r("1")));
        RationalFunction w = h.reciprocalArgument();
        assertEquals(new RationalFunction(p(1, 1), RationalPolynomial.of(r("1"), r("-1.5"), r("0.56"))), w);
        assertEquals(h, w.reciprocalArgument());
        assertEquals(new RationalFunction(p(1), p(0, 0, 1)), new RationalFunction(p(0, 0, 1), p(1)).reciprocalArgument());
    }

    @Test
    void partialFractionsRebuildTheFunction() {
        Random random = new Random(11);
        for (int trial = 0; trial < 40; trial++) {
            RationalPolynomial den = RationalPolynomial.ONE;
            for (int f = 0; f < 1 + random.nextInt(3); f++) {
                RationalPolynomial factor = random.nextBoolean() ? p(random.nextInt(7) - 3, 1)
                        : p(1 + random.nextInt(5), random.nextInt(5) - 2, 1);
                den = den.multiply(factor.pow(1 + random.nextInt(3)));
            }
            long[] c = new long[den.degree() + 2];
            for (int i = 0; i < c.length; i++) {
                c[i] = random.nextInt(11) - 5;
            }
            RationalFunction f = new RationalFunction(p(c), den);
            PartialFractions pf = RationalFunctions.partialFractions(f);
            RationalFunction sum = RationalFunction.of(pf.polynomialPart());
            for (PartialFractions.Fraction fr : pf.fractions()) {
                assertTrue(fr.numerator().degree() < fr.factor().degree(), "seed 11 trial " + trial);
                sum = sum.add(new RationalFunction(fr.numerator(), fr.factor().pow(fr.power())));
            }
            assertEquals(f, sum, "seed 11 trial " + trial);
        }
    }

    @Test
    void partialFractionsOfARepeatedPole() {
        // 1/((x+1)^2 (x+2)) = 1/(x+1)^2 - 1/(x+1) + 1/(x+2)  (checked by hand)
        PartialFractions pf = RationalFunctions.partialFractions(new RationalFunction(p(1), p(1, 1).pow(2).multiply(p(2, 1))));
        assertEquals(List.of(new PartialFractions.Fraction(p(1, 1), 1, p(-1)), new PartialFractions.Fraction(p(1, 1), 2, p(1)),
                new PartialFractions.Fraction(p(2, 1), 1, p(1))), pf.fractions());
    }

    @Test
    void stabilityTestsAreExact() {
        // Routh–Hurwitz (common practice): s^3 + 2s^2 + 3s + 1 is stable (2·3 > 1), s^3 + s^2 + s + 2 is not (1·1 < 2)
        assertTrue(StabilityTest.leftHalfPlane(p(1, 3, 2, 1)));
        assertFalse(StabilityTest.leftHalfPlane(p(2, 1, 1, 1)));
        assertFalse(StabilityTest.leftHalfPlane(p(4, 0, 1)));
        assertFalse(StabilityTest.leftHalfPlane(p(0, 1)));
        assertTrue(StabilityTest.leftHalfPlane(p(-3, -1)));
        assertTrue(StabilityTest.leftHalfPlane(p(5)));
        // z^2 - 1.5z + 0.56 = (z - 0.7)(z - 0.8) inside the unit circle; z^2 - z + 1 on it; z + 2 outside
        assertTrue(StabilityTest.unitDisk(RationalPolynomial.of(r("0.56"), r("-1.5"), r("1"))));
        assertFalse(StabilityTest.unitDisk(p(1, -1, 1)));
        assertFalse(StabilityTest.unitDisk(p(2, 1)));
        assertFalse(StabilityTest.unitDisk(p(1, 1)));
        assertTrue(StabilityTest.unitDisk(p(0, 1)));
    }

    @Test
    void stabilityTestsAgreeWithRootsOfRandomProducts() {
        Random random = new Random(7);
        for (int trial = 0; trial < 60; trial++) {
            RationalPolynomial poly = RationalPolynomial.ONE;
            boolean left = true;
            boolean disk = true;
            for (int f = 0; f < 1 + random.nextInt(4); f++) {
                Rational re = Rational.of(random.nextInt(9) - 5, 4);
                if (random.nextBoolean()) {
                    poly = poly.multiply(RationalPolynomial.of(re.negate(), Rational.ONE));
                    left &= re.signum() < 0;
                    disk &= re.abs().compareTo(Rational.ONE) < 0;
                } else {
                    Rational im2 = Rational.of(1 + random.nextInt(8), 16);
                    // (x - re)^2 + im^2
                    poly = poly.multiply(RationalPolynomial.of(re.multiply(re).add(im2), re.multiply(-2), Rational.ONE));
                    left &= re.signum() < 0;
                    disk &= re.multiply(re).add(im2).compareTo(Rational.ONE) < 0;
                }
            }
            assertEquals(left, StabilityTest.leftHalfPlane(poly), "seed 7 trial " + trial + ": " + poly);
            assertEquals(disk, StabilityTest.unitDisk(poly), "seed 7 trial " + trial + ": " + poly);
        }
    }
}
