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
    void consecutiveValuesAgreeWithOneByOne() {
        // F(0..31), OEIS A000045, from the walk (the origin is 0); the walk against valueAt on repeated, irreducible and zero roots (common practice)
        LinearEquation fib = new LinearEquation(Domain.DIFFERENCE, "x", "n", ints(-1, -1, 1), 0, List.of());
        List<Rational> f = solve(fib, List.of(at(1, 1), at(2, 1))).valuesFromOrigin(32);
        assertEquals(List.of(Rational.of(0), Rational.of(1), Rational.of(1), Rational.of(2), Rational.of(3)), f.subList(0, 5));
        assertEquals(Rational.of(832040), f.get(30));
        assertEquals(Rational.of(1346269), f.get(31));
        // χ = λ(λ-2)^3 (λ^3 - λ - 1)(λ^2 + 1), origin -2
        RationalPolynomial chi = RationalPolynomial.ofIntegers(0, -8, 12, -6, 1)
                .multiply(RationalPolynomial.ofIntegers(-1, -1, 0, 1)).multiply(RationalPolynomial.ofIntegers(1, 0, 1));
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", chi.coefficients(), 0, List.of());
        List<Condition> cs = new ArrayList<>();
        for (int i = 0; i < chi.degree(); i++) {
            cs.add(at(i - 2, (i * 7 % 5) - 2));
        }
        ExactSolution s = solve(eq, cs);
        List<Rational> walked = s.valuesFromOrigin(60);
        for (int i = 0; i < walked.size(); i++) {
            assertEquals(s.valueAt(i - 2), walked.get(i), "x[" + (i - 2) + "]");
        }
    }

    @Test
    void derivativesAtOnceAgreeWithOneByOne() {
        // (D - 1/2)^2 (D^3 - D - 1) D: every derivative of the batch against the single one (common practice)
        RationalPolynomial chi = RationalPolynomial.of(Rational.of(-1, 2), Rational.ONE).pow(2)
                .multiply(RationalPolynomial.ofIntegers(-1, -1, 0, 1)).multiply(RationalPolynomial.X);
        LinearEquation eq = new LinearEquation(Domain.DIFFERENTIAL, "y", "t", chi.coefficients(), 0, List.of());
        List<Condition> cs = new ArrayList<>();
        for (int d = 0; d < chi.degree(); d++) {
            cs.add(new Condition(d, Rational.ZERO, Rational.of(d % 3 - 1, d + 1)));
        }
        ExactSolution s = solve(eq, cs);
        List<Rational> all = s.derivativesAtOrigin(30);
        for (int d = 0; d < all.size(); d++) {
            assertEquals(s.derivativeAtOrigin(d), all.get(d), "derivative " + d);
        }
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
