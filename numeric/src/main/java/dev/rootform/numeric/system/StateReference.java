package dev.rootform.numeric.system;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.statespace.InputCalculus;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Independent references for the state of x' = Ax + b·u(t) and x[n+1] = Ax[n] + b·u[n], taken
 * straight from the matrices (not from the scalar equations the closed forms solve):
 * <ul>
 *   <li>continuous: Commons Math's Dormand–Prince 8(5,3) integrator (DOP853; Hairer, Nørsett,
 *       Wanner, Solving Ordinary Differential Equations I, 2nd ed., Springer 1993) on the n-state
 *       system, approximate, at relative tolerance {@link #RELATIVE_TOLERANCE};</li>
 *   <li>discrete: exact rational iteration of the state equation.</li>
 * </ul>
 *
 * @since 0.3
 */
public final class StateReference {
    /** Relative tolerance of the integrator's step-size control. */
    public static final double RELATIVE_TOLERANCE = 1e-12;

    private StateReference() {
    }

    /**
     * x(t) at each point by integration from x(0) = x0; one integration from 0 per point.
     *
     * @param u the input as forcing terms (empty for none)
     * @return states[point][i]
     */
    public static double[][] integrate(RationalMatrix a, List<Rational> b, List<ForcingTerm> u, List<Rational> x0,
            double[] points) {
        int n = a.rows();
        double[][] am = new double[n][n];
        double[] bv = new double[n];
        double[] start = new double[n];
        double scale = 1;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                am[i][j] = a.get(i, j).doubleValue();
            }
            bv[i] = b.get(i).doubleValue();
            start[i] = x0.get(i).doubleValue();
            scale = Math.max(scale, Math.abs(start[i]));
        }
        DoubleUnaryOperator input = ForcingFunction.of(u);
        FirstOrderDifferentialEquations system = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                double ut = input.applyAsDouble(t);
                for (int i = 0; i < n; i++) {
                    double s = bv[i] * ut;
                    for (int j = 0; j < n; j++) {
                        s += am[i][j] * x[j];
                    }
                    dx[i] = s;
                }
            }
        };
        double[][] result = new double[points.length][];
        for (int p = 0; p < points.length; p++) {
            Deadline.checkCurrent();
            double[] state = start.clone();
            double span = Math.abs(points[p]);
            if (span > 0) {
                new DormandPrince853Integrator(1e-14 * span, span, RELATIVE_TOLERANCE * scale, RELATIVE_TOLERANCE)
                        .integrate(system, 0, state, points[p], state);
            }
            result[p] = state;
        }
        return result;
    }

    /**
     * x[0..last] by exact iteration from x[0] = x0.
     *
     * @param pulse true for the unit pulse input δ[n] (then {@code u} is ignored)
     */
    public static List<List<Rational>> iterate(RationalMatrix a, List<Rational> b, List<ForcingTerm> u, boolean pulse,
            List<Rational> x0, long last) {
        List<List<Rational>> states = new ArrayList<>();
        states.add(List.copyOf(x0));
        for (long m = 0; m < last; m++) {
            Deadline.checkCurrent();
            Rational um = pulse ? (m == 0 ? Rational.ONE : Rational.ZERO) : InputCalculus.valueAt(Domain.DIFFERENCE, u, m);
            List<Rational> ax = a.multiply(states.get((int) m));
            List<Rational> next = new ArrayList<>();
            for (int i = 0; i < ax.size(); i++) {
                next.add(ax.get(i).add(b.get(i).multiply(um)));
            }
            states.add(next);
        }
        return states;
    }
}
