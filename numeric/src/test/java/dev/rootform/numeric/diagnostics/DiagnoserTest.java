package dev.rootform.numeric.diagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.diagnostics.Stability.Verdict;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Diagnostics of small equations against facts of common engineering practice. */
class DiagnoserTest {
    private static final double TIGHT = 1e-12;

    static Diagnostics diagnose(String input) {
        return new Analyzer(30).analyze(Solver.solve(ProblemParser.parse(input, List.of(), null)), List.of()).diagnostics().orElseThrow();
    }

    static double quantity(Mode m, String key) {
        return m.quantities().stream().filter(q -> q.key().equals(key)).findFirst().orElseThrow(() -> new AssertionError(key)).value().doubleValue();
    }

    @ParameterizedTest(name = "[{index}] {0} is {1}")
    @CsvSource(delimiter = '|', value = {
        // common practice: left half-plane / unit disk rules, repeated boundary roots grow polynomially
        "y'' + 2y' + y = 0|ASYMPTOTICALLY_STABLE",
        "y'' + 2y' + 25y = 0|ASYMPTOTICALLY_STABLE",
        "y'' + y = 0|MARGINALLY_STABLE",
        "y'' - y = 0|UNSTABLE",
        "(D^2 + 1)^2 y = 0|UNSTABLE",
        "y' = 0|MARGINALLY_STABLE",
        "(D^4 + D^3 + D^2 + D + 1) y = 0|UNSTABLE",
        "(D^3 + 2D^2 + 3D + 1) y = 0|ASYMPTOTICALLY_STABLE",
        "x[n+1] = 0.8x[n]|ASYMPTOTICALLY_STABLE",
        "x[n+2] = x[n+1] + x[n]|UNSTABLE",
        "x[n+2] = -x[n]|MARGINALLY_STABLE",
        "(E^2 + 1)^2 x = 0|UNSTABLE",
        "(E^4 + E^3 + E^2 + E + 1) x = 0|MARGINALLY_STABLE",
        "(E^3 - E - 1) x = 0|UNSTABLE",
        "(8E^3 - 2E - 1) x = 0|ASYMPTOTICALLY_STABLE",
    })
    void verdictByTheDomainsRule(String equation, Verdict expected) {
        assertEquals(expected, diagnose(equation).stability().verdict());
    }

    @Test
    void criticallyDampedHasDampingRatioOne() {
        // common practice: y'' + 2ζω_n y' + ω_n² y = 0 with ω_n = 1, ζ = 1
        Diagnostics d = diagnose("y'' + 2y' + y = 0; y(0) = 1; y'(0) = 0");
        Mode m = d.modes().get(0);
        assertEquals(1, quantity(m, "dampingRatio"), TIGHT);
        assertEquals(1, quantity(m, "naturalFrequency"), TIGHT);
        assertEquals(1, quantity(m, "timeConstant"), TIGHT);
        assertEquals("Θ(t·e^(-t))", d.growth().theta());
    }

    @Test
    void underdampedSecondOrderSection() {
        // common practice: y'' + 2y' + 25y = 0 has ω_n = 5, ζ = 2/(2·5) = 0.2, ω_d = 5·√(1 − 0.04)
        Mode m = diagnose("y'' + 2y' + 25y = 0").modes().get(0);
        assertEquals(5, quantity(m, "naturalFrequency"), TIGHT);
        assertEquals(0.2, quantity(m, "dampingRatio"), TIGHT);
        assertEquals(Math.sqrt(24), quantity(m, "dampedFrequency"), TIGHT);
        assertEquals(2 * Math.PI / Math.sqrt(24), quantity(m, "period"), TIGHT);
    }

    @Test
    void fibonacciIsDominatedByTheGoldenRatio() {
        // Binet's formula (common practice): F_n ~ φ^n/√5
        Diagnostics d = diagnose("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1");
        double phi = (1 + Math.sqrt(5)) / 2;
        assertEquals(phi, d.growth().rate(), TIGHT);
        assertEquals(phi, d.stability().root().orElseThrow().re().doubleValue(), TIGHT);
        assertEquals("Θ(1.618034^n)", d.growth().theta());
        Mode conjugate = d.modes().get(1);
        assertEquals(2, quantity(conjugate, "periodSamples"), TIGHT);
        assertEquals(Math.log(2) / -Math.log(phi - 1), quantity(conjugate, "halvingSteps"), TIGHT);
    }

