package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.SquarefreeTest;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The numeric answer of a homogeneous problem with as many conditions as its order, for when the
 * exact path cannot finish (a factorisation too hard, a number field too large). Nothing is
 * factored: χ is split into squarefree parts by Yun's algorithm (exact gcds; one modular test
 * first, as χ is usually squarefree), the roots of each part are certified by
 * {@link dev.rootform.numeric.roots.RootFinder}, the real basis u^p·e^{σu}cos ωu, u^p·e^{σu}sin ωu
 * (recurrences: n^p·ρ^n cos θn, n^p·ρ^n sin θn) is fitted to the conditions by elimination in
 * apfloat, and the constants and the values are raised in precision until two precisions agree
 * ({@link WorkingPrecision}). Checks: the conditions are met, and the recurrence is iterated from
 * the solution's first values ({@link #ITERATION_STEPS} steps) or the equation integrated
 * ({@link IntegratorCheck}) and compared.
 *
 * @since 0.2
 */
public final class NumericFallback {
    /** Steps the recurrence is iterated beyond the first k values for the check. */
    static final int ITERATION_STEPS = 30;

    private NumericFallback() {
    }

    /** Why {@code problem} with values at {@code points} has no numeric fallback, or empty when it has one. */
    public static Optional<String> refusal(Problem problem, List<Rational> points) {
        LinearEquation eq = problem.equation();
        boolean sequence = eq.domain() == Domain.DIFFERENCE;
        long limit = sequence ? Limits.MAX_INDEX : Limits.MAX_POINT;
        if (points.stream().anyMatch(p -> sequence && !p.isInteger() || p.abs().compareTo(Rational.of(limit)) > 0)) {
            return Optional.of("the numeric fallback gives values at integer indices (sequences) and points up to " + limit);
        }
        if (!eq.isHomogeneous()) {
            return Optional.of("the numeric fallback covers homogeneous equations only");
        }
        if (problem.conditions().size() != eq.order()) {
            return Optional.of("the numeric fallback needs as many conditions as the order (" + eq.order() + ")");
        }
        if (eq.domain() == Domain.DIFFERENCE && eq.coefficients().get(0).isZero()) {
            return Optional.of("the numeric fallback does not cover recurrences with the root 0");
        }
        return Optional.empty();
    }

