package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.sinusoid.SinusoidSolver;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Recurrences forced by sampled sinusoids at rational frequencies, solved exactly over
 * Q(cos ω)[sin ω]. The identities of that field are polynomial identities modulo s² + c² − 1, so they
 * hold at every rational point (c, s) of the unit circle where no denominator vanishes; at such a
 * point (a Pythagorean triple) each frequency's part of the fitted solution must solve the recurrence
 * driven by cos/sin of the rotation by (c, s), which exact rational iteration computes independently
 * (angle addition, a handbook identity).
 */
class SinusoidFitTest {
    /** Pythagorean points (3/5, 4/5), (5/13, 12/13), (8/17, 15/17), one per frequency in order (common practice). */
    private static final List<Rational[]> POINTS = List.of(
            new Rational[] {Rational.of(3, 5), Rational.of(4, 5)},
            new Rational[] {Rational.of(5, 13), Rational.of(12, 13)},
            new Rational[] {Rational.of(8, 17), Rational.of(15, 17)});

    private static Solution solve(String text) {
        return Solver.solve(ProblemParser.parse(text, List.of(), null));
    }

    /**
     * Every wave x_ω of the fitted solution, evaluated at a Pythagorean point, solves
     * Σ a_k x[n + shift + k] = (the forcing terms at ω, with cos(ωn), sin(ωn) from the rotation) for
     * n = 0..30, and is 0 at every condition; the rest meets the conditions exactly.
     */
    private static void assertWavesSolveTheRecurrenceAtRationalPoints(Solution solution) {
        assertTrue(solution.verified(), solution.checks().toString());
        SinusoidSolution s = solution.sinusoid().orElseThrow();
        LinearEquation eq = solution.problem().equation();
        for (int w = 0; w < s.waves().size(); w++) {
            SinusoidSolution.Wave wave = s.waves().get(w);
            Rational c = POINTS.get(w)[0];
            Rational sine = POINTS.get(w)[1];
            int steps = 30;
            int span = steps + eq.order() + Math.abs(eq.shift()) + 2;
            Rational[] cos = new Rational[span];
            Rational[] sin = new Rational[span];
            cos[0] = Rational.ONE;
            sin[0] = Rational.ZERO;
            for (int n = 1; n < span; n++) {
                cos[n] = cos[n - 1].multiply(c).subtract(sin[n - 1].multiply(sine));
                sin[n] = sin[n - 1].multiply(c).add(cos[n - 1].multiply(sine));
            }
            for (int n = Math.max(0, -eq.shift()); n < steps; n++) {
                Rational left = Rational.ZERO;
                for (int k = 0; k < eq.coefficients().size(); k++) {
                    left = left.add(eq.coefficients().get(k).multiply(s.waveAt(wave, n + eq.shift() + k).evaluate(c, sine)));
                }
                Rational right = Rational.ZERO;
                for (ForcingTerm t : eq.forcing()) {
                    if (SinusoidSolver.handles(t) && t.frequency().abs().equals(wave.frequency())) {
                        Rational osc = t.oscillation() == ForcingTerm.Oscillation.COS ? cos[n]
                                : sin[n].multiply(Rational.of(t.frequency().signum()));
                        right = right.add(t.coefficient().multiply(Rational.of(n).pow(t.power()))
                                .multiply(t.exponential().pow(n)).multiply(osc));
                    }
                }
                assertEquals(right, left, "wave " + wave.frequency() + ", n = " + n);
            }
            for (long at : s.indices()) {
                assertTrue(s.waveAt(wave, at).isZero(), "wave " + wave.frequency() + " at the condition " + at);
            }
        }
        for (Condition c : solution.problem().conditions()) {
            assertEquals(c.value(), s.rest().valueAt(c.at().toBigInteger().longValueExact()), c.point());
        }
    }

    @Test
    void firstOrderFilterDrivenAtThreeTenths() {
        Solution s = solve("x[n+1] = 0.9x[n] + sin(0.3n); x[0] = 1");
        assertWavesSolveTheRecurrenceAtRationalPoints(s);
        assertTrue(s.exact().isEmpty() && s.radical().isEmpty() && !s.hasNumericConstants());
    }

