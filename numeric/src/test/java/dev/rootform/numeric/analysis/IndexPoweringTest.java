package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.math.MathContext;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Integer-only powering gives the same exact value as number-field arithmetic over Q
 * ({@link ExactSolution#valueAt}, fractions reduced at every step: an independent route to the
 * same sum), in lowest terms, for every kind of component: rational roots with a denominator,
 * surd, complex, repeated, cubic and cyclotomic roots, polynomial and exponential forcing, a first
 * index below 0, and a value 0.
 */
class IndexPoweringTest {
    private static Solution solve(String input) {
        return Solver.solve(ProblemParser.parse(input, List.of(), null));
    }

    @ParameterizedTest(name = "{0} at n = {1}")
    @CsvSource(delimiter = '|', value = {
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1 | 1000",
        "x[n+1] = 241/240 x[n] - 1; x[0] = 100 | 700",
        "x[n+2] = (x[n+1] + x[n])/2; x[0] = 0; x[1] = 1 | 999",
        "x[n+2] = 4x[n+1] - 4x[n]; x[0] = 1; x[1] = 3 | 1001",
        "x[n+3] = 6x[n+2] - 12x[n+1] + 8x[n]; x[0] = 1; x[1] = -1; x[2] = 5/7 | 640",
        "x[n+2] = 2x[n+1] - 3x[n]; x[0] = 1; x[1] = 0 | 777",
        "x[n+3] = x[n+1] + x[n]; x[0] = 3; x[1] = 0; x[2] = 2 | 1500",
        "x[n+1] = 2x[n] + n^2 + 3^n; x[0] = 1 | 600",
        "2x[n+1] = x[n]; x[-2] = 3 | 500",
        "x[n+4] = x[n] + 1; x[0] = 1; x[1] = 2; x[2] = 3; x[3] = 4 | 1003",
        "3x[n+2] = 2x[n+1] + x[n] + 5; x[0] = 1/3; x[1] = -2 | 800",
        "x[n+2] = -x[n]; x[0] = 0; x[1] = 1 | 1000",
        "x[n+2] = 3/4 x[n+1] - 1/8 x[n] + (1/3)^n; x[0] = 2; x[1] = 1/9 | 333",
    })
    void agreesWithNumberFieldArithmetic(String input, long n) {
        ExactSolution s = solve(input).exact().orElseThrow();
        Rational expected = s.valueAt(n);
        ExactDigits got = IndexPowering.value(s, n);
        assertEquals(expected.toString(), got.toString(), input + " at " + n);
        assertEquals(expected, got.toRational());
        assertEquals(expected.signum(), got.signum());
        assertEquals(expected.toBigDecimal(new MathContext(25)), got.toBigDecimal(new MathContext(25)));
    }

    /** The analysis gives all digits when asked: the fraction while small, then powering without it. */
    @Test
    void analyzerGivesAllDigitsWhenAsked() {
        Solution s = solve("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1");
        List<PointValue> values = new Analyzer(20, false, true).values(s, List.of(Rational.of(90), Rational.of(120_000)));
        PointValue small = values.get(0);
        assertEquals("2880067194370816120", small.allDigits().orElseThrow().toString());
        assertEquals(small.exact().orElseThrow().toString(), small.exactText().orElseThrow());
        PointValue large = values.get(1);
        assertTrue(large.exact().isEmpty(), "the binary fraction of F(120000) was computed");
        String digits = large.allDigits().orElseThrow().toString();
        assertEquals(25_079, digits.length(), "F(120000) has floor(120000·log10 φ − log10 √5) + 1 digits");
        assertEquals(0, large.value().compareTo(new java.math.BigDecimal(digits).round(new MathContext(20))));
        assertEquals(s.exact().orElseThrow().valueAt(120_000).toString(), digits);
    }
}
