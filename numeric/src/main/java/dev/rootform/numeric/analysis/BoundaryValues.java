package dev.rootform.numeric.analysis;

import dev.rootform.numeric.check.ForcingFunction;
import dev.rootform.numeric.check.OdeReference;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.parse.InputException;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The free constants C1..Ck of a differential equation whose constants are not exact rationals
 * (conditions at several points — a boundary-value problem —, at a multiple of π, or transcendental
 * forcing with conditions away from t = 0): y = y_p + Σ C_j φ_j with the exact basis φ_j of the general solution
 * and the exact particular solution y_p, so that Σ_j C_j φ_j^(d_i)(t_i) = v_i - y_p^(d_i)(t_i).
 * The entries involve e^{α t_i} and are not exact rationals, so the k×k system is solved by
 * Gaussian elimination with partial pivoting in apfloat, at a working precision raised until two
 * precisions agree to the requested digits. A pivot that vanishes at that precision means the
 * conditions leave a solution free or contradict each other (which of the two cannot be told
 * numerically); that is reported, never papered over.
 */
final class BoundaryValues {
    private final Solution solution;
    private final List<ModeSum> basis;
    private final Optional<ModeSum> particular;
    private final List<Apfloat> constants;
    private final long precision;

    private BoundaryValues(Solution solution, List<ModeSum> basis, Optional<ModeSum> particular, List<Apfloat> constants,
            long precision) {
        this.solution = solution;
        this.basis = basis;
        this.particular = particular;
        this.constants = constants;
        this.precision = precision;
    }

    /**
     * @throws InputException if the system is singular at the working precision
     * @throws IllegalStateException if the constants do not settle within the precision budget
     */
    static BoundaryValues solve(Solution solution, int digits, RootCache cache) {
        int working = digits + Analyzer.GUARD_DIGITS;
        while (working <= Analyzer.MAX_WORKING_DIGITS) {
            BoundaryValues low = at(solution, working, cache);
            BoundaryValues high = at(solution, working + Analyzer.GUARD_DIGITS, cache);
            if (agree(low.constants, high.constants, digits + 2)) {
                return high;
            }
            working *= 2;
        }
        throw new IllegalStateException("the boundary-value constants did not settle within "
                + Analyzer.MAX_WORKING_DIGITS + " digits");
    }

    private static BoundaryValues at(Solution solution, int working, RootCache cache) {
        List<ModeSum> basis = ModeSum.basis(solution.general(), cache, working);
        Optional<ModeSum> particular = solution.particular().map(p -> ModeSum.of(p, cache, working));
        List<Condition> conditions = solution.problem().conditions();
        int k = basis.size();
        Apfloat[][] a = new Apfloat[k][k + 1];
        for (int i = 0; i < k; i++) {
            Condition c = conditions.get(i);
            Apfloat t = point(c, working);
            for (int j = 0; j < k; j++) {
                a[i][j] = basis.get(j).derivative(c.derivative(), t);
            }
            Apfloat rhs = Decimals.toApfloat(c.value(), working);
            a[i][k] = particular.isPresent() ? rhs.subtract(particular.get().derivative(c.derivative(), t)) : rhs;
        }
        return new BoundaryValues(solution, basis, particular, eliminate(a, working, solution), working);
    }

    /** The condition's point at the working precision: at, or at·π. */
    static Apfloat point(Condition c, long precision) {
        Apfloat at = Decimals.toApfloat(c.at(), precision);
        return c.atTimesPi() ? at.multiply(ApfloatMath.pi(precision)) : at;
    }

