package dev.rootform.symbolic.params;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ParametricParser;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** Stability as conditions on the parameters: Routh–Hurwitz and Schur–Cohn / Jury. */
class StabilityConditionsTest {

    private static StabilityConditions of(String equation, String params, String where) {
        List<String> names = ParametricParser.names(params);
        return ParametricSolver.stability(ParametricParser.parse(equation, names, null), Assumptions.parse(where, names));
    }

    private static String text(StabilityConditions s) {
        return s.conditions().stream().map(Constraint::toString).collect(Collectors.joining("; "));
    }

    @Test
    void routhHurwitzForACubic() {
        // Routh–Hurwitz for λ³ + a2λ² + a1λ + a0: a2 > 0, a0 > 0, a2·a1 > a0 (from memory, marked)
        StabilityConditions s = of("y''' + a2 y'' + a1 y' + a0 y = 0", "a2,a1,a0", "");
        assertEquals(StabilityConditions.Verdict.WHEN, s.verdict());
        assertEquals("a2 > 0; a2·a1 > a0; a0 > 0", text(s));
    }

    @Test
    void routhHurwitzForAQuartic() {
        // Hurwitz for λ⁴ + a3λ³ + a2λ² + a1λ + a0: a3 > 0, a3·a2 > a1, a3·a2·a1 > a1² + a3²·a0, a0 > 0
        // (from memory, marked; the last minor is a0 times the third)
        StabilityConditions s = of("y'''' + a3 y''' + a2 y'' + a1 y' + a0 y = 0", "a3,a2,a1,a0", "");
        assertEquals("a3 > 0; a3·a2 > a1; a3^2·a0 + a1^2 < a3·a2·a1; a0 > 0", text(s));
    }

    @Test
    void dampedOscillatorIsStableExactlyWithDamping() {
        // m y'' + c y' + k y with m, k > 0: stable iff c > 0 (common practice)
        StabilityConditions s = of("m y'' + c y' + k y = 0", "m,c,k", "m > 0, c >= 0, k > 0");
        assertEquals("c > 0", text(s));
        assertEquals(StabilityConditions.Verdict.ALWAYS, of("m y'' + c y' + k y = 0", "m,c,k", "m > 0, c > 0, k > 0").verdict());
        assertEquals(StabilityConditions.Verdict.NEVER, of("m y'' + k y = 0", "m,k", "m > 0, k > 0").verdict());
    }

    @Test
    void juryForASecondOrderRecurrence() {
        // Jury's conditions for z² + a1·z + a0: 1 + a1 + a0 > 0, 1 − a1 + a0 > 0, |a0| < 1 (from memory, marked)
        StabilityConditions s = of("x[n+2] + a1 x[n+1] + a0 x[n] = 0", "a1,a0", "");
        // |a0| < 1 appears as a0 < 1: a0 > −1 is the sum of the first two
        assertEquals("a1 + a0 + 1 > 0; a1 < a0 + 1; a0 < 1", text(s));
    }

    @Test
    void juryAgreesWithTheRootsAtRandomPoints() {
        // independent check: the roots of z² + a1·z + a0 by the quadratic formula in double precision
        StabilityConditions s = of("x[n+2] + a1 x[n+1] + a0 x[n] = 0", "a1,a0", "");
        Random random = new Random(7);
        for (int i = 0; i < 400; i++) {
            Rational a1 = Rational.of(random.nextInt(61) - 30, 10);
            Rational a0 = Rational.of(random.nextInt(41) - 20, 10);
            double p = a1.doubleValue();
            double q = a0.doubleValue();
            double d = p * p - 4 * q;
            double modulus = d >= 0 ? Math.max(Math.abs((-p + Math.sqrt(d)) / 2), Math.abs((-p - Math.sqrt(d)) / 2)) : Math.sqrt(q);
            if (Math.abs(modulus - 1) < 1e-9) {
                continue;
            }
            Map<String, Rational> at = Map.of("a1", a1, "a0", a0);
            boolean conditions = s.conditions().stream().allMatch(c -> c.holdsAt(at));
            assertEquals(modulus < 1, conditions, "a1 = " + a1 + ", a0 = " + a0);
        }
    }

    @Test
    void geometricRecurrenceIsStableForRatioBelowOneInSize() {
        // x[n+1] = a·x[n]: stable iff |a| < 1 (common practice)
        assertEquals("a < 1; a + 1 > 0", text(of("x[n+1] = a x[n] + 1", "a", "")));
        assertEquals("a < 1", text(of("x[n+1] = a x[n] + 1", "a", "a > 0")));
    }
}