    /**
     * x[n+2] + x[n] = cos(0.4n), x[0] = x[1] = 0, by hand (derived here): x_p = cos(ωn)/2 +
     * (s/(2c))·sin(ωn); x[0] = 0 gives A = −1/2 for cos(πn/2); x[1] = 0 gives B + (c² + s²)/(2c) = 0,
     * so B = −1/(2c) for sin(πn/2).
     */
    @Test
    void undampedSecondOrderMatchesTheHandDerivation() {
        Solution s = solve("x[n+2] + x[n] = cos(0.4n); x[0] = 0; x[1] = 0");
        assertWavesSolveTheRecurrenceAtRationalPoints(s);
        Term.Oscillating homogeneous = assertInstanceOf(Term.Oscillating.class, s.closedForm().transientTerms().get(0));
        assertEquals(new Coefficient.Exact(Surd.of(Rational.of(-1, 2))), homogeneous.cosine());
        Coefficient.Trig b = assertInstanceOf(Coefficient.Trig.class, homogeneous.sine());
        TrigNumber expected = TrigNumber.of(Rational.of(-1, 2)).divide(TrigNumber.COSINE);
        assertEquals(List.of(new Coefficient.Trig.Part(Rational.of(2, 5), expected, TrigNumber.ZERO)), b.parts());
    }

    @Test
    void polynomialAndGeometricFactorsAndSeveralFrequencies() {
        assertWavesSolveTheRecurrenceAtRationalPoints(solve("x[n+1] = 3x[n] + n*sin(1.5n); x[0] = 2"));
        Solution mixed = solve("x[n+2] - x[n+1] + x[n]/2 = n*0.5^n*cos(0.4n) + sin(0.6n) - 3cos(0.6n) + 2^n + n; x[0] = 0; x[3] = 1");
        assertWavesSolveTheRecurrenceAtRationalPoints(mixed);
        assertEquals(2, mixed.sinusoid().orElseThrow().waves().size());
    }

    /** Lower shifts, a repeated root and a cubic factor (a conjugate sum with coefficients in Q(c)[s]). */
    @Test
    void shiftedRepeatedAndCubicCharacteristics() {
        assertWavesSolveTheRecurrenceAtRationalPoints(solve("x[n] = 2x[n-1] - x[n-2] + cos(2n); x[0] = 1; x[1] = 0"));
        Solution cubic = solve("x[n+3] = x[n+1] + x[n] + sin(0.5n); x[0] = 0; x[1] = 0; x[2] = 1");
        assertWavesSolveTheRecurrenceAtRationalPoints(cubic);
        assertTrue(cubic.closedForm().transientTerms().stream().anyMatch(Term.ConjugateSum.class::isInstance));
    }

    /**
     * A characteristic pair e^{±iθ} close to the forcing's e^{±0.4i} (2cos 0.4 = 1.8421…, here 1.84):
     * exact resonance cannot occur (e^{iω} is transcendental for rational ω ≠ 0 by Lindemann–Weierstrass,
     * while χ has rational coefficients), so the system stays regular however close the two are.
     */
    @Test
    void nearResonanceIsSolvedExactly() {
        assertWavesSolveTheRecurrenceAtRationalPoints(solve("x[n+2] - 1.84x[n+1] + x[n] = cos(0.4n); x[0] = 1; x[1] = 1"));
    }

    @Test
    void generalSolutionKeepsItsFreeConstantAndTheExactParticularPart() {
        Solution s = solve("x[n+1] = 3x[n] + n*sin(1.5n)");
        assertEquals(List.of("C1"), s.closedForm().freeConstants());
        assertTrue(s.sinusoid().isEmpty() && s.verified());
        assertTrue(s.closedForm().particularTerms().stream().allMatch(t -> t.coefficients().stream()
                .allMatch(c -> c instanceof Coefficient.Trig || c.isZero())));
    }

    @Test
    void zeroCharacteristicRootWithConditionsIsRefused() {
        InputException e = assertThrows(InputException.class, () -> solve("x[n+2] = x[n+1] + cos(2n); x[0] = 1; x[1] = 2"));
        assertTrue(e.getMessage().contains("characteristic root 0"), e.getMessage());
    }
}
