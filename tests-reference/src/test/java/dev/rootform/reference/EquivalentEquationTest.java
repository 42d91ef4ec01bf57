package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.export.Report;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The equations a response shows, checked two ways. The solved problem, pasted into
 * {@code rootform solve}, gives the same closed form (round trip through solve's syntax). The
 * relation den(D) y = num(D) u is integrated from rest with the input by Commons Math's
 * Dormand–Prince 8(5,3) in its controllable canonical state-space form x' = A x + B u,
 * y = C x + d u (common practice), which needs no derivatives of u; its values must match the
 * closed form.
 */
class EquivalentEquationTest {
    private static final double[] TIMES = {0.5, 1, 2, 3.5};

    @ParameterizedTest(name = "{0} to {1}")
    @CsvSource(delimiter = '|', value = {
        "H(s) = (s + 3)/(s^2 + 2s + 5)          | step",
        "H(s) = (s + 3)/(s^2 + 2s + 5)          | sin(2t)",
        "H(s) = (2s^2 + 1)/(s^3 + 3s^2 + 4s + 2) | e^(-t/2)",
        "H(s) = (s + 1)/(s + 4)                 | ramp",
        "H(s) = 6/((s + 1)(s + 2)(s + 3))        | cos(t)",
    })
    void relationIntegratedFromRestGivesTheResponse(String transfer, String input) {
        List<String> points = java.util.Arrays.stream(TIMES).mapToObj(Double::toString).toList();
        ResponseReport r = Responses.report(transfer, input, 20, points, List.of());
        Report solved = Answers.report(r.problem(), 20, List.of());
        assertEquals(r.response().solution().closedForm(), solved.solution().closedForm(), "round trip of " + r.problem());

        RationalPolynomial num = r.transfer().value().numerator();
        RationalPolynomial den = r.transfer().value().denominator();
        double[] reference = integrate(num, den, signal(input));
        List<PointValue> values = r.response().values();
        for (int i = 0; i < TIMES.length; i++) {
            assertEquals(reference[i], values.get(i).value().doubleValue(), 1e-9, transfer + " at t = " + TIMES[i]);
        }
    }

    private static DoubleUnaryOperator signal(String input) {
        switch (input) {
            case "step": return t -> 1;
            case "ramp": return t -> t;
            case "sin(2t)": return t -> Math.sin(2 * t);
            case "e^(-t/2)": return t -> Math.exp(-t / 2);
            case "cos(t)": return Math::cos;
            default: throw new IllegalArgumentException(input);
        }
    }

    /**
     * y at TIMES for H = num/den (den monic of degree k, deg num ≤ k): with num = d·den + r,
     * x' = A x + B u in companion form for 1/den and y = Σ r_j x_j + d·u.
     */
    private static double[] integrate(RationalPolynomial num, RationalPolynomial den, DoubleUnaryOperator u) {
        int k = den.degree();
        double d = num.degree() == k ? num.coefficient(k).doubleValue() : 0;
        RationalPolynomial rest = num.subtract(den.multiply(Rational.of(java.math.BigDecimal.valueOf(d))));
        double[] a = new double[k];
        double[] c = new double[k];
        for (int j = 0; j < k; j++) {
            a[j] = den.coefficient(j).doubleValue();
            c[j] = rest.coefficient(j).doubleValue();
        }
        FirstOrderDifferentialEquations system = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return k;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                for (int j = 0; j + 1 < k; j++) {
                    dx[j] = x[j + 1];
                }
                double top = u.applyAsDouble(t);
                for (int j = 0; j < k; j++) {
                    top -= a[j] * x[j];
                }
                dx[k - 1] = top;
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 1, 1e-13, 1e-13);
        double[] out = new double[TIMES.length];
        double[] x = new double[k];
        double t = 0;
        for (int i = 0; i < TIMES.length; i++) {
            integrator.integrate(system, t, x, TIMES[i], x);
            t = TIMES[i];
            double y = d * u.applyAsDouble(t);
            for (int j = 0; j < k; j++) {
                y += c[j] * x[j];
            }
            out[i] = y;
        }
        return out;
    }
}
