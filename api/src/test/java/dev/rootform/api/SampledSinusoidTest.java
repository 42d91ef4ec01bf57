package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.CodeNames;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.function.LongFunction;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * Recurrences forced at a frequency that is not a rational multiple of π are solved, verified and
 * evaluated. Reference values: exact rational iteration of the recurrence from its conditions, with
 * cos(ωn) and sin(ωn) computed by apfloat to 60 digits and taken as exact rationals (an independent
 * computation; its only error is the forcing's 60-digit rounding, amplified at most by the growth).
 */
class SampledSinusoidTest {
    private static final int DIGITS = 40;

    private static Rational trig(boolean cosine, Rational omega, long n) {
        Apfloat angle = new Apfloat(omega.toBigDecimal(new MathContext(70)), 70).multiply(new Apfloat(n, 70));
        Apfloat v = cosine ? ApfloatMath.cos(angle) : ApfloatMath.sin(angle);
        return Rational.of(new BigDecimal(v.toString(true)).round(new MathContext(60)));
    }

    /** x[0..last] by x[n+k] = (f(n) − Σ_{j<k} a_j x[n+j]) / a_k from x[0..k−1]. */
    private static List<Rational> iterate(List<Rational> a, List<Rational> start, LongFunction<Rational> forcing, int last) {
        List<Rational> x = new ArrayList<>(start);
        int k = a.size() - 1;
        for (int n = 0; x.size() <= last; n++) {
            Rational sum = forcing.apply(n);
            for (int j = 0; j < k; j++) {
                sum = sum.subtract(a.get(j).multiply(x.get(n + j)));
            }
            x.add(sum.divide(a.get(k)));
        }
        return x;
    }

    private static Result.Solved solved(String problem, String... points) {
        Result r = Rootform.solve(SolveRequest.of(problem).with(Options.builder().digits(DIGITS).points(points).build()));
        Result.Solved s = assertInstanceOf(Result.Solved.class, r, r.toString());
        List<Check> checks = new ArrayList<>(s.report().solution().checks());
        checks.addAll(s.report().numericChecks());
        assertTrue(checks.stream().allMatch(Check::passed), checks.toString());
        assertTrue(checks.stream().anyMatch(c -> c.name().equals("agrees with iteration of the recurrence")), checks.toString());
        return s;
    }

    private static void assertValues(Result.Solved s, List<Rational> reference) {
        for (PointValue v : s.report().values()) {
            BigDecimal expected = reference.get(v.at().toBigInteger().intValueExact()).toBigDecimal(new MathContext(DIGITS));
            BigDecimal tolerance = expected.abs().max(BigDecimal.ONE).movePointLeft(DIGITS - 2);
            assertTrue(v.value().subtract(expected).abs().compareTo(tolerance) <= 0, "x[" + v.at() + "] = " + v.value() + ", iteration " + expected);
        }
    }

    /** The everyday case: a first-order smoothing filter (pole 0.9) driven at 0.3 rad/sample. */
    @Test
    void firstOrderFilterDrivenAtThreeTenthsRadPerSample() {
        Result.Solved s = solved("x[n+1] = 0.9x[n] + sin(0.3n); x[0] = 1", "0", "1", "25", "200");
        Rational w = Rational.of(3, 10);
        assertValues(s, iterate(List.of(Rational.of(-9, 10), Rational.ONE), List.of(Rational.ONE), n -> trig(false, w, n), 200));
        String text = Exporters.byName("text").orElseThrow().render(s.report(), CodeNames.defaults()).text();
        assertTrue(text.contains("cos(3/10)") && text.contains("sin(3/10)"), text);
        String latex = Exporters.byName("latex").orElseThrow().render(s.report(), CodeNames.defaults()).text();
        assertTrue(latex.contains("\\cos\\left(\\frac{3}{10}\\right)"), latex);
    }

    @Test
    void undampedSecondOrderAtFourTenths() {
        Result.Solved s = solved("x[n+2] + x[n] = cos(0.4n); x[0] = 0; x[1] = 0", "2", "17", "100");
        Rational w = Rational.of(2, 5);
        assertValues(s, iterate(List.of(Rational.ONE, Rational.ZERO, Rational.ONE), List.of(Rational.ZERO, Rational.ZERO),
                n -> trig(true, w, n), 100));
    }

    @Test
    void growingRecurrenceWithAPolynomialAmplitude() {
        Result.Solved s = solved("x[n+1] = 3x[n] + n*sin(1.5n); x[0] = 0", "1", "10", "60");
        Rational w = Rational.of(3, 2);
        assertValues(s, iterate(List.of(Rational.of(-3), Rational.ONE), List.of(Rational.ZERO),
                n -> trig(false, w, n).multiply(Rational.of(n)), 60));
    }

    @Test
    void withoutConditionsTheGeneralSolutionIsGiven() {
        Result r = Rootform.solve(SolveRequest.of("x[n+1] = 3x[n] + n*sin(1.5n)"));
        assertEquals(List.of("C1"), assertInstanceOf(Result.General.class, r).report().solution().closedForm().freeConstants());
    }
}
