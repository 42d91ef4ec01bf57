package dev.rootform.symbolic.params;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.ParametricParser;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** Cases of solutions with parameters, against closed forms known from outside rootform. */
class ParametricSolverTest {

    private static ParametricAnswer solve(String equation, String params, String where) {
        List<String> names = ParametricParser.names(params);
        return ParametricSolver.solve(ParametricParser.parse(equation, names, null), Assumptions.parse(where, names));
    }

    private static List<String> conditions(ParametricAnswer a) {
        return a.cases().stream().map(c -> c.when().stream().map(Constraint::toString).collect(Collectors.joining(" and ")))
                .collect(Collectors.toList());
    }

    /** x[n] of a case from its pieces, exactly: Σ c·n^j·X(n) with X_E, X_O by their recurrences. */
    private static Rational sequenceValue(ParametricCase c, Map<String, Rational> at, int n) {
        Rational sum = Rational.ZERO;
        for (ParamPiece p : c.pieces()) {
            ParamMode m = c.modes().get(p.mode());
            PairPowers x = new PairPowers(m.centre(), m.square());
            sum = sum.add(p.even().multiply(x.even(n)).add(p.odd().multiply(x.odd(n))).evaluate(at).multiply(Rational.of(n).pow(p.power())));
        }
        return sum;
    }

    @Test
    void dampingRegimesOfAMassSpringDamper() {
        // m y'' + c y' + k y = 0: underdamped when c² < 4km, critically damped when c = 2√(km), overdamped when
        // c² > 4km (common practice)
        ParametricAnswer a = solve("m y'' + c y' + k y = 0; y(0) = x0; y'(0) = v0", "m,c,k,x0,v0", "m > 0, c >= 0, k > 0");
        assertEquals(List.of("4·m·k > c^2", "4·m·k = c^2", "4·m·k < c^2"), conditions(a));
        assertEquals(List.of(Regime.COMPLEX_PAIR), a.cases().get(0).regimes());
        assertEquals(List.of(Regime.DOUBLE_ROOT), a.cases().get(1).regimes());
        assertEquals(List.of(Regime.REAL_PAIR), a.cases().get(2).regimes());
        assertTrue(a.verified());
        // one formula: y = e^(σt)(x0·C + (v0 − σ·x0)·S) with σ = −c/(2m) (common practice: y(0) = x0, y'(0) = v0)
        ParamPiece piece = a.cases().get(0).pieces().get(0);
        assertEquals("x0", piece.even().toString());
        assertEquals("(2·m·v0 + c·x0)/(2·m)", piece.odd().toString());
        assertEquals("-c/(2·m)", a.cases().get(0).modes().get(0).centre().toString());
    }

    @Test
    void undampedOscillatorHasOnlyTheComplexCase() {
        // y'' + (k/m) y = 0 with k, m > 0 oscillates at √(k/m) (common practice)
        ParametricAnswer a = solve("m y'' + k y = 0; y(0) = 1; y'(0) = 0", "m,k", "m > 0, k > 0");
        assertEquals(1, a.cases().size());
        assertEquals(List.of(Regime.COMPLEX_PAIR), a.cases().get(0).regimes());
        SquareRoot w = a.cases().get(0).scales().get(0).orElseThrow();
        assertEquals("√(m·k)", "√(" + w.inside() + ")");
        assertEquals("1/m", w.outside().toString());
    }

    @Test
    void forcedUndampedOscillatorAndItsResonance() {
        // y'' + k y = F cos(w t), y(0) = y'(0) = 0: F (cos(wt) − cos(√k t))/(k − w²) off resonance and
        // F t sin(wt)/(2w) at k = w² (common practice: the resonance t·sin form)
        ParametricAnswer a = solve("y'' + k y = F cos(w t); y(0) = 0; y'(0) = 0", "k,F,w", "k > 0, w > 0");
        assertEquals(2, a.cases().size());
        assertEquals("w^2 ≠ k", a.cases().get(0).excluded().get(0).toString());
        ParametricCase resonant = a.cases().get(1);
        assertEquals("w^2 = k", resonant.when().get(0).toString());
        assertEquals("k = w^2", resonant.substitution());
        assertEquals(1, resonant.pieces().size());
        ParamPiece p = resonant.pieces().get(0);
        // t·X_O = t·sin(wt)/w, so the coefficient is F/2
        assertEquals(1, p.power());
        assertEquals("0", p.even().toString());
        assertEquals("F/2", p.odd().toString());
        assertTrue(a.verified());
    }

