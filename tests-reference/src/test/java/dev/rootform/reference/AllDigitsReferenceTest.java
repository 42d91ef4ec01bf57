package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.numeric.analysis.ExactDigits;
import dev.rootform.numeric.analysis.PointValue;
import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/**
 * Values with all their digits at indices where the exact fraction has tens of thousands to
 * hundreds of thousands of digits, through the library API, against routes that share nothing with
 * rootform's: fast doubling, plain integer iteration and closed forms derived by hand.
 */
class AllDigitsReferenceTest {
    private static PointValue value(String input, long n) {
        Options options = Options.builder().points(Long.toString(n)).allDigits(true).build();
        Result result = Rootform.solve(SolveRequest.of(input).with(options));
        return result.answer().orElseThrow(() -> new AssertionError(input + ": " + result)).values().get(0);
    }

    /** F(10^6), 208,988 digits, against fast doubling ({@link FastDoubling}). */
    @Test
    void fibonacciAtOneMillion() {
        PointValue v = value("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", 1_000_000);
        String expected = FastDoubling.fibonacci(1_000_000).toString();
        assertEquals(208_988, expected.length());
        assertEquals(expected, v.allDigits().orElseThrow().toString());
        assertEquals(208_988, v.allDigits().orElseThrow().digitCount());
        assertTrue(v.exact().isEmpty(), "the binary fraction was computed");
    }

    /** The Pell numbers P(n) (OEIS A000129: P(n+2) = 2P(n+1) + P(n), 0, 1) at n = 60,000 against integer iteration. */
    @Test
    void pellNumberAgainstIteration() {
        long n = 60_000;
        BigInteger a = BigInteger.ZERO;
        BigInteger b = BigInteger.ONE;
        for (long i = 0; i < n; i++) {
            BigInteger next = b.shiftLeft(1).add(a);
            a = b;
            b = next;
        }
        assertEquals(a.toString(), value("x[n+2] = 2x[n+1] + x[n]; x[0] = 0; x[1] = 1", n).allDigits().orElseThrow().toString());
    }

    /**
     * A balance x[n+1] = (241/240)·x[n] − 1, x[0] = 100: x[n] = 240 − 140·(241/240)^n (by hand: the fixed
     * point is 240). In lowest terms x[n] = (12·240^n − 7·241^n)/(12·240^(n−1)): the common factor 20 of
     * 240 and 140 cancels, and what remains of the numerator is odd and prime to 3 and 5 (241 ≡ 1 mod 3,
     * 5; 7 ≡ 1 mod 3, 2 mod 5). At n = 10,000 both parts have about 23,800 digits.
     */
    @Test
    void rationalRootInLowestTerms() {
        int n = 10_000;
        BigInteger b240 = BigInteger.valueOf(240);
        BigInteger numerator = BigInteger.valueOf(12).multiply(b240.pow(n)).subtract(BigInteger.valueOf(7).multiply(BigInteger.valueOf(241).pow(n)));
        BigInteger denominator = BigInteger.valueOf(12).multiply(b240.pow(n - 1));
        ExactDigits v = value("x[n+1] = 241/240 x[n] - 1; x[0] = 100", n).allDigits().orElseThrow();
        assertEquals(numerator + "/" + denominator, v.toString());
        assertEquals(numerator.toString().length() - 1 + denominator.toString().length(), v.digitCount(), "digits without the sign");
    }

    /** Halving toward 2: x[n+1] = x[n]/2 + 1, x[0] = 0 is the geometric sum 2 − 2^(1−n) = (2^n − 1)/2^(n−1) (common practice). */
    @Test
    void geometricSumInLowestTerms() {
        int n = 100_000;
        BigInteger numerator = BigInteger.ONE.shiftLeft(n).subtract(BigInteger.ONE);
        BigInteger denominator = BigInteger.ONE.shiftLeft(n - 1);
        assertEquals(numerator + "/" + denominator, value("x[n+1] = x[n]/2 + 1; x[0] = 0", n).allDigits().orElseThrow().toString());
    }
}
