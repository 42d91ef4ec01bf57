package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.notation.Formulas;
import dev.rootform.export.document.SystemReport;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Rootform.system against outside sources, named beside each check. */
class SystemTest {
    private static SystemReport analysed(SystemRequest request) {
        SystemResult r = Rootform.system(request);
        assertInstanceOf(SystemResult.Analysed.class, r, () -> r.toString());
        return r.answer().orElseThrow();
    }

    private static String entry(SystemReport r, int i, int j) {
        return Formulas.plain(r.transition().entries().get(i).get(j));
    }

    @Test
    void companionFormHasTheKnownTransferFunction() {
        // companion (controllable canonical) form of 1/(s^2 + 2s + 5): common practice
        SystemReport r = analysed(SystemRequest.continuous("[[0,1],[-5,-2]]").withB("[[0],[1]]").withC("[[1,0]]")
                .withInput("step").with(Options.builder().points("1").build()));
        assertEquals(new RationalFunction(RationalPolynomial.ONE, RationalPolynomial.ofIntegers(5, 2, 1)),
                r.transfer().orElseThrow().entries().get(0).get(0));
        assertEquals(2, r.controllabilityRank().getAsInt());
        assertEquals(2, r.observabilityRank().getAsInt());
        assertEquals(Stability.Verdict.ASYMPTOTICALLY_STABLE, r.stability().verdict());
        // final value theorem: step response tends to G(0) = 1/5 (common practice); the steady part is 1/5
        assertTrue(Formulas.plain(r.outputs().get(0).report().solution().closedForm()).endsWith("+ 1/5"));
        assertTrue(r.verified());
    }

    @Test
    void jordanBlockGivesTeTerm() {
        // e^(At) = e^(λt)[[1, t], [0, 1]] for A = [[λ, 1], [0, λ]] (textbook identity, from memory)
        SystemReport r = analysed(SystemRequest.continuous("[[-2,1],[0,-2]]"));
        assertEquals("e^(-2t)", entry(r, 0, 0));
        assertEquals("t·e^(-2t)", entry(r, 0, 1));
        assertEquals("0", entry(r, 1, 0));
        assertEquals("e^(-2t)", entry(r, 1, 1));
        assertEquals(2, r.eigenvalues().get(0).index());
        assertEquals(2, r.eigenvalues().get(0).algebraic());
    }

    @Test
    void rotationGivesCosineAndSine() {
        // e^(At) for A = [[0,1],[-1,0]] is [[cos t, sin t], [-sin t, cos t]] (rotation, from memory)
        SystemReport r = analysed(SystemRequest.continuous("[[0,1],[-1,0]]"));
        assertEquals("cos(t)", entry(r, 0, 0));
        assertEquals("sin(t)", entry(r, 0, 1));
        assertEquals("-sin(t)", entry(r, 1, 0));
        assertEquals(Stability.Verdict.MARGINALLY_STABLE, r.stability().verdict());
    }

    @Test
    void semisimpleZeroEigenvalueIsMarginallyStable() {
        // A = 0: e^(At) = I is bounded although χ = λ^2 has a double root (Lyapunov, textbook, from memory)
        SystemReport r = analysed(SystemRequest.continuous("[[0,0],[0,0]]"));
        assertEquals(Stability.Verdict.MARGINALLY_STABLE, r.stability().verdict());
        assertEquals("1", entry(r, 0, 0));
    }

    @Test
    void fibonacciMatrixPowers() {
        // [[1,1],[1,0]]^n = [[F(n+1), F(n)], [F(n), F(n−1)]]: OEIS A000045; impulse response y[n] = F(n−1), n ≥ 1
        SystemReport r = analysed(SystemRequest.discrete("[[1,1],[1,0]]").withB("[[1],[0]]").withC("[[0,1]]")
                .withInput("impulse").with(Options.builder().points("0", "1", "11", "20").build()));
        assertEquals(Rational.of(6765), r.transition().exact().get(0).get(1).valueAt(20));
        assertEquals(Rational.of(10946), r.transition().exact().get(0).get(0).valueAt(20));
        List<Rational> y = r.values().stream().map(v -> v.output().get(0).exact().orElseThrow()).toList();
        assertEquals(List.of(Rational.ZERO, Rational.ZERO, Rational.of(55), Rational.of(4181)), y);
        assertTrue(r.verified());
    }

