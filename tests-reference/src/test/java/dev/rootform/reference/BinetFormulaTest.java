package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import java.math.BigInteger;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * Binet's formula F(n) = (φ^n − ψ^n)/√5 with φ, ψ = (1 ± √5)/2 (J. P. M. Binet, 1843; e.g. Graham,
 * Knuth and Patashnik, Concrete Mathematics, 2nd ed., eq. (6.123) — equation number from memory):
 * the closed form for F(0) = 0, F(1) = 1 must be exactly these two terms.
 */
class BinetFormulaTest {
    private static final BigInteger FIVE = BigInteger.valueOf(5);

    @Test
    void fibonacciClosedFormIsBinetsFormula() {
        Report report = Answers.report("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", 30, List.of());
        List<Term> terms = report.solution().closedForm().terms();
        assertEquals(2, terms.size());
        Set<String> actual = terms.stream().map(t -> {
            Term.Exponential e = (Term.Exponential) t;
            return ((Coefficient.Exact) e.coefficient()).value() + " * (" + e.rate() + ")^n";
        }).collect(Collectors.toSet());
        Surd phi = new Surd(Rational.of(1, 2), Rational.of(1, 2), FIVE);
        Surd psi = new Surd(Rational.of(1, 2), Rational.of(-1, 2), FIVE);
        Surd inverseRoot5 = new Surd(Rational.ZERO, Rational.of(1, 5), FIVE);
        assertEquals(Set.of(inverseRoot5 + " * (" + phi + ")^n", inverseRoot5.negate() + " * (" + psi + ")^n"), actual);
    }

    @Test
    void lucasClosedFormIsPhiToTheNPlusPsiToTheN() {
        // L(n) = φ^n + ψ^n (same source, the Lucas companion of Binet's formula)
        Report report = Answers.report("x[n+2] = x[n+1] + x[n]; x[0] = 2; x[1] = 1", 30, List.of());
        for (Term t : report.solution().closedForm().terms()) {
            assertEquals(Surd.of(Rational.ONE), ((Coefficient.Exact) ((Term.Exponential) t).coefficient()).value());
        }
    }
}
