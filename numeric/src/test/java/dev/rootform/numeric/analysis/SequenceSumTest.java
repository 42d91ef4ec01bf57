package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The mode-by-mode evaluation of sequences at large n agrees with the exact values where those are
 * still cheap (exact number-field arithmetic, an independent route to the same value), for rational,
 * surd, complex, repeated and cubic roots and a first index below 0; and the analysis takes the
 * certified route only once the exact fraction would be large.
 */
class SequenceSumTest {
    private static ExactSolution solve(String input) {
        Solution s = Solver.solve(ProblemParser.parse(input, List.of(), null));
        return s.exact().orElseThrow();
    }

    @ParameterizedTest(name = "{0} at n = {1}")
    @CsvSource(delimiter = '|', value = {
        "x[n+1] = 241/240 x[n] - 1; x[0] = 100 | 3000",
        "x[n+2] = 2x[n+1] + x[n]; x[0] = 1; x[1] = 2 | 2500",
        "x[n+2] = 2x[n+1] - 3x[n]; x[0] = 1; x[1] = 0 | 1777",
        "x[n+2] = 4x[n+1] - 4x[n]; x[0] = 1; x[1] = 3 | 2049",
        "x[n+3] = x[n+1] + x[n]; x[0] = 3; x[1] = 0; x[2] = 2 | 4001",
        "2x[n+1] = x[n]; x[-2] = 3 | 1500",
    })
    void certifiedModesAgreeWithExactValues(String input, long n) {
        ExactSolution s = solve(input);
        RootCache cache = new RootCache();
        Rational exact = s.valueAt(n);
        int digits = 40;
        BigDecimal expected = exact.toBigDecimal(new MathContext(digits));
        long precision = digits + WorkingPrecision.GUARD_DIGITS + 4;
        BigDecimal got = Decimals.toBigDecimal(SequenceSum.of(s, cache, precision).valueAndLargest(n)[0], digits);
        assertEquals(0, expected.compareTo(got), input + " at " + n + ": " + got + " vs " + expected);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "x[n+1] = 241/240 x[n] - 1; x[0] = 100 | 100 | true",
        "x[n+1] = 241/240 x[n] - 1; x[0] = 100 | 100000 | false",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1 | 50000 | true",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1 | 1000000 | false",
    })
    void exactOnlyWhileTheFractionIsSmall(String input, long n, boolean exact) {
        Solution s = Solver.solve(ProblemParser.parse(input, List.of(), null));
        PointValue v = new Analyzer(20).values(s, List.of(Rational.of(n))).get(0);
        assertEquals(exact, v.exact().isPresent(), input + " at " + n);
        assertTrue(v.value().precision() <= 20);
    }
}
