package dev.rootform.numeric.diagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * An order-7 recurrence and an order-6 ODE whose characteristic polynomials have irreducible
 * quintic and sextic factors: solved, verified, diagnosed and evaluated to 50 digits against
 * independent references (exact iteration; the Taylor series the ODE generates).
 */
class HighOrderTest {
    private static final int DIGITS = 50;

    @Test
    void orderSevenRecurrenceWithAQuintic() {
        // χ = (λ^5 − λ − 1)(λ^2 + λ + 2); λ^5 − λ − 1 is irreducible over Q (from memory: a standard
        // example of a quintic not solvable by radicals); expanded by hand:
        // λ^7 + λ^6 + 2λ^5 − λ^3 − 2λ^2 − 3λ − 2
        Solution s = Solver.solve(ProblemParser.parse(
                "x[n+7] = -x[n+6] - 2x[n+5] + x[n+3] + 2x[n+2] + 3x[n+1] + 2x[n]; x[0]=1; x[1]=0; x[2]=0; x[3]=0; x[4]=0; x[5]=0; x[6]=0",
                List.of(), null));
        assertTrue(s.verified(), s.checks().toString());
        assertTrue(s.roots().stream().anyMatch(r -> r instanceof ExactRoot.Implicit i && i.factor().degree() == 5));
        Analysis a = new Analyzer(DIGITS).analyze(s, List.of(Rational.of(60)));
        long[] c = {2, 3, 2, 1, 0, -2, -1};
        BigInteger[] x = {BigInteger.ONE, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO};
        for (int n = 7; n <= 60; n++) {
            BigInteger next = BigInteger.ZERO;
            for (int j = 0; j < 7; j++) {
                next = next.add(x[j].multiply(BigInteger.valueOf(c[j])));
            }
            System.arraycopy(x, 1, x, 0, 6);
            x[6] = next;
        }
        assertEquals(Rational.of(x[6]), a.values().get(0).exact().orElseThrow());
        assertEquals(Stability.Verdict.UNSTABLE, a.diagnostics().orElseThrow().stability().verdict());
    }

    @Test
    void orderSixOdeWithASextic() {
        // λ^6 + λ + 1 is irreducible over F_2 (from memory: a primitive trinomial), hence over Q
        Solution s = Solver.solve(ProblemParser.parse("y^(6) + y' + y = 0; y(0)=1; y'(0)=0; y''(0)=0; y'''(0)=0; y^(4)(0)=0; y^(5)(0)=0",
                List.of(), null));
        assertTrue(s.verified(), s.checks().toString());
        assertTrue(s.roots().stream().anyMatch(r -> r instanceof ExactRoot.Implicit i && i.factor().degree() == 6));
        Analysis a = new Analyzer(DIGITS).analyze(s, List.of(Rational.of(1, 2)));
        assertTrue(a.checks().stream().allMatch(c -> c.passed()), a.checks().toString());
        BigDecimal expected = taylor(Rational.of(1, 2), 120);
        BigDecimal got = a.values().get(0).value();
        assertTrue(got.subtract(expected).abs().compareTo(new BigDecimal("1e-48")) < 0, got + " vs " + expected);
        // Routh–Hurwitz (common practice): a missing λ^5..λ^2 coefficient rules out asymptotic stability
        assertTrue(a.diagnostics().orElseThrow().stability().verdict() != Stability.Verdict.ASYMPTOTICALLY_STABLE);
    }

    /** Σ_{k<terms} y^(k)(0)·t^k/k! with y^(k+6) = −y^(k+1) − y^(k), exactly, then rounded. */
    private static BigDecimal taylor(Rational t, int terms) {
        Rational[] d = new Rational[terms];
        for (int k = 0; k < terms; k++) {
            d[k] = k == 0 ? Rational.ONE : k < 6 ? Rational.ZERO : d[k - 5].negate().subtract(d[k - 6]);
        }
        Rational sum = Rational.ZERO;
        Rational power = Rational.ONE;
        for (int k = 0; k < terms; k++) {
            sum = sum.add(d[k].multiply(power));
            power = power.multiply(t).divide(Rational.of(k + 1));
        }
        return sum.toBigDecimal(new MathContext(DIGITS + 10));
    }
}
