package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.response.FrequencyPoint;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Circuit stages of our own with values chosen for the test, against the circuit-theory results
 * every text gives (common practice).
 */
class CircuitStageTest {
    /**
     * RC low-pass, R = 4.7 kΩ, C = 2.2 µF, so RC = 0.01034 s and H(s) = 1/(RC·s + 1): step response
     * 1 − e^(−t/RC), 10–90 % rise time RC·ln 9, 2 % settling time RC·ln 50, no overshoot; at the
     * corner ω = 1/RC the gain is 1/√2 (−3.01 dB) and the phase −45°.
     */
    @Test
    void rcLowPass() {
        double rc = 0.01034;
        ResponseReport r = Responses.report("H(s) = 1/(0.01034s + 1)", "step", 20, List.of("0.005", "0.02", "0.1"),
                List.of(Rational.of(1).divide(Rational.parse("0.01034")).toString()));
        StepFigures f = r.stepFigures().orElseThrow();
        assertEquals(Rational.ONE, f.finalValue());
        assertEquals(rc * Math.log(9), f.riseTime().orElseThrow().doubleValue(), 1e-15);
        assertEquals(rc * Math.log(50), f.settlingTime().orElseThrow().doubleValue(), 1e-15);
        assertEquals(0, f.overshootPercent().orElseThrow().signum());
        assertTrue(f.peakTime().isEmpty());
        for (int i = 0; i < 3; i++) {
            double t = r.response().values().get(i).at().doubleValue();
            assertEquals(1 - Math.exp(-t / rc), r.response().values().get(i).value().doubleValue(), 1e-15);
        }
        FrequencyPoint corner = r.frequencyResponse().get(0);
        assertEquals(Surd.sqrt(Rational.of(1, 2)), corner.exactMagnitude().orElseThrow());
        assertEquals(Rational.of(-45), corner.exactPhaseDegrees().orElseThrow());
        assertEquals(-20 * Math.log10(Math.sqrt(2)), corner.decibels().orElseThrow().doubleValue(), 1e-15);
    }

    /**
     * Series RLC, output across C: H(s) = 1/(LC·s² + RC·s + 1) with L = 10 mH, C = 1 µF, R = 40 Ω,
     * so ωn = 1/√(LC) = 10⁴ rad/s and ζ = (R/2)·√(C/L) = 0.2: overshoot 100·exp(−ζπ/√(1 − ζ²)),
     * peak time π/(ωn√(1 − ζ²)); at ω = ωn the gain is 1/(2ζ) = 2.5 and the phase −90°.
     */
    @Test
    void seriesRlc() {
        double zeta = 0.2;
        double wn = 1e4;
        ResponseReport r = Responses.report("H(s) = 1/(0.01·0.000001s^2 + 40·0.000001s + 1)".replace("·", "*"), "step", 20,
                List.of(), List.of("10000"));
        StepFigures f = r.stepFigures().orElseThrow();
        assertEquals(100 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta)), f.overshootPercent().orElseThrow().doubleValue(),
                1e-12);
        assertEquals(Math.PI / (wn * Math.sqrt(1 - zeta * zeta)), f.peakTime().orElseThrow().doubleValue(), 1e-16);
        FrequencyPoint resonance = r.frequencyResponse().get(0);
        assertEquals(Surd.of(Rational.of(5, 2)), resonance.exactMagnitude().orElseThrow());
        assertEquals(Rational.of(-90), resonance.exactPhaseDegrees().orElseThrow());
        assertTrue(r.facts().stable());
    }
}
