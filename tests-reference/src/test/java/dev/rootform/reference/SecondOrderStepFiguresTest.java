package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Step figures of the standard second-order system H(s) = ωn²/(s² + 2ζωn s + ωn²), 0 &lt; ζ &lt; 1,
 * against the formulas every control text gives (common practice): percent overshoot
 * 100·exp(−ζπ/√(1 − ζ²)), peak time π/ωd with ωd = ωn√(1 − ζ²), final value 1 (final-value theorem,
 * H(0) = 1). Rise and settling times have no closed formula; they are checked on the textbook
 * step response y(t) = 1 − e^(−ζωn t)(cos ωd t + ζ/√(1 − ζ²)·sin ωd t) (common practice): y is 0.1
 * and 0.9 at the ends of the rise, stays below 0.1 before it, and leaves the 2 % band for the last
 * time at the settling time.
 */
class SecondOrderStepFiguresTest {
    @ParameterizedTest(name = "2ζωn = {0}, ωn² = {1}")
    @CsvSource(delimiter = '|', value = {
        "2    | 4",      // ζ = 1/2, ωn = 2
        "3    | 25",     // ζ = 3/10, ωn = 5
        "2/5  | 1",      // ζ = 1/5, ωn = 1
        "21/10| 9/4",    // ζ = 7/10, ωn = 3/2
        "2    | 10",     // the loop 10/(s(s + 2)) closed by unit feedback: ζ = 1/√10, ωn = √10
        "1/10 | 1",      // ζ = 1/20, lightly damped
    })
    void figuresMatchTheStandardFormulas(String twoZetaOmega, String omegaSquared) {
        Rational b = Rational.parse(twoZetaOmega);
        Rational c = Rational.parse(omegaSquared);
        double wn = Math.sqrt(c.doubleValue());
        double zeta = b.doubleValue() / (2 * wn);
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        String h = "H(s) = (" + c + ")/(s^2 + (" + b + ")s + " + c + ")";
        ResponseReport r = Responses.report(h, "step", 25, List.of(), List.of());
        StepFigures f = r.stepFigures().orElseThrow();
        assertEquals(Rational.ONE, f.finalValue(), h);
        assertEquals(Rational.ONE, r.facts().dcGain().orElseThrow(), h);
        double overshoot = 100 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta));
        assertEquals(overshoot, f.overshootPercent().orElseThrow().doubleValue(), 1e-9 * overshoot, h);
        assertEquals(Math.PI / wd, f.peakTime().orElseThrow().doubleValue(), 1e-12, h);

        java.util.function.DoubleUnaryOperator y = t -> 1 - Math.exp(-zeta * wn * t)
                * (Math.cos(wd * t) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * t));
        double settling = f.settlingTime().orElseThrow().doubleValue();
        assertEquals(0.02, Math.abs(y.applyAsDouble(settling) - 1), 1e-12, h);
        for (double t = settling + 1e-6; t < settling + 40 / (zeta * wn); t += 0.001 / wn) {
            assertTrue(Math.abs(y.applyAsDouble(t) - 1) <= 0.02 + 1e-12, h + ": outside the band at t = " + t);
        }
        // t10 solves y = 0.1 with y < 0.1 before it, and the rise ends where y = 0.9 first
        double t10 = firstCrossing(y, 0.1, wn);
        double t90 = firstCrossing(y, 0.9, wn);
        assertEquals(t90 - t10, f.riseTime().orElseThrow().doubleValue(), 1e-9, h);
    }

    /** The first t where y reaches the level, by a fine scan and bisection of the textbook formula. */
    private static double firstCrossing(java.util.function.DoubleUnaryOperator y, double level, double wn) {
        double step = 1e-3 / wn;
        double t = 0;
        while (y.applyAsDouble(t + step) < level) {
            t += step;
        }
        double a = t;
        double b = t + step;
        for (int i = 0; i < 200; i++) {
            double m = (a + b) / 2;
            if (y.applyAsDouble(m) < level) {
                a = m;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
    }
}
