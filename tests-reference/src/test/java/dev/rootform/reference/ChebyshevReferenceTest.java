package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** Chebyshev recurrences at rational points against the handbook identities named in the CSV header. */
class ChebyshevReferenceTest {
    private static final int TERMS = 25;

    @ParameterizedTest(name = "{0}_n({1})")
    @CsvFileSource(resources = "/reference/chebyshev.csv", delimiter = '|')
    void recurrenceMatchesTrigonometricIdentity(String family, String xText) {
        Rational x = Rational.parse(xText);
        Rational first = family.equals("T") ? x : x.multiply(2);
        String input = "c[n+2] = 2*(" + x + ")*c[n+1] - c[n]; c[0] = 1; c[1] = " + first;
        List<Rational> points = new ArrayList<>();
        for (int n = 0; n < TERMS; n++) {
            points.add(Rational.of(n));
        }
        Report report = Answers.report(input, 30, points);
        assertTrue(report.verified(), input);
        double xd = x.doubleValue();
        for (int n = 0; n < TERMS; n++) {
            double expected = family.equals("T") ? chebyshevT(n, xd) : chebyshevU(n, xd);
            double actual = report.values().get(n).exact().orElseThrow().doubleValue();
            assertEquals(expected, actual, 1e-9 * Math.max(1, Math.abs(expected)), family + "_" + n + "(" + x + ")");
        }
    }

    /** A&S 22.3.15: T_n(cos θ) = cos nθ; for x > 1, T_n(cosh φ) = cosh nφ. */
    private static double chebyshevT(int n, double x) {
        if (Math.abs(x) <= 1) {
            return Math.cos(n * Math.acos(x));
        }
        double phi = Math.log(x + Math.sqrt(x * x - 1));
        return Math.cosh(n * phi);
    }

    /** A&S 22.3.16: U_n(cos θ) = sin((n+1)θ)/sin θ; for x > 1, sinh((n+1)φ)/sinh φ; U_n(±1) limits excluded. */
    private static double chebyshevU(int n, double x) {
        if (Math.abs(x) < 1) {
            double theta = Math.acos(x);
            return Math.sin((n + 1) * theta) / Math.sin(theta);
        }
        double phi = Math.log(x + Math.sqrt(x * x - 1));
        return Math.sinh((n + 1) * phi) / Math.sinh(phi);
    }
}