    @Test
    void discreteFilterPole() {
        // common practice: a pole at 0.8 loses 20·log10(0.8) ≈ −1.94 dB per step, halves in ln 2/−ln 0.8 steps
        Mode m = diagnose("x[n+1] = 0.8x[n]; x[0] = 1").modes().get(0);
        assertEquals(0.8, quantity(m, "modulus"), TIGHT);
        assertEquals(20 * Math.log10(0.8), quantity(m, "decibelsPerStep"), TIGHT);
        assertEquals(Math.log(2) / -Math.log(0.8), quantity(m, "halvingSteps"), TIGHT);
    }

    @Test
    void fittedGrowthIgnoresModesWithZeroCoefficients() {
        // y'' - y = 0, y(0) = 1, y'(0) = -1 is e^{-t} exactly (by hand): the unstable mode is absent
        Diagnostics d = diagnose("y'' - y = 0; y(0) = 1; y'(0) = -1");
        assertEquals(Verdict.UNSTABLE, d.stability().verdict());
        assertEquals("Θ(e^(-t))", d.growth().theta());
        assertEquals("Θ(e^(t))", diagnose("y'' - y = 0").growth().theta());
    }

    @Test
    void resonanceAtAQuarticCyclotomicFactorGrowsLinearly() {
        // λ^4 + 1 has the roots e^(±iπ/4), e^(±3iπ/4); cos(πn/4) forces the first pair at resonance,
        // so the solution carries n·cos(πn/4) (method of undetermined coefficients, common practice;
        // the answer's part -1/4·n·cos(πn/4) was checked by exact iteration in Q(√2))
        Diagnostics d = diagnose("x[n+4] = -x[n] + cos(pi n/4); x[0] = 1; x[1] = 0; x[2] = 0; x[3] = 0");
        assertEquals("Θ(n)", d.growth().theta());
        // off resonance the same forcing (values in Q(√2)) leaves a stable section bounded
        assertEquals("Θ(1)", diagnose("x[n+1] = x[n]/2 + sin(pi n/4); x[0] = 0").growth().theta());
    }

    @Test
    void aForcingThatOutgrowsTheModesSetsTheGrowth() {
        // by hand (undetermined coefficients, common practice): x[n+1] = x[n]/2 + 3^n, x[0] = 0 is
        // 2/5·3^n - 2/5·(1/2)^n, and y' + y = 1, y(0) = 0 is 1 - e^(-t), which tends to 1
        Diagnostics d = diagnose("x[n+1] = x[n]/2 + 3^n; x[0] = 0");
        assertEquals("Θ(3^n)", d.growth().theta());
        assertTrue(d.growth().root().isEmpty());
        assertEquals("Θ(1)", diagnose("y' + y = 1; y(0) = 0").growth().theta());
        assertEquals("Θ(t)", diagnose("y' + y = t; y(0) = 0").growth().theta());
        // a transient that outlasts a faster-decaying input keeps its mode: 4·(1/2)^n - 4·(1/4)^n by hand
        assertEquals("Θ(0.5^n)", diagnose("x[n+1] = x[n]/2 + (1/4)^n; x[0] = 0").growth().theta());
    }

    @Test
    void conditionNumberOfTheFittingSystem() {
        // by hand: rows λ^0 = (1, 0) and λ^5 mod (λ² − λ − 1) = 3 + 5λ; A⁻¹ = ((1, 0), (−3/5, 1/5)); ‖A‖∞ = 8, ‖A⁻¹‖∞ = 1, κ∞ = 8
        Diagnostics d = diagnose("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[5] = 5");
        assertEquals(0, new BigDecimal("8").compareTo(d.conditionNumber().orElseThrow()));
        assertEquals(0, BigDecimal.ONE.compareTo(diagnose("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1").conditionNumber().orElseThrow()));
    }

    @Test
    void nearlyRepeatedRootsWarnOfCancellation() {
        // roots 1 and 1 + 10^-10: y = (e^{(1+ε)t} − e^t)/ε, terms 10^10 times larger than t·e^t (by hand)
        Diagnostics d = diagnose("y'' - 2.0000000001y' + 1.0000000001y = 0; y(0) = 0; y'(0) = 1");
        assertEquals(2, d.warnings().size(), d.warnings().toString());
        assertTrue(d.warnings().get(0).startsWith("nearly repeated roots"), d.warnings().get(0));
        assertTrue(d.warnings().get(1).startsWith("severe cancellation"), d.warnings().get(1));
        assertTrue(diagnose("y'' + 2y' + 25y = 0; y(0) = 1; y'(0) = 0").warnings().isEmpty());
    }
}
