package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Which value requests a solution refuses, with the message the command prints; the analyzer rejects them too. */
class ValueRequestsTest {
    private static Solution solve(String input) {
        return Solver.solve(ProblemParser.parse(input, List.of(), null));
    }

    private static List<Rational> points(String list) {
        return list.isEmpty() ? List.of() : List.of(list.split(",")).stream().map(Rational::parse).toList();
    }

    @ParameterizedTest(name = "[{index}] {0} at {1}")
    @CsvSource(delimiter = '|', value = {
        "x[n+2] = x[n+1] + x[n]|3|values need conditions: the general solution has free constants",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1|10,3/2|value at 3/2: a sequence has values only at integer indices",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1|-3|value at -3: below the first index 0",
        "x[n+1] = x[n] + cos(pi n/4); x[0] = 1|1.5|value at 3/2: a sequence has values only at integer indices",
        "x[n+1] = x[n] + cos(pi n/4); x[0] = 1|-2|value at -2: below the first index 0",
    })
    void refusesWithOneLine(String input, String at, String message) {
        Solution s = solve(input);
        assertEquals(Optional.of(message), ValueRequests.refusal(s, points(at)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Analyzer(10).analyze(s, points(at)));
        assertEquals(message, e.getMessage());
    }

    @ParameterizedTest(name = "[{index}] {0} at {1}")
    @CsvSource(delimiter = '|', value = {
        "y'' + y = 0; y(0) = 1; y'(0) = 0|1|values with all their digits are for sequences: a function's values are irrational in general",
        "x[n+1] = x[n] + cos(pi n/4); x[0] = 1|7|values with all their digits need exact rational values: they lie in Q(√2)",
        "x[n+1] = x[n] + sin(0.3 n); x[0] = 1|7|values with all their digits need exact rational values: the forcing's cos ω, sin ω are transcendental",
        "x[n+2] = x[n+1] + x[n]|3|values with all their digits need exact rational values: the general solution has free constants",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1|1e10|value at 10000000000: indices up to 1000000000 in size are accepted",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1|10,100000000|value at 100000000: about 2.1E+7 digits, more than the 5000000 that a value with all its digits may have",
        "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1|1/2|value at 1/2: a sequence has values only at integer indices",
    })
    void refusesAllDigitsWithOneLine(String input, String at, String message) {
        Solution s = solve(input);
        assertEquals(Optional.of(message), ValueRequests.refusal(s, points(at), true));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Analyzer(10, false, true).analyze(s, points(at)));
        assertEquals(message, e.getMessage());
    }

    /** With all digits the index limit is the value's size: F(10^7) has 2,089,877 digits. */
    @Test
    void acceptsAllDigitsOfLargeSequenceValues() {
        Solution s = solve("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1");
        assertEquals(Optional.empty(), ValueRequests.refusal(s, points("0,10000000"), true));
        assertEquals(Optional.of("value at 10000000: indices up to 1000000 in size are accepted"), ValueRequests.refusal(s, points("10000000")));
    }

    @ParameterizedTest(name = "[{index}] {0} at {1}")
    @CsvSource(delimiter = '|', value = {
        "x[n+2] = x[n+1] + x[n]|''",
        "2x[n+1] = x[n]; x[-2] = 3|-2,0,5",
        "x[n+1] = x[n] + cos(pi n/4); x[0] = 1|0,7",
        "y'' + y = 0; y(0) = 1; y'(0) = 0|-1.5,1/3",
    })
    void acceptsValuesTheSolutionHas(String input, String at) {
        assertEquals(Optional.empty(), ValueRequests.refusal(solve(input), points(at)));
    }
}
