package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.DoubleUnaryOperator;
import java.util.function.IntFunction;
import org.apfloat.Apcomplex;
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
    /**
     * Generic points where L y = g is imposed on a trial form, as many as it has constants: the k-th
     * is 0.3 + k·(√5 − 1)/2 (the golden-ratio steps never meet a residual point or each other).
     */
    private static final BigDecimal COLLOCATION_START = new BigDecimal("0.3");
    private static final BigDecimal COLLOCATION_STEP = new BigDecimal("0.61803398874989484820");
    /** Further points where the residual L y - g of a trial form is checked afterwards. */
    private static final String[] RESIDUAL_POINTS = {"0.77", "1.9", "3.14159"};

    private final Solution solution;
    private final List<ModeSum> basis;
    private final int first;
    private final Optional<ModeSum> particular;
    private final Map<String, Apfloat> constants;
    private final long precision;

    private BoundaryValues(Solution solution, List<ModeSum> basis, int first, Optional<ModeSum> particular,
            Map<String, Apfloat> constants, long precision) {
        this.solution = solution;
        this.basis = basis;
        this.first = first;
        this.particular = particular;
        this.constants = constants;
        this.precision = precision;
    }

    /**
     * @throws ConditionsException if the system is singular at the working precision
     * @throws IllegalStateException if the constants do not settle within the precision budget
     */
    static BoundaryValues solve(Solution solution, int digits, RootCache cache) {
        return WorkingPrecision.settle(digits, working -> at(solution, working, cache),
                (low, high, working) -> agree(low.constants, high.constants, digits + 2),
                (working, high) -> working * 2, "the boundary-value constants");
    }

    /**
     * The unknown constants: all free constants when conditions are given, else only those of the
     * trial form (P1..), which L y = g fixes at collocation points; the rows are the conditions, then
     * one collocation row per remaining unknown.
     */
    private static BoundaryValues at(Solution solution, int working, RootCache cache) {
        ClosedForm form = solution.closedForm();
        List<ModeSum> basis = ModeSum.basis(form, cache, working);
        Optional<ModeSum> particular = solution.particular().map(p -> ModeSum.of(p, cache, working));
        List<Condition> conditions = solution.problem().conditions();
        int first = conditions.isEmpty() ? solution.general().freeConstants().size() : 0;
        int n = basis.size() - first;
        LinearEquation eq = solution.problem().equation();
        Apfloat[][] a = new Apfloat[n][n + 1];
        for (int row = 0; row < n; row++) {
            Deadline.checkCurrent();
            boolean condition = row < conditions.size();
            Condition c = condition ? conditions.get(row) : null;
            Apfloat t = condition ? point(c, working) : collocation(row - conditions.size(), working);
            for (int j = 0; j < n; j++) {
                ModeSum f = basis.get(first + j);
                a[row][j] = condition ? f.derivative(c.derivative(), t) : applied(eq, f, t);
            }
            Apfloat known = particular.map(p -> condition ? p.derivative(c.derivative(), t) : applied(eq, p, t))
                    .orElse(Apfloat.ZERO);
            a[row][n] = (condition ? Decimals.toApfloat(c.value(), working) : forcing(eq, t, working)).subtract(known);
        }
        List<String> names = form.freeConstants().subList(first, basis.size());
        List<Apfloat> x = eliminate(a, working, solution, names);
        Map<String, Apfloat> constants = new LinkedHashMap<>();
        for (int j = 0; j < n; j++) {
            constants.put(names.get(j), x.get(j));
        }
        return new BoundaryValues(solution, basis, first, particular, constants, working);
    }

    /** The k-th collocation point (from 0). */
    private static Apfloat collocation(int k, int working) {
        return new Apfloat(COLLOCATION_START.add(COLLOCATION_STEP.multiply(BigDecimal.valueOf(k))), working);
    }

    /** (L f)(t) = Σ a_l f^(l)(t). */
    private static Apfloat applied(LinearEquation eq, ModeSum f, Apfloat t) {
        return applied(eq, l -> f.derivative(l, t), t.precision());
    }

    /** Σ a_l·derivative(l) for the derivatives of some function at one point. */
    private static Apfloat applied(LinearEquation eq, IntFunction<Apfloat> derivative, long precision) {
        Apfloat sum = Apfloat.ZERO;
        for (int l = 0; l <= eq.order(); l++) {
            Rational a = eq.coefficients().get(l);
            if (!a.isZero()) {
                sum = sum.add(Decimals.toApfloat(a, precision).multiply(derivative.apply(l)));
            }
        }
        return sum;
    }

    /** The right-hand side g(t) = Σ c·t^p·e^{at}·(1, cos ωt or sin ωt) at the working precision. */
    private static Apfloat forcing(LinearEquation eq, Apfloat t, long precision) {
        Apfloat sum = Apfloat.ZERO;
        for (ForcingTerm term : eq.forcing()) {
            Apfloat w = Decimals.toApfloat(term.frequency(), precision);
            w = term.frequencyTimesPi() ? w.multiply(ApfloatMath.pi(precision)) : w;
            Apcomplex e = ComplexExp.exp(new Apcomplex(Decimals.toApfloat(term.exponential(), precision).multiply(t),
                    w.multiply(t)), precision);
            Apfloat wave = switch (term.oscillation()) {
                case NONE, COS -> e.real();
                case SIN -> e.imag();
            };
            sum = sum.add(Decimals.toApfloat(term.coefficient(), precision).multiply(ApfloatMath.pow(t, term.power())).multiply(wave));
        }
        return sum;
    }

    /** The condition's point at the working precision: at, or at·π. */
    static Apfloat point(Condition c, long precision) {
        Apfloat at = Decimals.toApfloat(c.at(), precision);
        return c.atTimesPi() ? at.multiply(ApfloatMath.pi(precision)) : at;
    }

    /**
     * The solution of the system by {@link Elimination}; a singular system is explained:
     * contradictory conditions, or a free solution Σ v_j·C_j-basis (the kernel vector, largest
     * entry 1) that can be added.
     */
    private static List<Apfloat> eliminate(Apfloat[][] a, long working, Solution solution, List<String> names) {
        Elimination.Reduced r = Elimination.reduce(a, working);
        if (r.singular()) {
            throw BoundarySingularity.explain(r.a(), r.pivotRow(), r.rank(), r.tiny(), r.scales(), working, solution, names);
        }
        return r.solution();
    }

    /** Whether every value of {@code y} agrees with the one of {@code x} of the same name to {@code digits}. */
    static boolean agree(Map<String, Apfloat> x, Map<String, Apfloat> y, int digits) {
        for (Map.Entry<String, Apfloat> e : y.entrySet()) {
            Apfloat d = ApfloatMath.abs(x.get(e.getKey()).subtract(e.getValue()));
            Apfloat unit = new Apfloat("1e-" + digits, digits + WorkingPrecision.GUARD_DIGITS);
            if (d.compareTo(ApfloatMath.abs(e.getValue()).add(unit).multiply(unit)) > 0) {
                return false;
            }
        }
        return true;
    }

    /** The constants this problem fixes (C1..Ck and P1.., or only P1.. without conditions), to {@code digits}. */
    Map<String, BigDecimal> constants(int digits) {
        Map<String, BigDecimal> out = new LinkedHashMap<>();
        constants.forEach((name, value) -> out.put(name, Decimals.toBigDecimal(value, digits)));
        return out;
    }

    /** y^(d)(t) at the working precision. */
    Apfloat derivative(int d, Rational t) {
        return derivative(d, Decimals.toApfloat(t, precision));
    }

    /** y^(d)(t) at a point given in the working precision. */
    Apfloat derivative(int d, Apfloat t) {
        Apfloat sum = particular.map(p -> p.derivative(d, t)).orElse(Apfloat.ZERO);
        List<Apfloat> values = List.copyOf(constants.values());
        for (int j = 0; j < values.size(); j++) {
            sum = sum.add(values.get(j).multiply(basis.get(first + j).derivative(d, t)));
        }
        return sum;
    }

    /**
     * The solution in double precision, for plots: the whole of it, or only its particular
     * (steady) part — the exact particular solution plus the numerically fixed constants of the
     * closed form's particular terms (a trial form's P1..).
     */
    DoubleUnaryOperator inDoubles(boolean steadyOnly) {
        Set<String> particularNames = new HashSet<>();
        solution.closedForm().particularTerms().forEach(term -> term.coefficients().forEach(c -> {
            if (c instanceof Coefficient.Free free) {
                particularNames.add(free.name());
            }
        }));
        List<DoubleUnaryOperator> parts = new ArrayList<>();
        particular.ifPresent(p -> parts.add(p.inDoubles()));
        List<String> names = List.copyOf(constants.keySet());
        List<Apfloat> values = List.copyOf(constants.values());
        for (int j = 0; j < values.size(); j++) {
            if (!steadyOnly || particularNames.contains(names.get(j))) {
                double c = values.get(j).doubleValue();
                DoubleUnaryOperator f = basis.get(first + j).inDoubles();
                parts.add(t -> c * f.applyAsDouble(t));
            }
        }
        return t -> parts.stream().mapToDouble(f -> f.applyAsDouble(t)).sum();
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

    /** The residual L y - g at points other than the collocation points, relative to max(1, |g|). */
    Check residualCheck(int digits) {
        LinearEquation eq = solution.problem().equation();
        Apfloat worst = Apfloat.ZERO;
        for (String p : RESIDUAL_POINTS) {
            Apfloat t = new Apfloat(p, precision);
            Apfloat g = forcing(eq, t, precision);
            Apfloat residual = ApfloatMath.abs(applied(eq, l -> derivative(l, t), precision).subtract(g));
            Apfloat relative = residual.divide(ApfloatMath.abs(g).add(new Apfloat(1, precision)));
            worst = relative.compareTo(worst) > 0 ? relative : worst;
        }
        boolean passed = worst.compareTo(new Apfloat("1e-" + digits, precision)) <= 0;
        return new Check("satisfies the equation", passed, "trial form fitted at collocation points; residual L y - g "
                + "at t = " + String.join(", ", RESIDUAL_POINTS) + ": largest " + Decimals.toBigDecimal(worst, 3)
                + " (relative, tolerance 1e-" + digits + ")");
    }

    /**
     * The integrator cross-check from the first condition point t0, starting from this solution's
     * derivatives there, on the problem's time scales and at the other condition points.
     */
    Check integratorCheck(TimeScales scales) {
        List<Condition> conditions = solution.problem().conditions();
        // the start, rounded to a rational when it is a multiple of π; the derivatives are taken there
        Rational t0 = Rational.of(Decimals.toBigDecimal(point(conditions.get(0), precision), 40));
        List<Double> others = new ArrayList<>();
        for (Condition c : conditions) {
            if (!c.samePoint(conditions.get(0))) {
                others.add(point(c, precision).doubleValue());
            }
        }
        IntegratorCheck.Solved closed = new IntegratorCheck.Solved() {
            @Override
            public double value(double t) {
                return derivative(0, new Apfloat(new BigDecimal(t), precision)).doubleValue();
            }

            @Override
            public List<Rational> state(Rational t) {
                List<Rational> state = new ArrayList<>();
                for (int d = 0; d < solution.problem().equation().order(); d++) {
                    state.add(Rational.of(Decimals.toBigDecimal(derivative(d, t), Analyzer.STATE_DIGITS)));
                }
                return state;
            }
        };
        return IntegratorCheck.compare(solution.problem().equation(), t0, closed.state(t0), scales, others, closed,
                "t = " + conditions.get(0).point());
    }
}