    @Test
    void geometricSeriesWithSymbolicRatio() {
        // x[n+1] = a x[n] + 1, x[0] = 0 gives 1 + a + … + a^(n−1) = (a^n − 1)/(a − 1), and n when a = 1
        // (geometric series, common practice); compared with the sum itself at several ratios
        ParametricAnswer a = solve("x[n+1] = a x[n] + 1; x[0] = 0", "a", "");
        assertEquals(2, a.cases().size());
        assertEquals("a = 1", a.cases().get(1).when().get(0).toString());
        for (Rational ratio : List.of(Rational.of(2), Rational.of(-1, 3), Rational.of(7, 5))) {
            Rational partial = Rational.ZERO;
            for (int n = 0; n < 10; n++) {
                assertEquals(partial, sequenceValue(a.cases().get(0), Map.of("a", ratio), n), "a = " + ratio + ", n = " + n);
                partial = partial.add(ratio.pow(n));
            }
        }
        for (int n = 0; n < 10; n++) {
            assertEquals(Rational.of(n), sequenceValue(a.cases().get(1), Map.of("a", Rational.ONE), n));
        }
    }

    @Test
    void secondOrderRecurrenceAgreesWithExactIteration() {
        // exact rational iteration of x[n+2] = −a1·x[n+1] − a0·x[n] against each regime's formula
        ParametricAnswer a = solve("x[n+2] + a1 x[n+1] + a0 x[n] = 0; x[0] = 1; x[1] = 0", "a1,a0", "");
        List<Map<String, Rational>> points = List.of(Map.of("a1", Rational.of(1), "a0", Rational.of(2)),
                Map.of("a1", Rational.of(2), "a0", Rational.of(1)), Map.of("a1", Rational.of(5), "a0", Rational.of(3, 2)));
        for (int i = 0; i < 3; i++) {
            Map<String, Rational> at = points.get(i);
            ParametricCase c = a.cases().get(i);
            assertTrue(c.holdsAt(at), "case " + (i + 1) + " at " + at);
            Rational x0 = Rational.ONE;
            Rational x1 = Rational.ZERO;
            for (int n = 0; n < 12; n++) {
                assertEquals(x0, sequenceValue(c, at, n), "case " + (i + 1) + ", n = " + n);
                Rational next = at.get("a1").negate().multiply(x1).subtract(at.get("a0").multiply(x0));
                x0 = x1;
                x1 = next;
            }
        }
    }

    @Test
    void generalSolutionCarriesFreeConstants() {
        ParametricAnswer a = solve("y'' + c y' = 0", "c", "c > 0");
        assertEquals(List.of("C1", "C2"), a.cases().get(0).freeConstants());
        assertTrue(a.verified());
    }

    @Test
    void irreducibleCubicIsNamedAndStabilityStillGiven() {
        ParametricAnswer a = solve("y''' + a y'' + b y' + c y = 0", "a,b,c", "");
        assertTrue(a.cases().isEmpty());
        assertTrue(a.notes().get(0).contains("irreducible factor") && a.notes().get(0).contains("degree 3"), a.notes().toString());
        assertEquals(StabilityConditions.Verdict.WHEN, a.stability().verdict());
    }

    @Test
    void wrongNumberOfConditionsIsRefused() {
        InputException e = assertThrows(InputException.class, () -> solve("y'' + k y = 0; y(0) = 1", "k", ""));
        assertTrue(e.getMessage().contains("give 2 conditions"), e.getMessage());
    }
}
