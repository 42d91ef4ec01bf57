package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * Lucas sequences U_n(P, Q) and V_n(P, Q) solved as text, checked on their exact values against
 * the identities listed in the CSV header (Ribenboim; common practice).
 */
class LucasSequenceTest {
    private static final int TERMS = 25;

    @ParameterizedTest(name = "P = {0}, Q = {1}")
    @CsvFileSource(resources = "/reference/lucas-sequences.csv", delimiter = '|')
    void identitiesHoldOnTheExactValues(long p, long q) {
        List<Rational> u = SequenceValues.of("x[n+2] = " + p + "x[n+1] - (" + q + ")x[n]; x[0] = 0; x[1] = 1", TERMS);
        List<Rational> v = SequenceValues.of("x[n+2] = " + p + "x[n+1] - (" + q + ")x[n]; x[0] = 2; x[1] = " + p, TERMS);
        Rational d = Rational.of(p * p - 4 * q);
        for (int n = 0; 2 * n < TERMS; n++) {
            assertEquals(u.get(2 * n), u.get(n).multiply(v.get(n)), "U_2n = U_n V_n at n = " + n);
            assertEquals(Rational.of(4).multiply(Rational.of(q).pow(n)),
                    v.get(n).multiply(v.get(n)).subtract(d.multiply(u.get(n)).multiply(u.get(n))), "V_n² − D U_n² = 4Q^n at n = " + n);
        }
        double[] alphaBeta = {p / 2.0, Math.sqrt(Math.abs(d.doubleValue())) / 2};
        for (int n = 0; n < TERMS; n++) {
            double expected = powerSum(alphaBeta, d.signum(), n);
            assertEquals(expected, v.get(n).doubleValue(), 1e-9 * Math.max(1, Math.abs(expected)), "V_n = α^n + β^n at n = " + n);
        }
    }

    /** α^n + β^n for α, β = re ± s, with s real (D ≥ 0) or imaginary (D &lt; 0), in doubles. */
    private static double powerSum(double[] alphaBeta, int signOfD, int n) {
        double re = alphaBeta[0];
        double s = alphaBeta[1];
        if (signOfD >= 0) {
            return Math.pow(re + s, n) + Math.pow(re - s, n);
        }
        double radius = Math.hypot(re, s);
        return 2 * Math.pow(radius, n) * Math.cos(n * Math.atan2(s, re));
    }
}
