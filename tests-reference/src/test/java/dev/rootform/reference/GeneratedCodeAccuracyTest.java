package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.export.code.JavaRenderer;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Term;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.function.Function;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * Generated code (its double formula, which the generated Java evaluates operation for operation,
 * see the export module's GeneratedJavaTest) against values from an independent high-precision
 * computation: the RLC step response inside its 2 ms transient, a third-order step response from
 * rest where the modes cancel near t0, and a recurrence driven at π/4 at n = 10^15.
 */
class GeneratedCodeAccuracyTest {
    private static final long PRECISION = 60;

    /**
     * An RLC stage (τ = 2 ms) driven by a unit step from rest: y'' + 1000y' + 10^6·y = 10^6,
     * y(0) = y'(0) = 0, so y = 1 − e^(−500t)·(cos(500√3·t) + sin(500√3·t)/√3) (roots −500 ± 500√3·i,
     * constants from y(0) = 0 and y'(0) = 0; derived by hand). Reference: apfloat evaluation of that
     * formula at 60 digits.
     */
    @Test
    void rlcStepResponseIsAccurateInsideItsTransient() {
        Report r = Answers.codeReport("y'' + 1000y' + 1000000y = 1000000; y(0) = 0; y'(0) = 0", 30);
        Function<Apfloat, Apfloat> known = t -> {
            Apfloat omega = ApfloatMath.sqrt(new Apfloat(3, PRECISION)).multiply(new Apfloat(500, PRECISION));
            Apfloat wave = ApfloatMath.cos(omega.multiply(t)).add(ApfloatMath.sin(omega.multiply(t))
                    .divide(ApfloatMath.sqrt(new Apfloat(3, PRECISION))));
            return new Apfloat(1, PRECISION).subtract(ApfloatMath.exp(t.multiply(new Apfloat(-500, PRECISION))).multiply(wave));
        };
        for (String t : List.of("1e-8", "1e-7", "1e-6", "1e-5", "1e-4", "0.001", "0.002", "0.005", "0.01", "0.1", "3")) {
            assertRelative(r, t, known, 4e-15);
        }
        CodeFacts facts = r.code().orElseThrow().facts();
        long inTransient = facts.points().stream().filter(p -> p.signum() > 0 && p.compareTo(Rational.of(1, 100)) < 0).count();
        assertTrue(inTransient >= 30, "only " + inTransient + " sample points inside the transient");
        assertTrue(facts.timeScales().contains(0.002), facts.timeScales().toString());
        assertTrue(facts.forward().maxRelativeError() < 1e-14, facts.forward().toString());
        String check = r.numericChecks().stream().filter(c -> c.name().contains("integration")).findFirst().orElseThrow().detail();
        assertTrue(check.contains("0.002"), check);
    }

    /**
     * A third-order step response from rest, (D + 1)^3 y = 1, y = y' = y'' = 0 at 0, so
     * y = 1 − e^(−t)·(1 + t + t²/2) ≈ t³/6 near 0 (by hand: the triple root −1, constants from the
     * three zero derivatives). The closed form is 1 minus terms near 1, which cancel to nothing in
     * double precision; the generated code sums the Taylor series there. Reference: apfloat
     * evaluation of the formula at 60 digits.
     */
    @Test
    void stepResponseFromRestKeepsItsRelativeAccuracyNearT0() {
        Report r = Answers.codeReport("y''' + 3y'' + 3y' + y = 1; y(0) = 0; y'(0) = 0; y''(0) = 0", 30);
        Function<Apfloat, Apfloat> known = t -> {
            Apfloat one = new Apfloat(1, PRECISION);
            Apfloat poly = one.add(t).add(t.multiply(t).divide(new Apfloat(2, PRECISION)));
            return one.subtract(ApfloatMath.exp(t.negate()).multiply(poly));
        };
        for (String t : List.of("1e-9", "1e-6", "1e-5", "1e-3", "0.1", "0.7", "2", "10")) {
            assertRelative(r, t, known, 4e-15);
        }
        assertFalse(r.code().orElseThrow().form().series().isEmpty());
    }

    /**
     * x[n+1] = x[n] + cos(πn/4), x[0] = 1: the forcing sums to 0 over any 8 steps, so x is 8-periodic;
     * its first 8 values come from exact iteration in Q(√2) with cos(kπ/4) ∈ {1, √2/2, 0, −√2/2, −1}
     * (handbook values). The closed form writes λ^4 + 1 as cos/sin pairs, and the code reduces the
     * angle exactly, so n = 10^15 is as accurate as n = 0.
     */
    @Test
    void forcingAtPiOverFourStaysAccurateAtTenToTheFifteen() {
        Report r = Answers.codeReport("x[n+1] = x[n] + cos(pi n/4); x[0] = 1", 30);
        assertTrue(r.solution().closedForm().terms().stream().noneMatch(t -> t instanceof Term.ConjugateSum),
                r.solution().closedForm().toString());
        double[] period = new double[8];
        // x[n] = a + b·√2 by exact iteration: cos(kπ/4) = (c0, c1) meaning c0 + c1·√2
        Rational[][] cos = {{Rational.ONE, Rational.ZERO}, {Rational.ZERO, Rational.of(1, 2)}, {Rational.ZERO, Rational.ZERO},
            {Rational.ZERO, Rational.of(-1, 2)}, {Rational.MINUS_ONE, Rational.ZERO}, {Rational.ZERO, Rational.of(-1, 2)},
            {Rational.ZERO, Rational.ZERO}, {Rational.ZERO, Rational.of(1, 2)}};
        Rational a = Rational.ONE;
        Rational b = Rational.ZERO;
        for (int n = 0; n < 8; n++) {
            period[n] = new BigDecimal(a.doubleValue()).add(new BigDecimal(b.doubleValue()).multiply(BigDecimal.valueOf(2).sqrt(MathContext.DECIMAL128))).doubleValue();
            a = a.add(cos[n][0]);
            b = b.add(cos[n][1]);
        }
        assertEquals(Rational.ONE, a, "the forcing sums to 0 over a period");
        assertEquals(Rational.ZERO, b);
        NumericForm form = r.code().orElseThrow().form();
        assertTrue(form.reduces());
        for (long n : new long[] {0, 5, 1_000_000_000_000_000L, 1_000_000_000_000_003L, 999_999_999_999_999L}) {
            double expected = period[(int) (n % 8)];
            assertEquals(expected, form.valueAt(n), 4e-16 * Math.max(1, Math.abs(expected)), "x[" + n + "]");
        }
        String java = JavaRenderer.render(r, "", "Filter");
        assertTrue(java.contains("MODULUS"), java);
    }

    /**
     * A slow leak, x[n+1] = 0.999999999·x[n] + 1, x[0] = 0, is 10^9·(1 − 0.999999999^n): its two terms
     * cancel at every index of the code's range, so the header states no relative error there (it
     * named n = 0, where the value is 0, before) and its bound in units of L holds against exact
     * rational iteration of the recurrence (reference: the recurrence itself, in exact fractions).
     */
    @Test
    void cancellingTermsOfASequenceAreBoundedInUnitsOfTheirSize() {
        Report r = Answers.codeReport("x[n+1] = 0.999999999 x[n] + 1; x[0] = 0", 30);
        CodeFacts facts = r.code().orElseThrow().facts();
        assertTrue(facts.forward().worstRelativeAt().isEmpty(), facts.forward().toString());
        String java = JavaRenderer.render(r, "", "Leak");
        assertTrue(java.contains("relative error not stated (no sampled value reaches 1/16 of L"), java);
        NumericForm form = r.code().orElseThrow().form();
        Rational rate = Rational.parse("0.999999999");
        Rational x = Rational.ZERO;
        for (long n = 0; n <= 500; n++) {
            double error = new BigDecimal(form.valueAt(n)).subtract(x.toBigDecimal(MathContext.DECIMAL128)).abs().doubleValue();
            assertTrue(error <= facts.forward().termBound() * form.largestTerm(n), "x[" + n + "]: error " + error);
            x = x.multiply(rate).add(Rational.ONE);
        }
    }

    /**
     * y' = 10^20·y, y(0) = 1 is e^(10^20·t) (common practice): in double it overflows above
     * t = ln(DBL_MAX)/10^20 ≈ 7.098·10^-18 (DBL_MAX = 1.7976931348623157·10^308, IEEE 754, from
     * memory) and falls below the smallest normal number under -ln(DBL_MIN)/10^20 ≈ -7.08·10^-18; the
     * range is found at that scale (it read 0 <= t <= 0 before), and the code is accurate inside it
     * (reference: apfloat's exp at 60 digits).
     */
    @Test
    void theRangeOfAnExtremeRateIsFoundAtItsOwnScale() {
        Report r = Answers.codeReport("y' = 10^20 y; y(0) = 1", 30);
        CodeFacts facts = r.code().orElseThrow().facts();
        double top = Math.log(Double.MAX_VALUE) / 1e20;
        double bottom = Math.log(Double.MIN_NORMAL) / 1e20;
        assertTrue(facts.high() > 0.99 * top && facts.high() <= top, facts.high() + " vs " + top);
        assertTrue(facts.low() < 0.99 * bottom && facts.low() >= bottom, facts.low() + " vs " + bottom);
        for (double t : new double[] {facts.high() / 2, facts.low() / 2, 1e-21, -3e-19}) {
            assertRelative(r, Double.toString(t), x -> ApfloatMath.exp(x.multiply(new Apfloat("1e20", PRECISION))), 2e-13);
        }
    }

    /**
     * y''' - y' - y = 0 grows backward as e^(0.662·|t|) with a frequency 0.562 (roots of λ^3 - λ - 1,
     * the plastic number's polynomial; its real root 1.3247… is OEIS A060006, from memory): at t ≈ -1070 the
     * arguments 0.662·t and 0.562·t are rounded to a relative 2^-53, so by first-order error
     * propagation (common practice) the error reaches about (709 + 601)·2^-53 ≈ 1.5·10^-13 of the
     * largest term, which the sampled worst (5·10^-14) underestimates; the stated bound covers it.
     */
    @Test
    void theStatedBoundCoversTheRoundingOfRatesAndAnglesBetweenSamples() {
        Report r = Answers.codeReport("y''' - y' - y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0", 30);
        CodeFacts.Accuracy back = r.code().orElseThrow().facts().backward().orElseThrow();
        double firstOrder = (0.662 + 0.562) * 1070 * 0x1p-53;
        assertTrue(back.maxDrift() > 0.5 * firstOrder, back.toString());
        assertTrue(back.termBound() >= 2 * back.maxDrift() && back.termBound() >= firstOrder, back.toString());
    }

    private static void assertRelative(Report r, String at, Function<Apfloat, Apfloat> known, double tolerance) {
        double t = Double.parseDouble(at);
        Apfloat exact = known.apply(new Apfloat(new BigDecimal(t), PRECISION));
        double got = r.code().orElseThrow().form().valueAt(t);
        double error = new BigDecimal(got).subtract(new BigDecimal(exact.toString(false))).abs()
                .divide(new BigDecimal(exact.toString(false)).abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(error <= tolerance, "at t = " + at + ": " + got + " vs " + exact + " (relative error " + error + ")");
    }
}
