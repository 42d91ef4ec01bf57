package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** The numeric fallback against exact iteration and closed forms known from elsewhere. */
class NumericFallbackTest {

    private static NumericSolution solve(String input, String... points) {
        Problem p = ProblemParser.parse(input, List.of(), null);
        List<Rational> at = java.util.Arrays.stream(points).map(Rational::parse).toList();
        assertEquals(java.util.Optional.empty(), NumericFallback.refusal(p, at));
        return NumericFallback.solve(p, 30, at, "test");
    }

    private static void assertClose(BigDecimal expected, BigDecimal actual) {
        BigDecimal tolerance = expected.abs().max(BigDecimal.ONE).movePointLeft(28);
        assertTrue(expected.subtract(actual).abs().compareTo(tolerance) <= 0, "expected " + expected + ", got " + actual);
    }

    @Test
    void fibonacciValuesMatchTheSequence() {
        // OEIS A000045: F(10) = 55, F(100) = 354224848179261915075
        NumericSolution s = solve("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "10", "100");
        assertClose(new BigDecimal(55), s.values().get(0).value());
        assertClose(new BigDecimal("354224848179261915075"), s.values().get(1).value());
        assertTrue(s.verified(), s.checks().toString());
        assertEquals(2, s.modes().size());
    }

    @Test
    void repeatedRootsAreFittedWithPowers() {
        // (E - 2)^2 x = 0, x[0] = 1, x[1] = 4: x[n] = (1 + n)·2^n (common practice), x[10] = 11264
        NumericSolution s = solve("x[n+2] = 4x[n+1] - 4x[n]; x[0] = 1; x[1] = 4", "10");
        assertClose(new BigDecimal(11264), s.values().get(0).value());
        assertEquals(2, s.modes().get(0).multiplicity());
        // y'' + 2y' + y = 0, y(0) = 1, y'(0) = 0: y = (1 + t)e^(-t) (common practice), y(2) = 3e^(-2) = 0.40600584970983807568... (exp summed to 40 digits)
        NumericSolution f = solve("y'' + 2y' + y = 0; y(0) = 1; y'(0) = 0", "2");
        assertClose(new BigDecimal("0.406005849709838075681998484917"), f.values().get(0).value());
        assertTrue(f.verified(), f.checks().toString());
    }

    @Test
    void oscillationIsRealWithCosineAndSineParts() {
        // y'' + y = 0, y(0) = 1, y'(0) = 0: y = cos t (common practice); cos 1 = 0.540302305868139717400936607443 (Taylor series summed to 50 digits)
        NumericSolution s = solve("y'' + y = 0; y(0) = 1; y'(0) = 0", "1");
        assertClose(new BigDecimal("0.540302305868139717400936607443"), s.values().get(0).value());
        NumericSolution.Mode pair = s.modes().get(0);
        assertEquals(1, pair.im().signum());
        assertClose(BigDecimal.ONE, pair.cosine().get(0));
        assertClose(BigDecimal.ZERO, pair.sine().get(0));
        assertTrue(s.verified(), s.checks().toString());
    }

    @Test
    void aHighOrderRecurrenceAgreesWithExactIteration() {
        // x[n+40] = x[n+1] + x[n] (χ = λ^40 - λ - 1, irreducible by Selmer's theorem) from x[j] = j + 1
        int k = 40;
        String conditions = IntStream.range(0, k).mapToObj(j -> "x[" + j + "] = " + (j + 1)).collect(Collectors.joining("; "));
        NumericSolution s = solve("x[n+" + k + "] = x[n+1] + x[n]; " + conditions, "200");
        List<BigInteger> x = new ArrayList<>();
        IntStream.range(0, k).forEach(j -> x.add(BigInteger.valueOf(j + 1)));
        for (int n = 0; x.size() <= 200; n++) {
            x.add(x.get(n + 1).add(x.get(n)));
        }
        assertClose(new BigDecimal(x.get(200)), s.values().get(0).value());
        assertTrue(s.verified(), s.checks().toString());
    }

    @Test
    void coversOnlyHomogeneousProblemsWithAFullSetOfConditions() {
        Problem forced = ProblemParser.parse("x[n+1] = 2x[n] + 1; x[0] = 1", List.of(), null);
        assertTrue(NumericFallback.refusal(forced, List.of()).isPresent());
        Problem general = ProblemParser.parse("x[n+2] = x[n+1] + x[n]", List.of(), null);
        assertTrue(NumericFallback.refusal(general, List.of()).isPresent());
        Problem fib = ProblemParser.parse("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", List.of(), null);
        assertTrue(NumericFallback.refusal(fib, List.of(Rational.of(1, 2))).isPresent());
    }
}
