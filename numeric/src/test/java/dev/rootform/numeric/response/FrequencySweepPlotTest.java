package dev.rootform.numeric.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.numeric.plot.FrequencyPlot;
import dev.rootform.numeric.plot.FrequencySampling;
import dev.rootform.numeric.plot.Sample;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The plot samples of a transfer function's frequency response, against Commons Math's complex
 * arithmetic (reference library) evaluating H(jω) and H(e^{jθ}) term by term.
 */
class FrequencySweepPlotTest {
    /** A second-order low pass 10/(s² + 2s + 10) (a servo loop of our own). */
    private static final RationalFunction LOW_PASS = new RationalFunction(poly(10), poly(10, 2, 1));

    @Test
    void continuousSamplesAreHOfJOmega() {
        FrequencyPlot p = new FrequencySweep(LOW_PASS, true, 12).plot();
        assertFalse(p.discrete());
        assertEquals(FrequencySampling.SAMPLES, p.magnitudeDb().size());
        for (int i = 0; i < p.magnitudeDb().size(); i++) {
            double w = p.magnitudeDb().get(i).x();
            Complex jw = new Complex(0, w);
            Complex h = new Complex(10).divide(jw.multiply(jw).add(jw.multiply(2)).add(10));
            assertEquals(20 * Math.log10(h.abs()), p.magnitudeDb().get(i).y(), 1e-9, "dB at ω = " + w);
            double phase = p.phaseDegrees().get(i).y();
            assertEquals(0, Math.IEEEremainder(Math.toDegrees(h.getArgument()) - phase, 360), 1e-9, "phase at ω = " + w);
        }
        // the sweep spans 1/20 .. 20 times |pole| = √10 (common practice: two decades around the corner)
        assertEquals(Math.sqrt(10) / 20, p.magnitudeDb().get(0).x(), 1e-12);
        assertEquals(Math.sqrt(10) * 20, p.magnitudeDb().get(p.magnitudeDb().size() - 1).x(), 1e-9);
        // unwrapped: a second-order low pass goes from 0° towards −180° without jumps (common practice)
        List<Sample> phase = p.phaseDegrees();
        for (int i = 1; i < phase.size(); i++) {
            assertTrue(Math.abs(phase.get(i).y() - phase.get(i - 1).y()) < 10, "jump at " + phase.get(i).x());
        }
        assertTrue(phase.get(0).y() > -5 && phase.get(phase.size() - 1).y() < -170, phase.get(phase.size() - 1).toString());
    }

    @Test
    void discreteSamplesLeaveOutTheZeroOnTheCircle() {
        // (1 + z^-1)/(1 - 1.5 z^-1 + 0.56 z^-2) = (z² + z)/(z² - 1.5z + 0.56): a zero at z = -1, θ = π
        RationalFunction h = new RationalFunction(poly(0, 1, 1), RationalPolynomial.of(List.of(Rational.parse("0.56"),
                Rational.parse("-1.5"), Rational.ONE)));
        FrequencyPlot p = new FrequencySweep(h, false, 12).plot();
        assertTrue(p.discrete());
        assertEquals(FrequencySampling.SAMPLES - 1, p.magnitudeDb().size(), "θ = π (|H| = 0) is left out");
        for (Sample s : p.magnitudeDb()) {
            Complex z = new Complex(Math.cos(s.x()), Math.sin(s.x()));
            Complex value = z.multiply(z).add(z).divide(z.multiply(z).subtract(z.multiply(1.5)).add(0.56));
            assertEquals(20 * Math.log10(value.abs()), s.y(), 1e-9, "dB at θ = " + s.x());
            assertTrue(s.x() > 0 && s.x() < Math.PI);
        }
    }

    private static RationalPolynomial poly(long... coefficients) {
        return RationalPolynomial.of(java.util.Arrays.stream(coefficients).mapToObj(Rational::of).toList());
    }
}
