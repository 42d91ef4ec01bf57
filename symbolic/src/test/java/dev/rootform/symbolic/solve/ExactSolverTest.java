package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ExactSolverTest {
    private static List<Rational> ints(long... v) {
        List<Rational> r = new ArrayList<>();
        for (long x : v) {
            r.add(Rational.of(x));
        }
        return r;
    }

    private static ExactSolution solve(LinearEquation eq, List<Condition> conditions) {
        RationalPolynomial chi = eq.characteristicPolynomial();
        InitialState state = ConditionFitter.fit(eq, chi, conditions, ForcingPart.RATIONAL);
        ExactSolution s = ExactSolver.solve(eq, ForcingPart.RATIONAL, chi, JasFactorizer.factor(chi), state);
        for (Check c : ExactVerifier.verify(s, conditions)) {
            assertTrue(c.passed(), c.name() + ": " + c.detail());
        }
        return s;
    }

    private static Condition at(long n, long value) {
        return new Condition(0, Rational.of(n), Rational.of(value));
    }

    @Test
    void fibonacciFromConditionsAtOneAndTwo() {
        // F(n+2) = F(n+1) + F(n), F(1) = F(2) = 1; F(30) = 832040 (OEIS A000045)
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", ints(-1, -1, 1), 0, List.of());
        ExactSolution s = solve(eq, List.of(at(1, 1), at(2, 1)));
        assertEquals(Rational.of(832040), s.valueAt(30));
        assertEquals(Rational.ZERO, s.valueAt(0));
    }

    @Test
    void repeatedRootsAndZeroRoot() {
        // χ = λ(λ-2)^3: x[n+4] = 6x[n+3] - 12x[n+2] + 8x[n+1]; the value x[0] does not propagate
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", ints(0, -8, 12, -6, 1), 0, List.of());
        ExactSolution s = solve(eq, List.of(at(0, 7), at(1, 1), at(2, 0), at(3, 5)));
        assertEquals(1, s.validFrom());
        assertEquals(Rational.of(7), s.valueAt(0));
    }

    @Test
    void negativeIndicesSetTheOrigin() {
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", ints(-1, -1, 1), 0, List.of());
        ExactSolution s = solve(eq, List.of(at(-3, 2), at(5, -1)));
        assertEquals(Rational.of(-3), s.origin());
    }

    @Test
    void criticallyDampedOscillator() {
        // y'' + 2y' + y = 0, y(0) = 1, y'(0) = 0 → y = (1 + t)e^{-t} (common practice)
        LinearEquation eq = new LinearEquation(Domain.DIFFERENTIAL, "y", "t", ints(1, 2, 1), 0, List.of());
        ExactSolution s = solve(eq, List.of(new Condition(0, Rational.ZERO, Rational.ONE),
                new Condition(1, Rational.ZERO, Rational.ZERO)));
        Component c = s.components().get(0);
        assertEquals(Rational.ONE, c.coefficients().get(0).coefficient(0));
        assertEquals(Rational.ONE, c.coefficients().get(1).coefficient(0));
    }

    @Test
    void irreducibleQuinticOrderSix() {
        // χ = (λ^5 - λ - 1)(λ + 1)^1: exact for a factor with no radical form
        LinearEquation eq = new LinearEquation(Domain.DIFFERENTIAL, "y", "t", ints(-1, -2, -1, 0, 0, 1, 1), 0, List.of());
        List<Condition> cs = new ArrayList<>();
        for (int d = 0; d < 6; d++) {
            cs.add(new Condition(d, Rational.of(1, 2), Rational.of(d * d - 2, 3)));
        }
        ExactSolution s = solve(eq, cs);
        assertEquals(2, s.components().size());
    }
}
