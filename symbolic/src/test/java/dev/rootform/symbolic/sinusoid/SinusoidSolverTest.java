package dev.rootform.symbolic.sinusoid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.model.LinearEquation;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;

class SinusoidSolverTest {
    /** A Pythagorean point on the unit circle: ω = arccos(3/5) is not a rational multiple of π (Niven's theorem). */
    private static final Rational C = Rational.of(3, 5);
    private static final Rational S = Rational.of(4, 5);

    private static LinearEquation recurrence(List<Rational> coefficients, ForcingTerm... forcing) {
        return new LinearEquation(Domain.DIFFERENCE, "x", "n", coefficients, 0, List.of(forcing));
    }

    private static ForcingTerm term(int power, Oscillation kind, Rational frequency) {
        return new ForcingTerm(Rational.ONE, power, Rational.ONE, kind, frequency, false);
    }

    private static SinusoidalParticular only(LinearEquation eq) {
        List<SinusoidalParticular> p = SinusoidSolver.particular(eq);
        assertEquals(1, p.size());
        assertTrue(SinusoidSolver.verifies(eq, p.get(0)), "exact residual over Q(c)[s]");
        return p.get(0);
    }

    /**
     * x[n+1] = 0.9·x[n] + sin(0.3n). The steady-state gain of a first-order filter driven at ω is
     * |H(e^{iω})| = 1/|e^{iω} − a| (common practice), so A² + B² = 1/(1 − 2ac + a²), exactly in Q(c)[s].
     */
    @Test
    void firstOrderFilterHasTheSteadyStateGain() {
        Rational a = Rational.of(9, 10);
        LinearEquation eq = recurrence(List.of(a.negate(), Rational.ONE), term(0, Oscillation.SIN, Rational.of(3, 10)));
        SinusoidalParticular p = only(eq);
        TrigNumber A = p.cosine().get(0);
        TrigNumber B = p.sine().get(0);
        RationalFunction distanceSquared = RationalFunction.of(RationalPolynomial.of(Rational.ONE.add(a.multiply(a)), a.multiply(-2)));
        TrigNumber gainSquared = TrigNumber.of(RationalFunction.ONE.divide(distanceSquared));
        assertEquals(gainSquared, A.multiply(A).add(B.multiply(B)));

        // double-precision iteration of the recurrence from x[0] = x_p(0): the transient is zero, so it
        // must follow the closed form (errors decay by 0.9 a step)
        double c = Math.cos(0.3);
        double s = Math.sin(0.3);
        double aCos = approximately(A, c, s);
        double bSin = approximately(B, c, s);
        double x = aCos;
        for (int n = 0; n <= 300; n++) {
            double closed = aCos * Math.cos(0.3 * n) + bSin * Math.sin(0.3 * n);
            assertEquals(closed, x, 1e-12, "n = " + n);
            x = 0.9 * x + Math.sin(0.3 * n);
        }
    }

    /**
     * x[n+2] + x[n] = cos(0.4n), by hand: for x = K·cos(ω(n − 1)), x[n+2] + x[n] =
     * K·(cos(ω(n+1)) + cos(ω(n−1))) = 2K·cos ω·cos(ωn), so K = 1/(2c) and
     * x_p = (c·cos(ωn) + s·sin(ωn))/(2c) = cos(ωn)/2 + (s/(2c))·sin(ωn) (derived here).
     */
    @Test
    void undampedSecondOrderMatchesTheHandDerivation() {
        LinearEquation eq = recurrence(List.of(Rational.ONE, Rational.ZERO, Rational.ONE),
                term(0, Oscillation.COS, Rational.of(2, 5)));
        SinusoidalParticular p = only(eq);
        assertEquals(TrigNumber.of(Rational.of(1, 2)), p.cosine().get(0));
        TrigNumber expected = TrigNumber.SINE.divide(TrigNumber.COSINE.multiply(TrigNumber.of(Rational.of(2))));
        assertEquals(expected, p.sine().get(0));
        assertEquals("1/2", p.cosine().get(0).toString());
    }

    /**
     * x[n+1] = 3x[n] + n·sin(1.5n): the identity of Q(c)[s] holds at every point of the circle where
     * no denominator vanishes, so at (3/5, 4/5) exact rational iteration of cos(ωn), sin(ωn) by the
     * rotation (angle addition, a handbook identity) must give a zero residual.
     */
    @Test
    void polynomialAmplitudeHasZeroResidualAtARationalPointOfTheCircle() {
        LinearEquation eq = recurrence(List.of(Rational.of(-3), Rational.ONE), term(1, Oscillation.SIN, Rational.of(3, 2)));
        SinusoidalParticular p = only(eq);
        assertEquals(1, p.degree());
        Rational cosN = Rational.ONE;
        Rational sinN = Rational.ZERO;
        for (long n = 0; n < 25; n++) {
            Rational cosNext = cosN.multiply(C).subtract(sinN.multiply(S));
            Rational sinNext = sinN.multiply(C).add(cosN.multiply(S));
            Rational residual = p.value(n + 1, C, S, cosNext, sinNext).subtract(p.value(n, C, S, cosN, sinN).multiply(3));
            assertEquals(sinN.multiply(n), residual, "n = " + n);
            cosN = cosNext;
            sinN = sinNext;
        }
        // and at ω = 1.5 itself, in double precision
        double c = Math.cos(1.5);
        double s = Math.sin(1.5);
        for (int n = 0; n < 40; n++) {
            double residual = doubleValue(p, n + 1, c, s) - 3 * doubleValue(p, n, c, s);
            assertEquals(n * Math.sin(1.5 * n), residual, 1e-9 * Math.max(1, n));
        }
    }

    @Test
    void mixedShiftsAndTwoFrequenciesGiveOneSolutionEach() {
        // x[n] - x[n-1]/2 = cos(0.3n) + sin(0.7n), written with shift -1
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", List.of(Rational.of(-1, 2), Rational.ONE), -1,
                List.of(term(0, Oscillation.COS, Rational.of(3, 10)), term(0, Oscillation.SIN, Rational.of(7, 10))));
        List<SinusoidalParticular> p = SinusoidSolver.particular(eq);
        assertEquals(2, p.size());
        p.forEach(q -> assertTrue(SinusoidSolver.verifies(eq, q)));
    }

    private static double approximately(TrigNumber t, double c, double s) {
        return t.evaluate(Rational.of(new BigDecimal(c)), Rational.of(new BigDecimal(s))).doubleValue();
    }

    private static double doubleValue(SinusoidalParticular p, int n, double c, double s) {
        double sum = 0;
        for (int j = 0; j <= p.degree(); j++) {
            sum += Math.pow(n, j) * (approximately(p.cosine().get(j), c, s) * Math.cos(p.frequency().doubleValue() * n)
                    + approximately(p.sine().get(j), c, s) * Math.sin(p.frequency().doubleValue() * n));
        }
        return sum * Math.pow(p.base().doubleValue(), n);
    }
}
