package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Exact boundary constants and the cos/sin pairs of cyclotomic quartics, through the solver. */
class ExactBoundaryTest {
    private static Solution solve(String input) {
        return Solver.solve(ProblemParser.parse(input, List.of(), null));
    }

    /**
     * y'' + 4y = 0, y(0) = 1, y(π/4) = 3: cos(π/2) = 0, sin(π/2) = 1, so y = cos 2t + 3 sin 2t (common
     * practice).
     */
    @Test
    void rationalConstantsFromAPointAtQuarterPi() {
        Solution s = solve("y'' + 4y = 0; y(0) = 1; y(pi/4) = 3");
        assertTrue(s.verified(), s.checks().toString());
        assertTrue(s.exact().isPresent());
        Term.Oscillating o = (Term.Oscillating) s.closedForm().terms().get(0);
        assertEquals(new Coefficient.Exact(Surd.of(Rational.ONE)), o.cosine());
        assertEquals(new Coefficient.Exact(Surd.of(Rational.of(3))), o.sine());
    }

    /**
     * y'' = 1, y(0) = 0, y(2) = 0 → y = t²/2 − t (common practice); and y'' = 1, y(0) = 0, y'(1) = 0 →
     * t²/2 − t as well (y'(1) = 1 − 1 = 0): y'(0) = −1 either way.
     */
    @Test
    void polynomialBasesAtRationalPoints() {
        for (String input : List.of("y'' = 1; y(0) = 0; y(2) = 0", "y'' = 1; y(0) = 0; y'(1) = 0")) {
            Solution s = solve(input);
            assertTrue(s.verified(), input + ": " + s.checks());
            assertEquals(Rational.MINUS_ONE, s.exact().orElseThrow().derivativeAtOrigin(1), input);
        }
    }

    /**
     * y'' + y = 0, y(π/6) = 1, y(π/3) = 0: with cos(π/6) = √3/2, sin(π/6) = 1/2 (handbook values),
     * y = √3·cos t − sin t (by hand: y(π/6) = 3/2 − 1/2 = 1 and y(π/3) = √3/2 − √3/2 = 0).
     */
    @Test
    void constantsInQSqrt3() {
        Solution s = solve("y'' + y = 0; y(pi/6) = 1; y(pi/3) = 0");
        assertTrue(s.verified(), s.checks().toString());
        assertTrue(s.radical().isPresent());
        assertEquals(3, s.radical().get().radicand());
        Term.Oscillating o = (Term.Oscillating) s.closedForm().terms().get(0);
        assertEquals(new Coefficient.Exact(Surd.sqrt(Rational.of(3))), o.cosine());
        assertEquals(new Coefficient.Exact(Surd.of(Rational.MINUS_ONE)), o.sine());
    }

    /** y'' − y = 0, y(0) = 0, y(1) = 1: sinh(1) is transcendental, so the constants stay free for the numeric layer. */
    @Test
    void transcendentalEntriesStayNumeric() {
        Solution s = solve("y'' - y = 0; y(0) = 0; y(1) = 1");
        assertTrue(s.hasNumericConstants());
        assertFalse(s.closedForm().freeConstants().isEmpty());
    }

    /**
     * x[n+1] = x[n] + cos(πn/4): the forcing's λ^4 + 1 = 0 gives cos/sin pairs at π/4 and 3π/4 (its
     * roots e^(±iπ/4), e^(±3iπ/4)) with coefficients in Q(√2), not a sum over the roots.
     */
    @Test
    void cyclotomicQuarticsBecomeCosSinPairs() {
        ClosedForm f = solve("x[n+1] = x[n] + cos(pi n/4); x[0] = 1").closedForm();
        assertTrue(f.terms().stream().noneMatch(t -> t instanceof Term.ConjugateSum), f.toString());
        assertTrue(f.terms().stream().anyMatch(t -> t instanceof Term.Oscillating o
                && o.angle().equals(new Angle.PiMultiple(Rational.of(1, 4)))), f.toString());
        ClosedForm quartic = solve("x[n+4] = -x[n]; x[0] = 1; x[1] = 0; x[2] = 0; x[3] = 0").closedForm();
        assertEquals(2, quartic.terms().size(), quartic.toString());
        // x[n] = (cos(πn/4) + cos(3πn/4))/2: x[0] = 1 and x[4] = (−1 − 1)/2 = −1 = −x[0] (handbook cos values)
        Term.Oscillating first = (Term.Oscillating) quartic.terms().get(0);
        assertEquals(new Coefficient.Exact(Surd.of(Rational.of(1, 2))), first.cosine());
    }
}
