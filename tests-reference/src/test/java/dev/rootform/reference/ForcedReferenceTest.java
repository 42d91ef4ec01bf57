package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.function.IntToDoubleFunction;
import java.util.function.LongFunction;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Forced equations against published closed forms (sources beside each case). */
class ForcedReferenceTest {
    private static final Rational RATE = Rational.of(1, 200);
    private static final Rational PAYMENT = Rational.of(600);
    private static final Rational LOAN = Rational.of(100000);

    static Stream<Arguments> sequences() {
        return Stream.of(
                // loan balance with monthly rate r and payment P: B_n = L(1+r)^n - P((1+r)^n - 1)/r — the standard
                // annuity (amortisation) formula, e.g. S. A. Broverman, Mathematics of Investment and Credit (from memory)
                Arguments.of("b[n+1] = 1.005 b[n] - 600; b[0] = 100000", (LongFunction<Rational>) n -> {
                    Rational growth = Rational.ONE.add(RATE).pow((int) n);
                    return LOAN.multiply(growth).subtract(PAYMENT.multiply(growth.subtract(Rational.ONE)).divide(RATE));
                }),
                // Tower of Hanoi T(n) = 2T(n-1) + 1, T(0) = 0 → 2^n - 1 (R. L. Graham, D. E. Knuth, O. Patashnik,
                // Concrete Mathematics, section 1.1 — from memory; OEIS A000225)
                Arguments.of("T[n] = 2T[n-1] + 1; T[0] = 0", (LongFunction<Rational>) n -> Rational.of(2).pow((int) n).subtract(Rational.ONE)),
                // x[n+1] = 2x[n] + 2^n, x[0] = 0 → n·2^(n-1) (resonant forcing; common practice)
                Arguments.of("x[n+1] = 2x[n] + 2^n; x[0] = 0", (LongFunction<Rational>) n -> Rational.of(n).multiply(Rational.of(2).pow((int) n - 1))),
                // second difference equal to 1 → n(n-1)/2 (triangular numbers shifted, OEIS A000217; common practice)
                Arguments.of("x[n+2] - 2x[n+1] + x[n] = 1; x[0] = 0; x[1] = 0", (LongFunction<Rational>) n -> Rational.of(n * (n - 1), 2)),
                // sum of squares: x[n] = x[n-1] + n^2 → n(n+1)(2n+1)/6 (OEIS A000330; handbook identity)
                Arguments.of("x[n] = x[n-1] + n^2; x[0] = 0", (LongFunction<Rational>) n -> Rational.of(n * (n + 1) * (2 * n + 1), 6)),
                // x[n+1] = x[n] + (-1)^n, x[0] = 0 → (1 - (-1)^n)/2 (common practice)
                Arguments.of("x[n+1] = x[n] + (-1)^n; x[0] = 0", (LongFunction<Rational>) n -> Rational.of(1 - (n % 2 == 0 ? 1 : -1), 2)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sequences")
    void sequenceMatchesPublishedFormula(String input, LongFunction<Rational> known) {
        List<Rational> points = new ArrayList<>();
        for (long n = 0; n <= 60; n += 3) {
            points.add(Rational.of(n));
        }
        Report report = Answers.report(input, 30, points);
        assertTrue(report.verified(), input + ": " + report.solution().checks());
        for (int i = 0; i < points.size(); i++) {
            long n = points.get(i).toBigInteger().longValueExact();
            assertEquals(known.apply(n), report.values().get(i).exact().orElseThrow(), input + " at n = " + n);
        }
    }

    static Stream<Arguments> irrationalForcing() {
        return Stream.of(
                // sampled sinusoid at fs/8 into a first-order low-pass: x[n+1] = x[n]/2 + cos(πn/4), x[0] = 1;
                // cos(πn/4) takes the values ±√2/2 (handbook value), so the answer lies in Q(√2)
                Arguments.of("x[n+1] = x[n]/2 + cos(pi n/4); x[0] = 1", (IntToDoubleFunction) n -> Math.cos(Math.PI * n / 4),
                        new double[] {-0.5, 1}),
                // sin(πn/3) = ±√3/2 (handbook value): answer in Q(√3)
                Arguments.of("x[n+1] = x[n]/2 + sin(pi n/3); x[0] = 0", (IntToDoubleFunction) n -> Math.sin(Math.PI * n / 3),
                        new double[] {-0.5, 1}),
                // cos(2πn/5) ∈ {1, (√5-1)/4, -(√5+1)/4} (handbook values): answer in Q(√5), resonance-free second order
                Arguments.of("x[n+2] = x[n] + cos(2 pi n/5); x[0] = 0; x[1] = 0",
                        (IntToDoubleFunction) n -> Math.cos(2 * Math.PI * n / 5), new double[] {-1, 0, 1}),
                // resonance with a root of unity of order 8: x[n+4] = -x[n] + cos(πn/4) (Φ_8 divides χ)
                Arguments.of("x[n+4] = -x[n] + cos(pi n/4); x[0] = 0; x[1] = 0; x[2] = 0; x[3] = 0",
                        (IntToDoubleFunction) n -> Math.cos(Math.PI * n / 4), new double[] {1, 0, 0, 0, 1}));
    }

    /**
     * Forcing whose values are irrational but lie in Q(√2), Q(√3) or Q(√5): the exact answer's
     * values are compared with plain double iteration of the recurrence (an independent reference;
     * agreement to 1e-9 relative over 60 steps).
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("irrationalForcing")
    void irrationalForcingMatchesIteration(String input, IntToDoubleFunction forcing, double[] a) {
        int k = a.length - 1;
        List<Rational> points = new ArrayList<>();
        for (int n = 0; n <= 60; n++) {
            points.add(Rational.of(n));
        }
        Report report = Answers.report(input, 30, points);
        assertTrue(report.verified(), input + ": " + report.solution().checks());
        assertTrue(report.values().stream().anyMatch(v -> v.exactSurd().isPresent()), "some value is an exact a + b√r");
        double[] x = new double[61];
        for (int n = 0; n <= 60; n++) {
            if (n < k) {
                x[n] = report.solution().problem().conditions().get(n).value().doubleValue();
            } else {
                double sum = forcing.applyAsDouble(n - k);
                for (int j = 0; j < k; j++) {
                    sum -= a[j] * x[n - k + j];
                }
                x[n] = sum / a[k];
            }
            double actual = report.values().get(n).value().doubleValue();
            assertEquals(x[n], actual, 1e-9 * Math.max(1, Math.abs(x[n])), input + " at n = " + n);
        }
    }

    static Stream<Arguments> functions() {
        return Stream.of(
                // undamped spring at resonance: y'' + ω²y = F cos ωt, rest → F t sin(ωt)/(2ω) (W. E. Boyce and
                // R. C. DiPrima, Elementary Differential Equations, forced vibrations — from memory)
                Arguments.of("y'' + 4y = 3cos(2t); y(0) = 0; y'(0) = 0", (DoubleUnaryOperator) t -> 3 * t * Math.sin(2 * t) / 4),
                // off resonance (beats): y'' + ω0²y = F cos ωt, rest → F(cos ωt - cos ω0 t)/(ω0² - ω²) (same source)
                Arguments.of("y'' + 9y = 5cos(2t); y(0) = 0; y'(0) = 0", (DoubleUnaryOperator) t -> Math.cos(2 * t) - Math.cos(3 * t)),
                // overdamped series RLC, step input: q'' + 3q' + 2q = 5 from rest → 5(1/2 - e^{-t} + e^{-2t}/2)
                // (standard circuit textbook step response — from memory)
                Arguments.of("q'' + 3q' + 2q = 5; q(0) = 0; q'(0) = 0",
                        (DoubleUnaryOperator) t -> 5 * (0.5 - Math.exp(-t) + Math.exp(-2 * t) / 2)),
                // underdamped series RLC, step input: q'' + 2q' + 5q = 10 from rest → 2 - e^{-t}(2cos 2t + sin 2t) (same)
                Arguments.of("q'' + 2q' + 5q = 10; q(0) = 0; q'(0) = 0",
                        (DoubleUnaryOperator) t -> 2 - Math.exp(-t) * (2 * Math.cos(2 * t) + Math.sin(2 * t))),
                // ramp into a first-order lag: τy' + y = t, y(0) = 0, τ = 1/2 → t - τ + τe^{-t/τ} (common practice)
                Arguments.of("0.5y' + y = t; y(0) = 0", (DoubleUnaryOperator) t -> t - 0.5 + 0.5 * Math.exp(-2 * t)),
                // a frequency π: y'' + y = sin(πt) from rest → (sin πt - π sin t)/(1 - π²); its constants lie in Q(π),
                // so the trial form's are fitted numerically (worked by hand: undetermined coefficients)
                Arguments.of("y'' + y = sin(pi t); y(0) = 0; y'(0) = 0",
                        (DoubleUnaryOperator) t -> (Math.sin(Math.PI * t) - Math.PI * Math.sin(t)) / (1 - Math.PI * Math.PI)),
                // first-order lag driven at frequency π: y' + y = sin(πt), y(0) = 0 →
                // (sin πt - π cos πt + π e^{-t})/(1 + π²) (common practice)
                Arguments.of("y' + y = sin(pi t); y(0) = 0", (DoubleUnaryOperator) t ->
                        (Math.sin(Math.PI * t) - Math.PI * Math.cos(Math.PI * t) + Math.PI * Math.exp(-t)) / (1 + Math.PI * Math.PI)),
                // exponential input at a double root: y'' + 2y' + y = e^{-t}, rest → t²e^{-t}/2 (common practice)
                Arguments.of("y'' + 2y' + y = e^(-t); y(0) = 0; y'(0) = 0", (DoubleUnaryOperator) t -> t * t * Math.exp(-t) / 2));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("functions")
    void functionMatchesPublishedFormula(String input, DoubleUnaryOperator known) {
        List<Rational> points = List.of(Rational.of(1, 3), Rational.ONE, Rational.of(5, 2), Rational.of(6));
        Report report = Answers.report(input, 25, points);
        assertTrue(report.verified(), input + ": " + report.solution().checks() + report.numericChecks());
        for (int i = 0; i < points.size(); i++) {
            double t = points.get(i).doubleValue();
            double expected = known.applyAsDouble(t);
            assertEquals(expected, report.values().get(i).value().doubleValue(), 1e-12 * Math.max(1, Math.abs(expected)), input + " at t = " + t);
        }
    }

    @Test
    void stepResponseSplitsIntoTransientAndSteadyParts() {
        Report report = Answers.report("q'' + 3q' + 2q = 5; q(0) = 0; q'(0) = 0", 20, List.of());
        var form = report.solution().closedForm();
        assertEquals(2, form.transientTerms().size());
        assertEquals(1, form.particularTerms().size());
    }

    @Test
    void steadyStateGainIsTheFrequencyResponse() {
        // |H(iω)| = 1/|χ(iω)| for y'' + 3y' + 2y = 2 sin 3t: χ(3i) = -7 + 9i, gain 1/√130, phase -arg χ(3i)
        // (common practice: frequency response of a stable LTI system)
        Report report = Answers.report("y'' + 3y' + 2y = 2sin(3t); y(0) = 0; y'(0) = 0", 20, List.of());
        assertEquals(1, report.steadyStates().size());
        assertEquals(1 / Math.sqrt(130), report.steadyStates().get(0).gain().doubleValue(), 1e-15);
        assertEquals(-Math.toDegrees(Math.atan2(9, -7)), report.steadyStates().get(0).phaseDegrees().doubleValue(), 1e-12);
    }

    @Test
    void unstableSystemHasNoSteadyState() {
        Report report = Answers.report("y'' - y = sin(t); y(0) = 0; y'(0) = 0", 20, List.of());
        assertTrue(report.steadyStates().isEmpty());
    }
}
