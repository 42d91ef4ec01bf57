package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Boundary-value problems whose system has exact entries get exact constants (no numeric step), and
 * transcendental ones keep the numeric step and its label.
 */
class ExactBoundaryReferenceTest {
    /**
     * A simply supported beam under a uniform load q (here w'''' = q = 0.002 with EI = 1, span L = 10,
     * w = w'' = 0 at both ends): w = q·x·(L³ − 2L·x² + x³)/24, the handbook deflection of a simply
     * supported beam under uniform load (Euler–Bernoulli beam theory, common practice; from memory).
     * Every entry of its system is a power of 0 or 10, so the constants are rational.
     */
    @Test
    void beamWithFourBoundaryConditionsHasRationalConstants() {
        Report r = Answers.report("w'''' = 0.002; w(0) = 0; w''(0) = 0; w(10) = 0; w''(10) = 0", 30,
                List.of(Rational.of(5), Rational.of(5, 2)));
        assertTrue(r.verified(), r.solution().checks() + " " + r.numericChecks());
        assertTrue(r.analysis().constantValues().isEmpty(), "constants fixed numerically: " + r.analysis().constantValues());
        assertTrue(r.solution().exact().isPresent());
        for (int i = 0; i < 2; i++) {
            Rational x = r.values().get(i).at();
            Rational q = Rational.of(1, 500);
            Rational expected = q.multiply(x).multiply(Rational.of(1000).subtract(Rational.of(20).multiply(x).multiply(x))
                    .add(x.multiply(x).multiply(x))).divide(Rational.of(24));
            java.math.MathContext mc = new java.math.MathContext(28);
            assertEquals(0, expected.toBigDecimal(mc).compareTo(r.values().get(i).value().round(mc)), "w(" + x + ")");
        }
        assertEquals("1/12·t - 1/600·t^3 + 1/12000·t^4", Formulas.plain(r.solution().closedForm()));
    }

    /** y'' + y = 0, y(0) = 1, y(π/2) = 2: cos(π/2) = 0 and sin(π/2) = 1 make C1 = 1, C2 = 2 exactly (common practice). */
    @Test
    void pointAtHalfPiGivesExactConstants() {
        Report r = Answers.report("y'' + y = 0; y(0) = 1; y(pi/2) = 2", 30, List.of());
        assertTrue(r.verified());
        assertTrue(r.analysis().constantValues().isEmpty());
        assertEquals("cos(t) + 2·sin(t)", Formulas.plain(r.solution().closedForm()));
    }

    /**
     * y'' + y = 0, y(0) = 0, y(π/4) = 1: sin(π/4) = √2/2 (handbook value), so y = √2·sin t with a
     * constant in Q(√2); the value at t = 1 against √2·sin 1 evaluated with apfloat at 40 digits.
     */
    @Test
    void pointAtQuarterPiGivesAConstantInQSqrt2() {
        Report r = Answers.report("y'' + y = 0; y(0) = 0; y(pi/4) = 1", 30, List.of(Rational.ONE));
        assertTrue(r.verified(), r.solution().checks() + " " + r.numericChecks());
        assertTrue(r.analysis().constantValues().isEmpty());
        assertTrue(r.solution().closedForm().terms().stream().flatMap(t -> t.coefficients().stream())
                .allMatch(c -> c instanceof Coefficient.Exact));
        assertTrue(r.solution().closedForm().terms().stream().flatMap(t -> t.coefficients().stream())
                .anyMatch(c -> ((Coefficient.Exact) c).value().equals(Surd.sqrt(Rational.of(2)))));
        org.apfloat.Apfloat expected = org.apfloat.ApfloatMath.sqrt(new org.apfloat.Apfloat(2, 40))
                .multiply(org.apfloat.ApfloatMath.sin(new org.apfloat.Apfloat(1, 40)));
        assertEquals(0, new java.math.BigDecimal(expected.toString(false)).round(new java.math.MathContext(28))
                .compareTo(r.values().get(0).value().round(new java.math.MathContext(28))), r.values().get(0).value().toString());
    }

    /**
     * y''(x) − 0.01y(x) = 0.05, y(0) = y(4) = 0: the system involves e^(±0.4), which is
     * transcendental (Lindemann), so the constants stay numeric and say so.
     */
    @Test
    void transcendentalEntriesKeepTheNumericStepAndItsLabel() {
        Report r = Answers.report("y''(x) - 0.01y(x) = 0.05; y(0) = 0; y(4) = 0", 30, List.of());
        assertFalse(r.analysis().constantValues().isEmpty());
        String text = dev.rootform.export.document.TextRenderer.render(r);
        assertTrue(text.contains("constants fixed numerically (not exact: their system has transcendental entries"), text);
    }
}
