package dev.rootform.numeric.roots;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.math.BigDecimal;
import java.math.MathContext;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

class NewtonPolisherTest {

    @Test
    void doubleSeedsOfTwoThirdsXSquaredMinusOneReachSqrtThreeHalvesToEightyDigits() {
        // (2/3)x^2 - 1 = 0: x = ±√(3/2), checked against BigDecimal's square root (Java SE API) at 100 digits;
        // rational coefficients exercise the scaling to integers
        RationalPolynomial p = RationalPolynomial.of(Rational.MINUS_ONE, Rational.ZERO, Rational.of(2, 3));
        double seed = Math.sqrt(1.5);
        Apcomplex[] z = NewtonPolisher.polish(p, new Apcomplex[] {new Apfloat(seed), new Apfloat(-seed)}, 15, 80);
        BigDecimal root = new BigDecimal("1.5").sqrt(new MathContext(100));
        assertClose(root, z[0].real(), 78);
        assertClose(root.negate(), z[1].real(), 78);
        assertTrue(z[0].imag().signum() == 0 && z[1].imag().signum() == 0, "real seeds stay real");
    }

    @Test
    void complexSeedsOfXSquaredPlusXPlusOneReachPrimitiveCubeRoots() {
        // x^2 + x + 1: the primitive cube roots of unity -1/2 ± i·√3/2 (handbook)
        RationalPolynomial p = RationalPolynomial.ofIntegers(1, 1, 1);
        Apcomplex[] seeds = {new Apcomplex(new Apfloat(-0.5), new Apfloat(0.866)), new Apcomplex(new Apfloat(-0.5), new Apfloat(-0.866))};
        Apcomplex[] z = NewtonPolisher.polish(p, seeds, 3, 60);
        BigDecimal half = new BigDecimal("3").sqrt(new MathContext(80)).divide(BigDecimal.valueOf(2));
        assertClose(new BigDecimal("-0.5"), z[0].real(), 58);
        assertClose(half, z[0].imag(), 58);
        assertClose(half.negate(), z[1].imag(), 58);
    }

    private static void assertClose(BigDecimal expected, Apfloat actual, int digits) {
        BigDecimal difference = new BigDecimal(actual.toString(true)).subtract(expected).abs();
        assertTrue(difference.compareTo(BigDecimal.ONE.scaleByPowerOfTen(-digits)) <= 0,
                "expected " + expected + ", got " + actual + " (difference " + difference + ")");
    }

    @Test
    void sqrtOfTwoByApfloatAgrees() {
        // x^2 - 2 from a 1-digit seed, compared with apfloat's square root
        Apcomplex[] z = NewtonPolisher.polish(RationalPolynomial.ofIntegers(-2, 0, 1), new Apcomplex[] {new Apfloat(1)}, 1, 50);
        assertClose(new BigDecimal(ApfloatMath.sqrt(new Apfloat(2, 70)).toString(true)), z[0].real(), 48);
    }
}