    @Test
    void uncontrollableAndUnobservableExamples() {
        // diagonal A with the input on one mode only: rank [B AB] = 1 (Kalman rank test, common practice)
        SystemReport r = analysed(SystemRequest.continuous("[[-1,0],[0,-2]]").withB("[[1],[0]]").withC("[[1,0]]"));
        assertEquals(1, r.controllabilityRank().getAsInt());
        assertEquals(1, r.observabilityRank().getAsInt());
        // the hidden mode cancels: G(s) = 1/(s + 1)
        assertEquals(new RationalFunction(RationalPolynomial.ONE, RationalPolynomial.ofIntegers(1, 1)),
                r.transfer().orElseThrow().entries().get(0).get(0));
    }

    @Test
    void forcedResponseAgreesWithIntegration() {
        // DOP853 (Commons Math) cross-check of x' = Ax + Bu with sin input and an initial state
        SystemReport r = analysed(SystemRequest.continuous("[[0,1,0],[0,0,1],[-6,-11,-6]]").withB("[[0],[0],[1]]")
                .withC("[[1,0,0],[0,1,0]]").withD("[[0],[1]]").withX0("[1,0,-1]").withInput("sin(2t)")
                .with(Options.builder().points("0.5", "3").build()));
        assertTrue(r.checks().stream().anyMatch(c -> c.name().equals("agrees with the state equation") && c.passed()));
        assertEquals(2, r.outputs().size());
        assertTrue(r.verified());
    }

    @Test
    void discreteStepResponseAgreesWithExactIteration() {
        SystemReport r = analysed(SystemRequest.discrete("[[0,1],[-1/4,1]]").withB("[[0],[1]]").withC("[[1,0]]")
                .withInput("step").withX0("[1,-1]").with(Options.builder().points("3", "40").build()));
        assertTrue(r.verified(), r.checks().toString());
        assertEquals(2, r.eigenvalues().get(0).index()); // double eigenvalue 1/2, one Jordan block
    }

    @Test
    void aLargeModelPastItsTimeLimitIsOutOfTime() {
        java.util.Random random = new java.util.Random(3);
        StringBuilder a = new StringBuilder("[");
        for (int i = 0; i < 16; i++) {
            a.append(i == 0 ? "[" : ",[");
            for (int j = 0; j < 16; j++) {
                a.append(j == 0 ? "" : ",").append(random.nextInt(19) - 9);
            }
            a.append(']');
        }
        SystemResult r = Rootform.system(SystemRequest.continuous(a.append(']').toString())
                .with(Options.builder().timeLimit(java.time.Duration.ofMillis(50)).build()));
        assertInstanceOf(Result.OutOfTime.class, assertInstanceOf(SystemResult.NoAnswer.class, r).reason());
    }

    @Test
    void badInputIsRefusedWithTheMatrixNamed() {
        SystemResult r = Rootform.system(SystemRequest.continuous("[[0,1],[-5,\"a\"]]"));
        Result.Refused refused = assertInstanceOf(Result.Refused.class, ((SystemResult.NoAnswer) r).reason());
        assertTrue(refused.message().startsWith("A: entry (2, 2)"), refused.message());
        r = Rootform.system(SystemRequest.continuous("[[0,1],[-5,2]]").withC("[[1,0,0]]"));
        assertTrue(((Result.Refused) ((SystemResult.NoAnswer) r).reason()).message().startsWith("C must have"));
        r = Rootform.system(SystemRequest.continuous("[[0,1],[-5,2]]").withInput("step"));
        assertTrue(((Result.Refused) ((SystemResult.NoAnswer) r).reason()).message().contains("needs B"));
    }
}
