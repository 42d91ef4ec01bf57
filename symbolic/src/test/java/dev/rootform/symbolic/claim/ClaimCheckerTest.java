package dev.rootform.symbolic.claim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The exact check's parts: residual in closed form, conditions, ranges, e^c as a symbol, and what goes numeric. */
class ClaimCheckerTest {
    private static ClaimFindings check(String problem, String claim) {
        Problem p = ProblemParser.parse(problem, List.of(), null);
        LinearEquation eq = p.equation();
        return ClaimChecker.check(Solver.solve(p), ClaimParser.parse(claim, eq.domain(), eq.function(), eq.variable()));
    }

    @Test
    void theResidualIsGivenInClosedForm() {
        // 3^(n+1) - 2·3^n = 3^n (common practice)
        ClaimFindings f = check("x[n+1] = 2x[n]; x[0] = 1", "3^n");
        assertEquals(Decision.FAILS, f.equation().decision());
        List<Term> residual = f.equation().residual().orElseThrow().terms();
        assertEquals(List.of(new Term.Exponential(new Coefficient.Exact(Surd.of(dev.rootform.symbolic.algebra.Rational.ONE)), 0,
                Surd.of(dev.rootform.symbolic.algebra.Rational.of(3)))), residual);
        assertEquals("1", f.firstMismatch().orElseThrow().at());
    }

    @ParameterizedTest(name = "{1}")
    @CsvSource(delimiter = '|', textBlock = """
        y' = y; y(1) = 1                       | e^(t-1)             | HOLDS
        y' = y; y(1) = 1                       | e^t/e               | HOLDS
        y' = y; y(1) = 1                       | e^t                 | FAILS
        y'' + y = 0; y(1) = 0; y'(1) = 1       | sin(t - 1)          | HOLDS
        y'' + y = 0; y(1) = 0; y'(1) = 1       | sin(t) - sin(1)     | FAILS
        x[n+1] = 2x[n]; x[0] = 1               | 2^n for n >= 3      | HOLDS
        x[n+1] = 2x[n]; x[0] = 1               | 2^n for n >= 1; x[0] = 2 | FAILS
        x[n+2] = 3x[n+1]; x[0] = 5; x[1] = 1   | 3^(n-1) for n >= 1; x[0] = 5 | HOLDS
        y'' + y = 0; y(0) = 0; y(pi/2) = 1     | sin(t)              | HOLDS
        y'' + 9y = 0; y(0) = 8; y'(0) = 18     | 10cos(3t - arctan(3/4)) | HOLDS
        y'' + 9y = 0; y(0) = 8; y'(0) = 18     | 10cos(3t + arctan(3/4)) | FAILS
        y'' + y = 0; y(0) = 0; y(pi/2) = 1     | sin(t) + cos(t)     | FAILS
        y'' + 4y = 0; y(0) = 1; y(pi/8) = 0    | sqrt(2) cos(2t - pi/4) | FAILS
        y'' + 4y = 0; y(0) = 1; y(pi/8) = 0    | sqrt(2) cos(2t + pi/4) | HOLDS
        y'' + 4y = 0; y(0) = 1; y(pi/8) = 0    | cos(2t) - sin(2t)   | HOLDS
        """)
    void decidedExactly(String problem, String claim, Decision verdict) {
        ClaimFindings f = check(problem, claim);
        assertEquals(verdict, f.verdict(), f.toString());
        assertTrue(f.exact(), f.inexact().toString());
    }

    @Test
    void aTranscendentalClaimedValueIsExact() {
        // y(1) of e^t is e: by Lindemann–Weierstrass e^1 is no rational, so the condition fails exactly
        ClaimFindings f = check("y' = y; y(1) = 1", "e^t");
        ConditionFinding c = f.conditions().get(0);
        assertEquals(Decision.FAILS, c.decision());
        assertEquals("e^(1)", c.claimed());
    }

    @Test
    void aConditionOutsideTheClaimedRangeIsNotClaimed() {
        ClaimFindings f = check("x[n+1] = 2x[n]; x[0] = 1", "2^n for n >= 3");
        assertEquals(Decision.UNDECIDED, f.conditions().get(0).decision());
        assertEquals("not claimed", f.conditions().get(0).claimed());
    }

    @ParameterizedTest(name = "{1}")
    @CsvSource(delimiter = '|', textBlock = """
        y'' + y = cos(pi t); y(0) = 0; y'(0) = 0   | (cos(pi t) - cos(t))/(1 - pi^2) | frequency
        y'' + y = 0; y(0) = 0; y(1) = 1            | sin(t)/sin(1)                   | division by a sum
        x[n+1] = x[n]; x[0] = 1                    | pi/pi                           | π appears
        y'' + y = 0; y(0) = 0; y(pi/2) = 1         | t·sin(t)·2/pi                   | π appears
        y'' - y = 0; y(0) = 0; y(pi) = 1           | (e^t - e^(-t))/2                | multiple of π
        """)
    void whatHasNoExactFormIsLeftToTheNumericCheck(String problem, String claim, String reason) {
        ClaimFindings f = check(problem, claim);
        assertEquals(Decision.UNDECIDED, f.verdict());
        assertTrue(f.inexact().orElseThrow().contains(reason), f.inexact().orElseThrow());
    }

    @Test
    void theClaimIsReadBackInTheToolsForm() {
        ClaimFindings f = check("y'' + 9y = 0; y(0) = 1; y'(0) = 3", "sqrt(2) cos(3t - pi/4)");
        Term.Oscillating t = (Term.Oscillating) f.asRead().orElseThrow().terms().get(0);
        assertEquals(new Coefficient.Exact(Surd.of(dev.rootform.symbolic.algebra.Rational.ONE)), t.cosine());
        assertEquals(new Coefficient.Exact(Surd.of(dev.rootform.symbolic.algebra.Rational.ONE)), t.sine());
    }
}