    /**
     * Gauss–Jordan elimination with partial pivoting; an entry below 10^-(working - 10) of its row's
     * scale counts as zero. A singular system is explained: contradictory conditions, or a free
     * solution Σ v_j·C_j-basis (the kernel vector, largest entry 1) that can be added.
     */
    private static List<Apfloat> eliminate(Apfloat[][] a, long working, Solution solution) {
        int k = a.length;
        Apfloat tiny = new Apfloat("1e-" + (working - 10), working);
        Apfloat[] scales = new Apfloat[k];
        for (int r = 0; r < k; r++) {
            scales[r] = scale(a, r);
        }
        int[] pivotRow = new int[k];
        java.util.Arrays.fill(pivotRow, -1);
        int rank = 0;
        for (int c = 0; c < k; c++) {
            int p = -1;
            for (int r = rank; r < k; r++) {
                if (ApfloatMath.abs(a[r][c]).compareTo(tiny.multiply(scales[r])) > 0
                        && (p < 0 || ApfloatMath.abs(a[r][c]).compareTo(ApfloatMath.abs(a[p][c])) > 0)) {
                    p = r;
                }
            }
            if (p < 0) {
                continue;
            }
            swap(a, scales, p, rank);
            for (int r = 0; r < k; r++) {
                if (r != rank) {
                    Apfloat f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j <= k; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotRow[c] = rank++;
        }
        if (rank < k) {
            throw BoundarySingularity.explain(a, pivotRow, rank, tiny, scales, working, solution);
        }
        Apfloat[] x = new Apfloat[k];
        for (int c = 0; c < k; c++) {
            x[c] = a[pivotRow[c]][k].divide(a[pivotRow[c]][c]);
        }
        return List.of(x);
    }

    private static void swap(Apfloat[][] a, Apfloat[] scales, int i, int j) {
        Apfloat[] row = a[i];
        a[i] = a[j];
        a[j] = row;
        Apfloat s = scales[i];
        scales[i] = scales[j];
        scales[j] = s;
    }

    /** Which of the two ways a singular system fails, and why, as one line. */
    private static Apfloat scale(Apfloat[][] a, int row) {
        Apfloat max = Apfloat.ONE;
        for (int j = 0; j < a.length; j++) {
            Apfloat v = ApfloatMath.abs(a[row][j]);
            max = v.compareTo(max) > 0 ? v : max;
        }
        return max;
    }

    private static boolean agree(List<Apfloat> x, List<Apfloat> y, int digits) {
        for (int i = 0; i < x.size(); i++) {
            Apfloat d = ApfloatMath.abs(x.get(i).subtract(y.get(i)));
            Apfloat unit = new Apfloat("1e-" + digits, digits + Analyzer.GUARD_DIGITS);
            if (d.compareTo(ApfloatMath.abs(y.get(i)).add(unit).multiply(unit)) > 0) {
                return false;
            }
        }
        return true;
    }

    /** The constants C1..Ck to {@code digits} significant digits. */
    List<BigDecimal> constants(int digits) {
        return constants.stream().map(c -> Decimals.toBigDecimal(c, digits)).toList();
    }

    /** y^(d)(t) at the working precision. */
    Apfloat derivative(int d, Rational t) {
        return derivative(d, Decimals.toApfloat(t, precision));
    }

    /** y^(d)(t) at a point given in the working precision. */
    Apfloat derivative(int d, Apfloat t) {
        Apfloat sum = particular.map(p -> p.derivative(d, t)).orElse(Apfloat.ZERO);
        for (int j = 0; j < basis.size(); j++) {
            sum = sum.add(constants.get(j).multiply(basis.get(j).derivative(d, t)));
        }
        return sum;
    }

    /** Each condition re-evaluated with the solved constants at the working precision. */
    Check conditionsCheck(int digits) {
        Apfloat worst = Apfloat.ZERO;
        for (Condition c : solution.problem().conditions()) {
            Apfloat v = Decimals.toApfloat(c.value(), precision);
            Apfloat error = ApfloatMath.abs(derivative(c.derivative(), point(c, precision)).subtract(v))
                    .divide(ApfloatMath.abs(v).add(new Apfloat(1, v.precision())));
            worst = error.compareTo(worst) > 0 ? error : worst;
        }
        boolean passed = worst.compareTo(new Apfloat("1e-" + digits, precision)) <= 0;
        return new Check("meets the conditions", passed, "constants solved numerically; largest residual "
                + Decimals.toBigDecimal(worst, 3) + " (relative, tolerance 1e-" + digits + ")");
    }

    /**
     * Integrates the equation with Dormand–Prince 8(5,3) from the first condition point, starting
     * from this solution's derivatives there, and compares with the solution at the other
     * condition points and at t0 + {@link Analyzer#CHECK_OFFSETS}.
     */
    Check integratorCheck() {
        List<Condition> conditions = solution.problem().conditions();
        // the start, rounded to a rational when it is a multiple of π; the derivatives are taken there
        Rational t0 = Rational.of(Decimals.toBigDecimal(point(conditions.get(0), precision), 40));
        int k = solution.problem().equation().order();
        List<Rational> initial = new ArrayList<>();
        for (int d = 0; d < k; d++) {
            initial.add(Rational.of(Decimals.toBigDecimal(derivative(d, t0), 30)));
        }
        List<Apfloat> points = new ArrayList<>();
        for (Condition c : conditions) {
            if (!c.samePoint(conditions.get(0))) {
                points.add(point(c, precision));
            }
        }
        for (double offset : Analyzer.CHECK_OFFSETS) {
            points.add(Decimals.toApfloat(t0, precision).add(new Apfloat(offset, precision)));
        }
        double[] at = points.stream().mapToDouble(Apfloat::doubleValue).toArray();
        double[] reference = OdeReference.values(solution.problem().equation().coefficients(),
                ForcingFunction.of(solution.problem().equation().forcing()), t0, initial, at);
        double worst = 0;
        double scale = 1;
        for (int i = 0; i < at.length; i++) {
            double closed = derivative(0, points.get(i)).doubleValue();
            worst = Math.max(worst, Math.abs(reference[i] - closed));
            scale = Math.max(scale, Math.abs(closed));
        }
        boolean passed = worst <= Analyzer.CHECK_TOLERANCE * scale;
        return new Check("agrees with numerical integration", passed, String.format(
                "Dormand-Prince 8(5,3) (Commons Math) from t = %s to the other condition points and t0 + %s: "
                        + "largest difference %.2e (tolerance %.0e relative)", conditions.get(0).point(),
                java.util.Arrays.toString(Analyzer.CHECK_OFFSETS), worst, Analyzer.CHECK_TOLERANCE));
    }
}
