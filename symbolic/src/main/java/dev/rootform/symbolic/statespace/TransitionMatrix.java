package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.matrix.Resolvent;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;

/**
 * e^(At) (continuous) or A^n (discrete) entry by entry: entry (i, j) = Σ_k (A^k)_{ij}·φ_k, the
 * solution of μ(L)y = 0 with L^k y(0) = (A^k)_{ij}, where φ_k are the solver's fundamental
 * solutions; then the exact checks of the whole matrix.
 *
 * @param entries the closed form of each entry, row by row
 * @param exact the same entries in number-field form
 * @param checks μ(A) = 0, and X' = AX, X(0) = I (continuous) or X[n+1] = A·X[n], X[0] = I (discrete)
 * @since 0.3
 */
public record TransitionMatrix(List<List<ClosedForm>> entries, List<List<ExactSolution>> exact, List<Check> checks) {
    /** Indices n, besides 0..d, at which a discrete A^n is compared with the matrix power. */
    static final long[] FAR_INDICES = {25, 64};

    public TransitionMatrix {
        entries = entries.stream().map(List::copyOf).toList();
        exact = exact.stream().map(List::copyOf).toList();
        checks = List.copyOf(checks);
    }

    /**
     * @param fundamentals the solver's solutions φ_0..φ_{d-1} of μ(L)y = 0, fitted and exact
     */
    public static TransitionMatrix of(RationalMatrix a, RationalPolynomial minimal, List<Solution> fundamentals) {
        int n = a.rows();
        int d = minimal.degree();
        List<RationalMatrix> powers = new ArrayList<>();
        powers.add(RationalMatrix.identity(n));
        for (int k = 1; k <= d; k++) {
            powers.add(a.multiply(powers.get(k - 1)));
        }
        List<ExactSolution> phi = fundamentals.stream().map(s -> s.exact().orElseThrow()).toList();
        List<ClosedForm> forms = fundamentals.stream().map(Solution::closedForm).toList();
        ClosedForm basis = fundamentals.get(0).general();
        LinearCombination sums = LinearCombination.over(phi, basis, forms);
        List<List<ClosedForm>> entries = new ArrayList<>();
        List<List<ExactSolution>> exact = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Deadline.checkCurrent();
            List<ClosedForm> row = new ArrayList<>();
            List<ExactSolution> exactRow = new ArrayList<>();
            for (int j = 0; j < n; j++) {
                List<Rational> w = new ArrayList<>();
                for (int k = 0; k < d; k++) {
                    w.add(powers.get(k).get(i, j));
                }
                row.add(sums.closedForm(w));
                exactRow.add(sums.exact(w));
            }
            entries.add(row);
            exact.add(exactRow);
        }
        List<Check> checks = new ArrayList<>();
        checks.add(annihilates(a, minimal));
        checks.add(phi.get(0).domain() == Domain.DIFFERENTIAL ? derivatives(a, exact, d) : powersCheck(a, exact, d));
        return new TransitionMatrix(entries, exact, checks);
    }

    private static Check annihilates(RationalMatrix a, RationalPolynomial minimal) {
        boolean zero = Resolvent.evaluate(minimal, a).isZero();
        return new Check("minimal polynomial annihilates A", zero, zero ? "μ(A) = 0, computed exactly"
                : "μ(A) is not zero");
    }

    /** X^(m)(0) from every entry's exact form: X(0) = I and X^(m+1)(0) = A·X^(m)(0), m &lt; d. */
    private static Check derivatives(RationalMatrix a, List<List<ExactSolution>> x, int d) {
        Derivatives at = new Derivatives(x.get(0).get(0), d);
        RationalMatrix previous = null;
        for (int m = 0; m <= d; m++) {
            Deadline.checkCurrent();
            int order = m;
            List<List<Rational>> rows = x.stream().map(row -> row.stream().map(s -> at.of(s, order)).toList()).toList();
            RationalMatrix current = RationalMatrix.of(rows, x.size());
            RationalMatrix expected = m == 0 ? RationalMatrix.identity(a.rows()) : a.multiply(previous);
            if (!current.equals(expected)) {
                return new Check("e^(At) satisfies X' = AX, X(0) = I", false, m == 0 ? "X(0) is not I"
                        : "X^(" + m + ")(0) differs from A·X^(" + (m - 1) + ")(0)");
            }
            previous = current;
        }
        return new Check("e^(At) satisfies X' = AX, X(0) = I", true, "exact derivatives at t = 0 of every entry:"
                + " X(0) = I and X^(k+1)(0) = A·X^(k)(0) for k = 0.." + (d - 1) + "; every entry solves μ(D)y = 0"
                + " (the solver's check of φ_0..φ_" + (d - 1) + "), so X' − AX, which solves it too and starts at 0, is 0");
    }

    /** X[0] = I, X[m+1] = A·X[m] for m = 0..d, and X[n] = A^n at far indices, all exact. */
    private static Check powersCheck(RationalMatrix a, List<List<ExactSolution>> x, int d) {
        RationalMatrix previous = null;
        for (int m = 0; m <= d + 1; m++) {
            Deadline.checkCurrent();
            RationalMatrix current = matrix(x, m);
            RationalMatrix expected = m == 0 ? RationalMatrix.identity(a.rows()) : a.multiply(previous);
            if (!current.equals(expected)) {
                return new Check("A^n satisfies X[n+1] = A·X[n], X[0] = I", false, m == 0 ? "X[0] is not I"
                        : "X[" + m + "] differs from A·X[" + (m - 1) + "]");
            }
            previous = current;
        }
        for (long n : FAR_INDICES) {
            if (!matrix(x, n).equals(a.power(n))) {
                return new Check("A^n satisfies X[n+1] = A·X[n], X[0] = I", false, "X[" + n + "] differs from A^" + n);
            }
        }
        return new Check("A^n satisfies X[n+1] = A·X[n], X[0] = I", true, "exact values of every entry: X[0] = I and"
                + " X[m+1] = A·X[m] for m = 0.." + (d + 1) + ", and X[n] = A^n (repeated squaring) at n = 25, 64");
    }

    /** The matrix of entry values at n = m. */
    private static RationalMatrix matrix(List<List<ExactSolution>> x, long m) {
        List<List<Rational>> rows = new ArrayList<>();
        for (List<ExactSolution> row : x) {
            rows.add(row.stream().map(s -> s.valueAt(m)).toList());
        }
        return RationalMatrix.of(rows, x.size());
    }

    /**
     * Exact derivatives at the origin of solutions that share their factors, from the power sums
     * T_s = Tr(α^s) of each factor (computed once): for a component Σ_α Σ_i c_i(α)·t^i·e^{αt},
     * y^(m)(0) = Σ_i m!/(m−i)!·Tr(c_i(α)·α^{m−i}) = Σ_i m!/(m−i)!·Σ_l c_{i,l}·T_{l+m−i}.
     */
    private static final class Derivatives {
        private final List<List<Rational>> traces = new ArrayList<>();

        Derivatives(ExactSolution sample, int maxOrder) {
            for (var c : sample.components()) {
                NumberField k = new NumberField(c.factor().polynomial());
                List<Rational> t = new ArrayList<>();
                RationalPolynomial power = RationalPolynomial.ONE;
                for (int s = 0; s <= maxOrder + c.factor().degree(); s++) {
                    t.add(k.trace(power));
                    power = k.multiply(power, k.generator());
                }
                traces.add(t);
            }
        }

        Rational of(ExactSolution s, int m) {
            Rational sum = Rational.ZERO;
            for (int j = 0; j < s.components().size(); j++) {
                List<RationalPolynomial> c = s.components().get(j).coefficients();
                List<Rational> t = traces.get(j);
                Rational falling = Rational.ONE;
                for (int i = 0; i < c.size() && i <= m; i++) {
                    RationalPolynomial ci = c.get(i);
                    for (int l = 0; l <= ci.degree(); l++) {
                        if (!ci.coefficient(l).isZero()) {
                            sum = sum.add(falling.multiply(ci.coefficient(l)).multiply(t.get(l + m - i)));
                        }
                    }
                    falling = falling.multiply(m - i);
                }
            }
            return sum;
        }
    }
}
