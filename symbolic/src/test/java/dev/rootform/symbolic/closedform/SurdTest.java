package dev.rootform.symbolic.closedform;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/** Arithmetic in one real quadratic field, and radicals simplified beyond the trial-division limit. */
class SurdTest {
    private static Surd s(long a, long b, long r) {
        return Surd.of(Rational.of(a), Rational.of(b), Rational.of(r));
    }

    @Test
    void arithmeticInQSqrt2() {
        // (1 + √2)(1 − √2) = −1 and (1 + √2)² = 3 + 2√2 (common practice)
        assertEquals(Surd.of(Rational.MINUS_ONE), s(1, 1, 2).multiply(s(1, -1, 2)));
        assertEquals(s(3, 2, 2), s(1, 1, 2).multiply(s(1, 1, 2)));
        assertEquals(s(1, -1, 2).negate(), s(1, 1, 2).inverse());
        assertEquals(s(2, 0, 1), s(1, 1, 2).add(s(1, -1, 2)));
        assertEquals(Surd.of(Rational.of(6)), Surd.sqrt(Rational.of(2)).multiply(Surd.sqrt(Rational.of(18))));
    }

    @Test
    void twoRadicandsAreRefused() {
        assertThrows(ArithmeticException.class, () -> Surd.sqrt(Rational.of(2)).multiply(Surd.sqrt(Rational.of(3))));
        assertThrows(ArithmeticException.class, () -> Surd.of(Rational.ZERO).inverse());
    }

    /** √(2·p²) = p·√2 for the prime p = 1000003, above the trial-division limit (1000003 is prime: common practice). */
    @Test
    void squareOfALargePrimeIsPulledOut() {
        BigInteger p = BigInteger.valueOf(1_000_003);
        Surd root = Surd.sqrt(Rational.of(p.multiply(p).multiply(BigInteger.valueOf(2))));
        assertEquals(BigInteger.TWO, root.radicand());
        assertEquals(Rational.of(p), root.coefficient());
        assertEquals(Surd.of(Rational.of(p)), Surd.sqrt(Rational.of(p.multiply(p))));
    }
}
