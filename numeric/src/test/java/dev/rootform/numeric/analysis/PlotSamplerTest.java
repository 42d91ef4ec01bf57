package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.numeric.check.OdeReference;
import dev.rootform.numeric.plot.FrequencyPlot;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.plot.Sample;
import dev.rootform.numeric.plot.TimePlot;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The plot data against values known outside rootform. */
class PlotSamplerTest {
    private static Plots plots(String problem, Rational... points) {
        return new Analyzer(20, true).analyze(Solver.solve(ProblemParser.parse(problem, List.of(), null)), List.of(points))
                .plots().orElseThrow();
    }

    /** Stems at every index equal the Fibonacci numbers (OEIS A000045); growth puts them on a log axis. */
    @Test
    void fibonacciStemsOnALogAxis() {
        TimePlot t = plots("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", Rational.of(7)).time().orElseThrow();
        assertTrue(t.stems() && t.logScale(), t.range());
        List<BigInteger> fibonacci = new java.util.ArrayList<>(List.of(BigInteger.ZERO, BigInteger.ONE));
        while (fibonacci.size() < 200) {
            fibonacci.add(fibonacci.get(fibonacci.size() - 1).add(fibonacci.get(fibonacci.size() - 2)));
        }
        assertTrue(t.solution().size() >= 12, "at least 12 indices: " + t.solution());
        for (Sample s : t.solution()) {
            assertEquals(fibonacci.get((int) s.x()).doubleValue(), s.y(), 0, "F(" + s.x() + ")");
        }
        assertEquals(List.of(new Sample(7, 13)), t.marks());
    }

    /**
     * y'' + 2y' + 10y = 3 sin(2t), y(0) = 1, y'(0) = 0: the whole curve agrees with Commons Math's
     * Dormand–Prince integration, and the steady part is the frequency-response solution
     * 3·Im(e^{2it}/χ(2i)) = (9/26) sin 2t − (3/13) cos 2t (common practice: χ(2i) = 6 + 4i).
     */
    @Test
    void forcedOscillatorAgreesWithIntegrationAndFrequencyResponse() {
        Plots p = plots("y'' + 2y' + 10y = 3 sin(2t); y(0) = 1; y'(0) = 0");
        TimePlot t = p.time().orElseThrow();
        assertFalse(t.stems() || t.logScale());
        assertTrue(t.split(), "a forced answer has transient and steady parts");
        Sample last = t.solution().get(t.solution().size() - 1);
        assertEquals(3 * Math.PI, last.x(), 1e-9, "3 periods of the slowest oscillation (the input's, 2π/2): " + t.range());
        int[] indices = {37, 211, 444};
        double[] at = new double[indices.length];
        for (int i = 0; i < indices.length; i++) {
            at[i] = t.solution().get(indices[i]).x();
        }
        double[] reference = OdeReference.values(List.of(Rational.of(10), Rational.of(2), Rational.ONE), x -> 3 * Math.sin(2 * x),
                Rational.ZERO, List.of(Rational.ONE, Rational.ZERO), at);
        for (int i = 0; i < indices.length; i++) {
            assertEquals(reference[i], t.solution().get(indices[i]).y(), 1e-8, "y(" + at[i] + ")");
        }
        for (int i = 0; i < t.steadyPart().size(); i += 50) {
            Sample s = t.steadyPart().get(i);
            assertEquals(9.0 / 26 * Math.sin(2 * s.x()) - 3.0 / 13 * Math.cos(2 * s.x()), s.y(), 1e-12, "steady at " + s.x());
            assertEquals(t.solution().get(i).y() - s.y(), t.transientPart().get(i).y(), 1e-12, "transient at " + s.x());
        }
        FrequencyPlot f = p.frequency().orElseThrow();
        assertEquals(List.of(2.0), f.inputs());
        Sample nearTwo = f.magnitudeDb().stream().min((u, v) -> Double.compare(Math.abs(u.x() - 2), Math.abs(v.x() - 2))).orElseThrow();
        double w = nearTwo.x();
        assertEquals(-10 * Math.log10(Math.pow(10 - w * w, 2) + 4 * w * w), nearTwo.y(), 1e-9, "|H(iω)| in dB at ω = " + w);
    }

    /** A general solution has free constants: no curve, only the roots (drawn from the analysis). */
    @Test
    void generalSolutionHasNoCurve() {
        assertTrue(plots("y'' + y = 0").time().isEmpty());
    }
}
