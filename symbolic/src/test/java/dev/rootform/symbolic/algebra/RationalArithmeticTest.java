package dev.rootform.symbolic.algebra;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Sums, products and quotients of rationals (cancelled early, Knuth TAOCP vol. 2 §4.5.1) against the
 * textbook definitions a/b + c/d = (ad + bc)/(bd), (a/b)(c/d) = ac/(bd), (a/b)/(c/d) = ad/(bc), each
 * reduced by one gcd at the end (common practice); seeded random operands with shared prime factors in
 * the denominators, signs, integers and zero.
 */
class RationalArithmeticTest {
    private static final int CASES = 4000;

    @Test
    void earlyCancellingAgreesWithTheDefinitionsInLowestTerms() {
        Random random = new Random(17);
        for (int i = 0; i < CASES; i++) {
            Rational x = random(random);
            Rational y = random(random);
            assertEquals(Rational.of(x.numerator().multiply(y.denominator()).add(y.numerator().multiply(x.denominator())),
                    x.denominator().multiply(y.denominator())), x.add(y), x + " + " + y);
            assertEquals(Rational.of(x.numerator().multiply(y.denominator()).subtract(y.numerator().multiply(x.denominator())),
                    x.denominator().multiply(y.denominator())), x.subtract(y), x + " - " + y);
            assertEquals(Rational.of(x.numerator().multiply(y.numerator()), x.denominator().multiply(y.denominator())), x.multiply(y),
                    x + " * " + y);
            if (!y.isZero()) {
                assertEquals(Rational.of(x.numerator().multiply(y.denominator()), x.denominator().multiply(y.numerator())), x.divide(y),
                        x + " / " + y);
            }
            for (Rational r : new Rational[] {x.add(y), x.multiply(y), y.isZero() ? x : x.divide(y)}) {
                assertEquals(BigInteger.ONE, r.numerator().gcd(r.denominator()), "lowest terms: " + r);
                assertEquals(1, r.denominator().signum(), "positive denominator: " + r);
            }
        }
    }

    @Test
    void gcdInWordsAgreesWithBigIntegers() {
        // the one-word fast path against BigInteger.gcd (common practice), at and around the 62-bit boundary
        Random random = new Random(23);
        long[] edges = {0, 1, 2, 3, (1L << 62) - 1, 1L << 61, (1L << 61) * 3 / 2, 1L << 62, Long.MAX_VALUE};
        for (int i = 0; i < CASES; i++) {
            BigInteger a = BigInteger.valueOf(i < 81 ? edges[i % 9] : random.nextLong() >> random.nextInt(63)).negate();
            BigInteger b = BigInteger.valueOf(i < 81 ? edges[i / 9] : random.nextLong() >> random.nextInt(63));
            if (i % 5 == 0) {
                BigInteger common = BigInteger.valueOf(1 + random.nextInt(1 << 20));
                a = a.multiply(common);
                b = b.multiply(common);
            }
            assertEquals(a.gcd(b), Rational.gcd(a, b), "gcd(" + a + ", " + b + ")");
        }
    }

    @Test
    void doubleOfSmallTermsIsTheDecimalRoundingsDouble() {
        // one double division against rounding through BigDecimal at 40 digits (common practice), numerators and
        // denominators up to 53 bits, dyadic denominators among them
        Random random = new Random(29);
        for (int i = 0; i < CASES; i++) {
            long p = random.nextLong() >> (11 + random.nextInt(52));
            long q = i % 4 == 0 ? 1L << random.nextInt(53) : Math.max(1, (random.nextLong() >>> (11 + random.nextInt(52))));
            Rational r = Rational.of(p, q);
            double expected = new java.math.BigDecimal(r.numerator()).divide(new java.math.BigDecimal(r.denominator()),
                    new java.math.MathContext(40)).doubleValue();
            assertEquals(expected, r.doubleValue(), r.toString());
        }
    }

    @Test
    void divisionByZeroIsRefused() {
        assertThrows(ArithmeticException.class, () -> Rational.ONE.divide(Rational.ZERO));
    }

    /** Numerators and denominators built from small primes (so that denominators share factors), sometimes 0 or an integer. */
    private static Rational random(Random random) {
        int kind = random.nextInt(8);
        if (kind == 0) {
            return Rational.ZERO;
        }
        BigInteger numerator = product(random).multiply(BigInteger.valueOf(random.nextBoolean() ? 1 : -1));
        BigInteger denominator = kind == 1 ? BigInteger.ONE : product(random);
        return Rational.of(numerator, denominator);
    }

    private static BigInteger product(Random random) {
        int[] primes = {2, 3, 5, 7, 240, 241, 1_000_003};
        BigInteger p = BigInteger.ONE;
        for (int i = random.nextInt(12); i > 0; i--) {
            p = p.multiply(BigInteger.valueOf(primes[random.nextInt(primes.length)]));
        }
        return p;
    }
}
