package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.function.LongFunction;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Digital filters of our own design against the independent reference: exact rational iteration of
 * their difference equation y[n] = Σ b_k u[n−k] − Σ a_k y[n−k] from rest (y and u zero before
 * n = 0), the definition of H(z) = B(z^-1)/A(z^-1) (common practice). Every value of the response
 * must equal the iterated one exactly.
 */
class DigitalFilterIterationTest {
    private static final int COUNT = 40;

    @ParameterizedTest(name = "{0} to {1}")
    @CsvSource(delimiter = '|', value = {
        // biquad with poles 0.3 ± 0.4i (|p| = 0.5) and a double zero at z = -1
        "0.2 0.4 0.2    | 1 -0.6 0.25  | impulse",
        "0.2 0.4 0.2    | 1 -0.6 0.25  | step",
        "0.2 0.4 0.2    | 1 -0.6 0.25  | (1/2)^n",
        "0.2 0.4 0.2    | 1 -0.6 0.25  | (-1)^n",
        "0.2 0.4 0.2    | 1 -0.6 0.25  | cos(pi n/2)",
        "0.2 0.4 0.2    | 1 -0.6 0.25  | ramp",
        // resonator with poles on the real axis and a zero at z = 1 (a DC blocker)
        "1 -1           | 1 -1.5 0.56  | step",
        // four-tap moving average (FIR)
        "0.25 0.25 0.25 0.25 | 1       | step",
        "0.25 0.25 0.25 0.25 | 1       | n^2",
        // an integrator fed by a decaying input (resonance at z = 1 is not involved)
        "0 1            | 1 -1         | (0.9)^n",
    })
    void responseEqualsExactIteration(String b, String a, String input) {
        List<Rational> num = coefficients(b);
        List<Rational> den = coefficients(a);
        String transfer = "H(z) = (" + polynomial(num) + ")/(" + polynomial(den) + ")";
        List<String> points = new ArrayList<>();
        for (int n = 0; n < COUNT; n++) {
            points.add(Integer.toString(n));
        }
        List<PointValue> values = Responses.values(transfer, input, points);
        List<Rational> expected = iterate(num, den, signal(input));
        for (int n = 0; n < COUNT; n++) {
            assertEquals(expected.get(n), values.get(n).exact().orElseThrow(), transfer + " to " + input + " at n = " + n);
        }
    }

    /**
     * Step figures in samples from the iterated step response (definitions as in any control text,
     * common practice): first n with y ≥ 10 % and ≥ 90 % of y∞, the largest y and its index, and one
     * past the last n with |y − y∞| &gt; 2 % of y∞; iterated far past the settling of the slowest pole.
     */
    @ParameterizedTest(name = "{0} / {1}")
    @CsvSource(delimiter = '|', value = {
        "0.2 0.4 0.2         | 1 -0.6 0.25 | 16/13",    // the biquad, y∞ = H(1) = 0.8/0.65
        "0.1                 | 1 -1.2 0.45 | 2/5",      // poles 0.6 ± 0.3i, y∞ = 0.1/0.25
        "0.25 0.25 0.25 0.25 | 1           | 1",
    })
    void stepFiguresInSamples(String b, String a, String finalValue) {
        List<Rational> num = coefficients(b);
        List<Rational> den = coefficients(a);
        String transfer = "H(z) = (" + polynomial(num) + ")/(" + polynomial(den) + ")";
        dev.rootform.numeric.response.StepFigures f = Responses.report(transfer, "step", 20, List.of(), List.of())
                .stepFigures().orElseThrow();
        Rational last = Rational.parse(finalValue);
        assertEquals(last, f.finalValue(), transfer);
        List<Rational> y = iterate(num, den, signal("step"), 400);
        int n10 = first(y, last, Rational.of(1, 10));
        int n90 = first(y, last, Rational.of(9, 10));
        assertEquals(n90 - n10, f.riseTime().orElseThrow().intValueExact(), transfer);
        int peak = 0;
        for (int n = 1; n < y.size(); n++) {
            peak = y.get(n).compareTo(y.get(peak)) > 0 ? n : peak;
        }
        Rational overshoot = y.get(peak).subtract(last).divide(last).multiply(Rational.of(100));
        assertEquals(overshoot.signum() > 0 ? overshoot : Rational.ZERO, f.exactOvershootPercent().orElseThrow(), transfer);
        int settled = 0;
        for (int n = 0; n < y.size(); n++) {
            if (y.get(n).subtract(last).abs().compareTo(last.abs().multiply(Rational.of(1, 50))) > 0) {
                settled = n + 1;
            }
        }
        assertEquals(settled, f.settlingTime().orElseThrow().intValueExact(), transfer);
    }

    private static int first(List<Rational> y, Rational last, Rational fraction) {
        for (int n = 0; n < y.size(); n++) {
            if (y.get(n).divide(last).compareTo(fraction) >= 0) {
                return n;
            }
        }
        throw new AssertionError("never reached");
    }

    /** y[0..COUNT) from rest. */
    private static List<Rational> iterate(List<Rational> b, List<Rational> a, LongFunction<Rational> u) {
        return iterate(b, a, u, COUNT);
    }

    /** y[0..count) from rest. */
    private static List<Rational> iterate(List<Rational> b, List<Rational> a, LongFunction<Rational> u, int count) {
        List<Rational> y = new ArrayList<>();
        for (int n = 0; n < count; n++) {
            Rational sum = Rational.ZERO;
            for (int k = 0; k < b.size() && k <= n; k++) {
                sum = sum.add(b.get(k).multiply(u.apply(n - k)));
            }
            for (int k = 1; k < a.size() && k <= n; k++) {
                sum = sum.subtract(a.get(k).multiply(y.get(n - k)));
            }
            y.add(sum.divide(a.get(0)));
        }
        return y;
    }

    /** The input samples for n ≥ 0, written out here independently of the tool's parser. */
    private static LongFunction<Rational> signal(String input) {
        switch (input) {
            case "impulse": return n -> n == 0 ? Rational.ONE : Rational.ZERO;
            case "step": return n -> Rational.ONE;
            case "ramp": return Rational::of;
            case "(1/2)^n": return n -> Rational.of(1, 2).pow((int) n);
            case "(-1)^n": return n -> n % 2 == 0 ? Rational.ONE : Rational.MINUS_ONE;
            case "cos(pi n/2)": return n -> n % 2 == 1 ? Rational.ZERO : n % 4 == 0 ? Rational.ONE : Rational.MINUS_ONE;
            case "n^2": return n -> Rational.of(n * n);
            case "(0.9)^n": return n -> Rational.parse("0.9").pow((int) n);
            default: throw new IllegalArgumentException(input);
        }
    }

    private static List<Rational> coefficients(String text) {
        return java.util.Arrays.stream(text.trim().split("\\s+")).map(Rational::parse).toList();
    }

    /** c0 + c1 z^-1 + … as the user writes it. */
    private static String polynomial(List<Rational> c) {
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < c.size(); k++) {
            sb.append(k == 0 ? "" : " + ").append("(").append(c.get(k)).append(")").append(k == 0 ? "" : "z^-" + k);
        }
        return sb.toString();
    }
}
