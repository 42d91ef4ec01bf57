package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The constants of a differential equation's boundary-value problem (conditions at several points,
 * or at a multiple of π) fitted exactly, when the system's entries are exact: y = y_p + Σ_j C_j·φ_j
 * with Σ_j C_j·φ_j^(d_i)(t_i) = v_i − y_p^(d_i)(t_i), every entry evaluated by
 * {@link ExactPointValues} in one real quadratic field Q(√r) (polynomial bases at rational points;
 * cos and sin at rational multiples of π with rational or surd values; anything at t = 0) and solved
 * by Gaussian elimination there. The result is the exact initial state y^(d)(0), d &lt; k, from which
 * the solution is fitted exactly as an initial-value problem. Empty when an entry is not exact
 * (transcendental, or outside one quadratic field) or the system is singular (the numeric layer then
 * explains it).
 */
final class ExactBoundaryFit {
    private ExactBoundaryFit() {
    }

    /**
     * y^(d)(0) for d = 0..order−1 of the solution that meets the conditions, exactly.
     *
     * @param form the general solution with free constants (origin 0), plus exact particular terms
     */
    static Optional<List<Surd>> initialState(ClosedForm form, List<Condition> conditions, int order) {
        List<Unit> basis = basis(form);
        int k = basis.size();
        if (k != conditions.size()) {
            return Optional.empty();
        }
        Surd[][] a = new Surd[k][k + 1];
        for (int i = 0; i < k; i++) {
            Condition c = conditions.get(i);
            for (int j = 0; j < k; j++) {
                Optional<Surd> entry = basis.get(j).derivative(c.derivative(), c);
                if (entry.isEmpty()) {
                    return Optional.empty();
                }
                a[i][j] = entry.get();
            }
            Optional<Surd> particular = particular(form, c.derivative(), c);
            if (particular.isEmpty()) {
                return Optional.empty();
            }
            a[i][k] = Surd.of(c.value()).add(particular.get().negate());
        }
        Optional<List<Surd>> constants;
        try {
            constants = solve(a);
        } catch (ArithmeticException secondRadicand) {
            return Optional.empty();
        }
        if (constants.isEmpty()) {
            return Optional.empty();
        }
        List<Surd> state = new ArrayList<>();
        Condition origin = new Condition(0, Rational.ZERO, Rational.ZERO);
        for (int d = 0; d < order; d++) {
            Surd y = particular(form, d, origin).orElseThrow();
            for (int j = 0; j < k; j++) {
                try {
                    y = y.add(constants.get().get(j).multiply(basis.get(j).derivative(d, origin).orElseThrow()));
                } catch (ArithmeticException secondRadicand) {
                    return Optional.empty();
                }
            }
            state.add(y);
        }
        return Optional.of(state);
    }

    /** One free constant: its term and its position among the term's coefficients. */
    private record Unit(Term term, int index) {
        Optional<Surd> derivative(int d, Condition at) {
            return ExactPointValues.derivative(term, index, d, at);
        }
    }

    /** The basis functions, one per free constant, in the order of the constants. */
    private static List<Unit> basis(ClosedForm form) {
        List<Unit> units = new ArrayList<>();
        for (Term t : form.terms()) {
            for (int j = 0; j < t.coefficients().size(); j++) {
                if (t.coefficients().get(j) instanceof Coefficient.Free) {
                    units.add(new Unit(t, j));
                }
            }
        }
        return units;
    }

    /** D^d of the exact (particular) terms at the point. */
    private static Optional<Surd> particular(ClosedForm form, int d, Condition at) {
        Surd sum = Surd.of(Rational.ZERO);
        for (Term t : form.terms()) {
            Optional<Surd> v = ExactPointValues.derivative(t, -1, d, at);
            if (v.isEmpty()) {
                return Optional.empty();
            }
            sum = sum.add(v.get());
        }
        return Optional.of(sum);
    }

    /** Gauss–Jordan elimination over Q(√r) on the augmented matrix; empty when singular. */
    private static Optional<List<Surd>> solve(Surd[][] a) {
        int k = a.length;
        for (int c = 0; c < k; c++) {
            Deadline.checkCurrent();
            int p = c;
            while (p < k && a[p][c].isZero()) {
                p++;
            }
            if (p == k) {
                return Optional.empty();
            }
            Surd[] row = a[p];
            a[p] = a[c];
            a[c] = row;
            Surd inverse = a[c][c].inverse();
            for (int j = c; j <= k; j++) {
                a[c][j] = a[c][j].multiply(inverse);
            }
            for (int r = 0; r < k; r++) {
                if (r != c && !a[r][c].isZero()) {
                    Surd f = a[r][c];
                    for (int j = c; j <= k; j++) {
                        a[r][j] = a[r][j].add(f.multiply(a[c][j]).negate());
                    }
                }
            }
        }
        List<Surd> x = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            x.add(a[i][k]);
        }
        return Optional.of(x);
    }
}
