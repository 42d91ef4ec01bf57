package dev.rootform.api;

import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.system.StateReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.statespace.Input;
import dev.rootform.symbolic.statespace.InputCalculus;
import dev.rootform.symbolic.statespace.StateModel;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * The response's closed forms against the state equation itself: Dormand–Prince integration of
 * x' = Ax + b·u (continuous) or exact iteration of x[n+1] = Ax[n] + b·u[n] (discrete), states and
 * outputs y = Cx + D·1·u, at points of its own.
 */
final class ResponseCheck {
    /** Points t at which a continuous response is integrated. */
    private static final List<Rational> TIMES = List.of(Rational.of(1, 4), Rational.of(1, 2), Rational.ONE, Rational.of(2));
    /** A far index at which a discrete response is compared, besides the first ones. */
    private static final long FAR_INDEX = 30;
    /** Relative agreement required of the integrator. */
    private static final double TOLERANCE = 1e-7;

    private final StateModel model;
    private final List<Rational> x0;
    private final Input input;
    private final List<Rational> b;
    private final List<Rational> dd;

    ResponseCheck(StateModel model, List<Rational> x0, Input input) {
        this.model = model;
        this.x0 = x0;
        this.input = input;
        RationalMatrix ones = RationalMatrix.column(Collections.nCopies(model.inputs(), Rational.ONE));
        this.b = model.b().multiply(ones).column(0);
        this.dd = model.d().multiply(ones).column(0);
    }

    private boolean pulse() {
        return input instanceof Input.Impulse;
    }

    /** The points this check needs values at: t = 1/4, 1/2, 1, 2, or n = first..d+3 and 30. */
    List<Rational> points(int order) {
        if (model.continuous()) {
            return TIMES;
        }
        List<Rational> points = new ArrayList<>();
        for (int n = pulse() ? 1 : 0; n <= order + 3; n++) {
            points.add(Rational.of(n));
        }
        points.add(Rational.of(FAR_INDEX));
        return points;
    }

    /**
     * @param offset where this check's points start in each report's values
     * @param order the degree of the minimal polynomial, as given to {@link #points(int)}
     */
    Check check(List<SignalReport> states, List<SignalReport> outputs, int offset, int order) {
        List<Rational> points = points(order);
        return model.continuous() ? integrated(states, outputs, offset, points) : iterated(states, outputs, offset, points);
    }

    private Check integrated(List<SignalReport> states, List<SignalReport> outputs, int offset, List<Rational> points) {
        double[] t = points.stream().mapToDouble(Rational::doubleValue).toArray();
        List<ForcingTerm> u = input.terms(model.domain());
        List<Rational> start = pulse() ? add(x0, b) : x0;
        double[][] x = StateReference.integrate(model.a(), b, u, start, t);
        DoubleUnaryOperator uf = ForcingFunction.of(u);
        double worst = 0;
        for (int p = 0; p < t.length; p++) {
            double[] y = new double[model.outputs()];
            for (int r = 0; r < y.length; r++) {
                y[r] = dd.get(r).doubleValue() * (pulse() ? 0 : uf.applyAsDouble(t[p]));
                for (int j = 0; j < model.states(); j++) {
                    y[r] += model.c().get(r, j).doubleValue() * x[p][j];
                }
            }
            worst = Math.max(worst, difference(states, offset + p, x[p]));
            worst = Math.max(worst, difference(outputs, offset + p, y));
        }
        boolean ok = worst <= TOLERANCE;
        return new Check("agrees with the state equation", ok, String.format(java.util.Locale.ROOT,
                "Dormand-Prince 8(5,3) (Commons Math) on the %d-state system at t = 0.25, 0.5, 1, 2: largest relative"
                        + " difference of states and outputs %.2e (tolerance %.0e)", model.states(), worst, TOLERANCE));
    }

    /** Largest |closed − reference|/max(1, |reference|) over the signals. */
    private static double difference(List<SignalReport> signals, int index, double[] reference) {
        double worst = 0;
        for (int i = 0; i < signals.size(); i++) {
            double closed = signals.get(i).report().values().get(index).value().doubleValue();
            worst = Math.max(worst, Math.abs(closed - reference[i]) / Math.max(1, Math.abs(reference[i])));
        }
        return worst;
    }

    private Check iterated(List<SignalReport> states, List<SignalReport> outputs, int offset, List<Rational> points) {
        long last = points.get(points.size() - 1).toBigInteger().longValueExact();
        List<List<Rational>> x = StateReference.iterate(model.a(), b, input.terms(model.domain()), pulse(), x0, last);
        for (int p = 0; p < points.size(); p++) {
            int n = points.get(p).toBigInteger().intValueExact();
            Rational u = pulse() ? (n == 0 ? Rational.ONE : Rational.ZERO) : InputCalculus.valueAt(Domain.DIFFERENCE, input.terms(model.domain()), n);
            List<Rational> y = add(model.c().multiply(x.get(n)), dd.stream().map(v -> v.multiply(u)).toList());
            String differs = differs(states, offset + p, x.get(n), "x", n);
            if (differs.isEmpty()) {
                differs = differs(outputs, offset + p, y, "y", n);
            }
            if (!differs.isEmpty()) {
                return new Check("agrees with the state equation", false, differs);
            }
        }
        return new Check("agrees with the state equation", true, "exact rational iteration of x[n+1] = Ax[n] + Bu[n]"
                + " and y[n] = Cx[n] + Du[n] at n = " + points.get(0) + ".." + points.get(points.size() - 2) + " and "
                + last + ": every state and output equal");
    }

    private static String differs(List<SignalReport> signals, int index, List<Rational> reference, String name, int n) {
        for (int i = 0; i < signals.size(); i++) {
            PointValue v = signals.get(i).report().values().get(index);
            if (!v.exact().map(reference.get(i)::equals).orElse(false)) {
                return name + (i + 1) + "[" + n + "]: closed form gives " + v.exactText().orElse(v.value().toString())
                        + ", iteration " + reference.get(i);
            }
        }
        return "";
    }

    private static List<Rational> add(List<Rational> a, List<Rational> c) {
        List<Rational> s = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            s.add(a.get(i).add(c.get(i)));
        }
        return s;
    }
}
