package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** Power sums of (primitive) roots of unity against the number-theory formulas named in the CSV header. */
class RootsOfUnityPowerSumTest {
    private static final int TERMS = 48;

    @ParameterizedTest(name = "{0} {1}-th roots")
    @CsvFileSource(resources = "/reference/roots-of-unity-power-sums.csv", delimiter = '|')
    void powerSumsMatchTheFormula(String kind, int m, String input) {
        List<Rational> s = SequenceValues.of(input, TERMS);
        for (int n = 0; n < TERMS; n++) {
            long expected = kind.equals("all") ? (n % m == 0 ? m : 0) : ramanujanSum(m, n);
            assertEquals(Rational.of(expected), s.get(n), kind + " " + m + "-th roots, n = " + n);
        }
    }

    /** Hölder's formula c_m(n) = μ(m/g) φ(m) / φ(m/g), g = gcd(m, n). */
    private static long ramanujanSum(int m, int n) {
        int g = BigInteger.valueOf(m).gcd(BigInteger.valueOf(n)).intValueExact();
        return mobius(m / g) * totient(m) / totient(m / g);
    }

    private static int mobius(int n) {
        int rest = n;
        int sign = 1;
        for (int p = 2; p <= rest; p++) {
            if (rest % p == 0) {
                rest /= p;
                if (rest % p == 0) {
                    return 0;
                }
                sign = -sign;
            }
        }
        return sign;
    }

    private static int totient(int n) {
        int count = 0;
        for (int i = 1; i <= n; i++) {
            if (BigInteger.valueOf(i).gcd(BigInteger.valueOf(n)).equals(BigInteger.ONE)) {
                count++;
            }
        }
        return count;
    }
}