    /**
     * The numeric solution and its values at {@code points}, to {@code digits}.
     *
     * @param reason why the exact path did not finish, for the answer
     * @throws IllegalArgumentException if {@link #refusal} is not empty
     * @throws ConditionsException if the conditions do not pick one solution (singular to the working precision)
     */
    public static NumericSolution solve(Problem problem, int digits, List<Rational> points, String reason) {
        refusal(problem, points).ifPresent(r -> {
            throw new IllegalArgumentException(r);
        });
        LinearEquation eq = problem.equation();
        List<Factor> parts = squarefreeParts(eq.characteristicPolynomial());
        Condition first = problem.conditions().get(0);
        Rational origin = eq.domain() == Domain.DIFFERENCE || first.atTimesPi() ? Rational.ZERO : first.at();
        RootCache cache = new RootCache();
        Fit fit = WorkingPrecision.settle(digits, working -> Fit.at(problem, parts, origin, points, working, cache),
                (low, high, working) -> BoundaryValues.agree(low.named(), high.named(), digits + 2),
                (working, high) -> working * 2, "the numeric constants");
        List<Check> checks = new ArrayList<>();
        checks.add(fit.conditionsCheck(digits));
        checks.add(eq.domain() == Domain.DIFFERENCE ? fit.iterationCheck(digits) : fit.integratorCheck());
        List<PointValue> values = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            values.add(new PointValue(points.get(i), Decimals.toBigDecimal(fit.values.get(i), digits), Optional.empty()));
        }
        return new NumericSolution(problem, reason, origin.toBigDecimal(new java.math.MathContext(digits)), fit.modes(digits),
                values, checks, digits);
    }

    /** The squarefree parts s_m of χ with χ = lc·Π s_m^m (Yun's algorithm), each monic. */
    static List<Factor> squarefreeParts(RationalPolynomial chi) {
        RationalPolynomial f = chi.monic();
        if (SquarefreeTest.isSquarefree(f)) {
            return List.of(new Factor(f, 1));
        }
        List<Factor> parts = new ArrayList<>();
        RationalPolynomial a0 = f.gcd(f.derivative());
        RationalPolynomial b = f.divide(a0);
        RationalPolynomial d = f.derivative().divide(a0).subtract(b.derivative());
        for (int m = 1; b.degree() > 0; m++) {
            Deadline.checkCurrent();
            RationalPolynomial a = b.gcd(d).monic();
            b = b.divide(a);
            d = d.divide(a).subtract(b.derivative());
            if (a.degree() > 0) {
                parts.add(new Factor(a, m));
            }
        }
        return parts;
    }

    /** One root with im ≥ 0 at the working precision, with its part's multiplicity and its enclosure. */
    private record Root(Apcomplex value, int multiplicity, Enclosure enclosure) {
        boolean pair() {
            return value.imag().signum() > 0;
        }
    }

    /**
     * One real basis function: Re (or, for {@code sine}, Im) of u^p·e^{λu} (differential; u = t -
     * origin) or n^p·λ^n (recurrence). Values at integer n come from powers of λ, derivatives at the
     * origin from d!/(d-p)!·λ^{d-p}; elsewhere a {@link ModeSum} evaluates them.
     */
    private record BasisFunction(Apcomplex root, int power, boolean sine, boolean sequence, Apfloat origin, ModeSum general) {
        Apfloat at(int d, Apfloat t) {
            long precision = root.precision();
            Apcomplex z;
            if (sequence) {
                long n = t.longValue();
                z = power(root, n).multiply(power(new Apfloat(n, precision), power));
            } else if (t.compareTo(origin) == 0) {
                z = d < power ? Apcomplex.ZERO : power(root, d - power).multiply(fallingFactorial(d, power, precision));
            } else {
                return general.derivative(d, t);
            }
            return sine ? z.imag() : z.real();
        }

        /** z^n, with z^0 = 1 also for z = 0. */
        private static Apcomplex power(Apcomplex z, long n) {
            return n == 0 ? new Apfloat(1, z.precision()) : ApcomplexMath.pow(z, n);
        }

        /** d·(d-1)···(d-p+1). */
        private static Apfloat fallingFactorial(int d, int p, long precision) {
            Apfloat f = new Apfloat(1, precision);
            for (int i = 0; i < p; i++) {
                f = f.multiply(new Apfloat(d - i, precision));
            }
            return f;
        }
    }

    /** The fitted solution at one working precision. */
    private static final class Fit {
        private final Problem problem;
        private final List<Root> roots;
        private final List<BasisFunction> basis;
        private final List<Apfloat> constants;
        private final List<Apfloat> values;
        private final long precision;

        private Fit(Problem problem, List<Root> roots, List<BasisFunction> basis, List<Apfloat> constants, List<Apfloat> values,
                long precision) {
            this.problem = problem;
            this.roots = roots;
            this.basis = basis;
            this.constants = constants;
            this.values = values;
            this.precision = precision;
        }

        static Fit at(Problem problem, List<Factor> parts, Rational origin, List<Rational> points, int working, RootCache cache) {
            boolean sequence = problem.equation().domain() == Domain.DIFFERENCE;
            List<Root> roots = new ArrayList<>();
            for (Factor part : parts) {
                RationalPolynomial s = part.polynomial();
                List<Enclosure> enclosures = s.degree() == 1
                        ? List.of(new Enclosure(s.coefficient(0).negate().toBigDecimal(new java.math.MathContext(working)),
                                BigDecimal.ZERO, BigDecimal.ZERO))
                        : cache.roots(s, working);
                for (Enclosure e : enclosures) {
                    if (e.im().signum() >= 0) {
                        roots.add(new Root(new Apcomplex(new Apfloat(e.re(), working), new Apfloat(e.im(), working)),
                                part.multiplicity(), e));
                    }
                }
            }
            Apcomplex one = new Apfloat(1, working);
            Apcomplex minusI = new Apcomplex(Apfloat.ZERO, new Apfloat(-1, working));
            Apfloat start = Decimals.toApfloat(origin, working);
            List<BasisFunction> basis = new ArrayList<>();
            for (Root r : roots) {
                for (int p = 0; p < r.multiplicity(); p++) {
                    basis.add(new BasisFunction(r.value(), p, false, sequence, start, ModeSum.of(origin, one, p, r.value(), working)));
                    if (r.pair()) {
                        basis.add(new BasisFunction(r.value(), p, true, sequence, start, ModeSum.of(origin, minusI, p, r.value(), working)));
                    }
                }
            }
            List<Condition> conditions = problem.conditions();
            int k = basis.size();
            Apfloat[][] a = new Apfloat[k][k + 1];
            for (int row = 0; row < k; row++) {
                Condition c = conditions.get(row);
                Apfloat t = BoundaryValues.point(c, working);
                for (int j = 0; j < k; j++) {
                    a[row][j] = basis.get(j).at(c.derivative(), t);
                }
                a[row][k] = Decimals.toApfloat(c.value(), working);
            }
            Elimination.Reduced reduced = Elimination.reduce(a, working);
            if (reduced.singular()) {
                throw ConditionsException.underdetermined("the conditions do not determine one solution (singular to "
                        + working + " digits in the numeric fallback)", null);
            }
            List<Apfloat> constants = reduced.solution();
            Fit fit = new Fit(problem, roots, basis, constants, List.of(), working);
            List<Apfloat> values = points.stream().map(p -> fit.value(0, Decimals.toApfloat(p, working))).toList();
            return new Fit(problem, roots, basis, constants, values, working);
        }

        /** The d-th derivative of the solution at t. */
        Apfloat value(int d, Apfloat t) {
            Apfloat sum = Apfloat.ZERO;
            for (int j = 0; j < basis.size(); j++) {
                sum = sum.add(constants.get(j).multiply(basis.get(j).at(d, t)));
            }
            return sum;
        }

        /** Constants and values by name, for the agreement of two precisions. */
        Map<String, Apfloat> named() {
            Map<String, Apfloat> named = new LinkedHashMap<>();
            for (int j = 0; j < constants.size(); j++) {
                named.put("c" + j, constants.get(j));
            }
            for (int i = 0; i < values.size(); i++) {
                named.put("v" + i, values.get(i));
            }
            return named;
        }

        List<NumericSolution.Mode> modes(int digits) {
            List<NumericSolution.Mode> modes = new ArrayList<>();
            int next = 0;
            for (Root r : roots) {
                List<BigDecimal> cosine = new ArrayList<>();
                List<BigDecimal> sine = new ArrayList<>();
                for (int p = 0; p < r.multiplicity(); p++) {
                    cosine.add(Decimals.toBigDecimal(constants.get(next++), digits));
                    if (r.pair()) {
                        sine.add(Decimals.toBigDecimal(constants.get(next++), digits));
                    }
                }
                modes.add(new NumericSolution.Mode(Decimals.toBigDecimal(r.value().real(), digits),
                        Decimals.toBigDecimal(r.value().imag(), digits), r.enclosure().radius(), r.multiplicity(), cosine, sine));
            }
            return modes;
        }

        /** Each condition evaluated with the fitted constants: the residual within 10^-digits of the value's size. */
        Check conditionsCheck(int digits) {
            Apfloat worst = Apfloat.ZERO;
            boolean passed = true;
            for (Condition c : problem.conditions()) {
                Apfloat want = Decimals.toApfloat(c.value(), precision);
                Apfloat residual = ApfloatMath.abs(value(c.derivative(), BoundaryValues.point(c, precision)).subtract(want));
                worst = residual.compareTo(worst) > 0 ? residual : worst;
                passed &= residual.compareTo(unit(digits).multiply(ApfloatMath.abs(want).add(Apfloat.ONE))) <= 0;
            }
            return new Check("meets the conditions", passed, "each condition evaluated at " + precision
                    + " digits with the fitted constants: largest residual " + Decimals.toBigDecimal(worst, 3));
        }

        /**
         * The recurrence iterated in apfloat from the solution's values at the first k indices from the
         * lowest condition index on, {@link #ITERATION_STEPS} steps, against the solution's values.
         */
        Check iterationCheck(int digits) {
            LinearEquation eq = problem.equation();
            int k = eq.order();
            long start = problem.conditions().stream().map(Condition::at).min(Rational::compareTo).orElseThrow()
                    .toBigInteger().longValueExact();
            List<Apfloat> iterated = new ArrayList<>();
            Apfloat scale = Apfloat.ONE;
            for (int n = 0; n < k; n++) {
                iterated.add(value(0, new Apfloat(start + n, precision)));
            }
            Apfloat worst = Apfloat.ZERO;
            for (int n = 0; n < ITERATION_STEPS; n++) {
                Deadline.checkCurrent();
                Apfloat sum = Apfloat.ZERO;
                for (int j = 0; j < k; j++) {
                    sum = sum.add(Decimals.toApfloat(eq.coefficients().get(j), precision).multiply(iterated.get(n + j)));
                }
                Apfloat next = sum.negate().divide(Decimals.toApfloat(eq.coefficients().get(k), precision));
                iterated.add(next);
                Apfloat closed = value(0, new Apfloat(start + k + n, precision));
                Apfloat size = ApfloatMath.abs(closed);
                scale = size.compareTo(scale) > 0 ? size : scale;
                Apfloat difference = ApfloatMath.abs(next.subtract(closed));
                worst = difference.compareTo(worst) > 0 ? difference : worst;
            }
            boolean passed = worst.compareTo(unit(digits).multiply(scale)) <= 0;
            return new Check("agrees with iteration", passed, "the recurrence iterated " + ITERATION_STEPS
                    + " steps at " + precision + " digits from the solution's values at " + start + ".." + (start + k - 1)
                    + ": largest difference " + Decimals.toBigDecimal(worst, 3) + " (relative to " + Decimals.toBigDecimal(scale, 3) + ")");
        }

        /** The equation integrated from the solution's derivatives at the origin ({@link IntegratorCheck}), on its time scales. */
        Check integratorCheck() {
            LinearEquation eq = problem.equation();
            IntegratorCheck.Solved closed = new IntegratorCheck.Solved() {
                @Override
                public double value(double t) {
                    return Fit.this.value(0, new Apfloat(new BigDecimal(t), precision)).doubleValue();
                }

                @Override
                public List<Rational> state(Rational t) {
                    List<Rational> state = new ArrayList<>();
                    for (int d = 0; d < eq.order(); d++) {
                        state.add(Rational.of(Decimals.toBigDecimal(Fit.this.value(d, Decimals.toApfloat(t, precision)),
                                Analyzer.STATE_DIGITS)));
                    }
                    return state;
                }
            };
            TimeScales scales = TimeScales.ofRoots(eq, roots.stream()
                    .map(r -> new double[] {r.value().real().doubleValue(), r.value().imag().doubleValue()}).toList());
            return IntegratorCheck.compare(eq, originOf(), closed.state(originOf()), scales, List.of(), closed, "t0");
        }

        private Rational originOf() {
            Condition first = problem.conditions().get(0);
            return first.atTimesPi() ? Rational.ZERO : first.at();
        }

        private Apfloat unit(int digits) {
            return new Apfloat("1e-" + digits, precision);
        }
    }
}
