package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.LongFunction;

/**
 * Exact checks of a fitted solution, each independent of how the constants were found:
 * <ol>
 *   <li>substitution: the operator μ applied to every component is zero in Q(α) (so for every
 *       root of the factor at once); for a forced equation also L y - g, which then lies in the
 *       kernel of the forcing's annihilator A, vanishes at the origin to order deg A + 10 (deg A
 *       values suffice); and the listed leading values obey the recurrence;</li>
 *   <li>the conditions: each is evaluated exactly (traces in Q(α)) and compared;</li>
 *   <li>an independent reference: exact rational iteration of the recurrence from the solution's
 *       first k values (difference), or the Taylor coefficients y^(d)(t0) that the equation
 *       generates from the first k derivatives (differential), compared with the closed form.</li>
 * </ol>
 *
 * @since 0.1
 */
final class ExactVerifier {
    /** The name of the check of the conditions. */
    static final String CONDITIONS = "meets the conditions";
    /** How many terms the independent reference compares beyond the order. */
    static final int REFERENCE_TERMS = 40;
    /** Most terms of the exact iteration of a recurrence. */
    static final int MAX_ITERATION = 400;
    /** Extra points at which L y - g is checked beyond the deg A that prove it. */
    static final int EXTRA_RESIDUAL_POINTS = 10;
    /** Indices past the first whose sequence values are computed in one walk rather than one by one. */
    static final int WALK = 2 * MAX_ITERATION;

    private ExactVerifier() {
    }

    static List<Check> verify(ExactSolution solution, List<Condition> conditions) {
        Exact exact = new Exact(solution, remembered(value(solution)), remembered(forcing(solution)));
        List<Check> checks = new ArrayList<>();
        checks.add(substitution(exact));
        if (!conditions.isEmpty()) {
            checks.add(conditions(exact, conditions));
        }
        checks.add(solution.domain() == Domain.DIFFERENCE ? iteration(exact) : taylor(exact));
        return checks;
    }

    /**
     * The solution with its exact values y (x[n] or y^(n)(t0)) and forcing values g, each computed
     * once per verification: the residuals, the conditions and the reference share them (the same
     * exact numbers, not a weaker check).
     */
    private record Exact(ExactSolution solution, LongFunction<Rational> y, LongFunction<Rational> g) {
    }

    private static LongFunction<Rational> remembered(LongFunction<Rational> f) {
        Map<Long, Rational> known = new HashMap<>();
        return n -> {
            Rational v = known.get(n);
            if (v == null) {
                v = f.apply(n);
                known.put(n, v);
            }
            return v;
        };
    }

    /** Check 1 alone: the operator annihilates every component, and L y - g vanishes for a forced equation. */
    static Check substitution(ExactSolution solution) {
        return substitution(new Exact(solution, value(solution), forcing(solution)));
    }

    private static Check substitution(Exact exact) {
        ExactSolution solution = exact.solution();
        for (Component c : solution.components()) {
            if (!annihilates(solution.domain(), solution.operator().coefficients(), c)) {
                return new Check("satisfies the equation", false,
                        "residual is not zero for the roots of " + c.factor().polynomial());
            }
        }
        LinearEquation eq = solution.equation();
        long first = first(solution);
        int points = eq.isHomogeneous() ? 0 : solution.operator().degree() - eq.order() + EXTRA_RESIDUAL_POINTS;
        long last = solution.domain() == Domain.DIFFERENCE ? Math.max(solution.validFrom(), first + points) : points;
        for (long n = first; n < last; n++) {
            Deadline.checkCurrent();
            if (!residual(exact, n).isZero()) {
                return new Check("satisfies the equation", false, (solution.domain() == Domain.DIFFERENCE
                        ? "residual at n = " : "derivative of the residual at t0, order ") + n + " is not zero");
            }
        }
        return new Check("satisfies the equation", true, "exact substitution; residual is 0 in the number field of "
                + "every factor" + (eq.isHomogeneous() ? "" : ", and L y - g vanishes identically"));
    }

    /** (L y - g)[n] for a difference equation; the n-th derivative of L y - g at t0 for a differential one. */
    private static Rational residual(Exact exact, long n) {
        List<Rational> a = exact.solution().equation().coefficients();
        Rational r = exact.g().apply(n).negate();
        for (int j = 0; j < a.size(); j++) {
            r = r.add(a.get(j).multiply(exact.y().apply(n + j)));
        }
        return r;
    }

    /** x[n] (difference) or y^(n)(t0) (differential), exactly. */
    private static LongFunction<Rational> value(ExactSolution s) {
        return s.domain() == Domain.DIFFERENCE ? sequence(s) : derivatives(s);
    }

    /**
     * x[n] from {@link ExactSolution#valuesFromOrigin} for the indices the checks walk through (within
     * {@link #WALK} of the first), first the k + {@link #REFERENCE_TERMS} that the iteration compares,
     * then runs twice as long as the last when more are asked for; {@link ExactSolution#valueAt} for
     * an index beyond (a condition far out).
     */
    private static LongFunction<Rational> sequence(ExactSolution s) {
        AtomicReference<List<Rational>> known = new AtomicReference<>(List.of());
        long first = first(s);
        long least = s.equation().order() + REFERENCE_TERMS;
        return n -> {
            long i = n - first;
            if (i < 0 || i >= WALK) {
                return s.valueAt(n);
            }
            if (i >= known.get().size()) {
                known.set(s.valuesFromOrigin(Math.toIntExact(Math.min(WALK, Math.max(i + 1, Math.max(least, 2L * known.get().size()))))));
            }
            return known.get().get(Math.toIntExact(i));
        };
    }

    /**
     * y^(n)(t0) from {@link ExactSolution#derivativesAtOrigin}: first the k + {@link #REFERENCE_TERMS}
     * that the Taylor check compares, then runs twice as long as the last when more are asked for.
     */
    private static LongFunction<Rational> derivatives(ExactSolution s) {
        AtomicReference<List<Rational>> known = new AtomicReference<>(List.of());
        long first = s.equation().order() + REFERENCE_TERMS;
        return n -> {
            if (n >= known.get().size()) {
                known.set(s.derivativesAtOrigin(Math.toIntExact(Math.max(n + 1, Math.max(first, 2L * known.get().size())))));
            }
            return known.get().get(Math.toIntExact(n));
        };
    }

    /** g(n) (difference) or g^(n)(t0) (differential), exactly; zero for a homogeneous equation. */
    private static LongFunction<Rational> forcing(ExactSolution s) {
        LinearEquation eq = s.equation();
        if (eq.isHomogeneous()) {
            return n -> Rational.ZERO;
        }
        return s.domain() == Domain.DIFFERENCE ? n -> ForcingValues.at(eq, n, s.forcingPart())
                : n -> ForcingValues.derivative(eq, s.origin(), Math.toIntExact(n));
    }

    private static long first(ExactSolution s) {
        return s.domain() == Domain.DIFFERENCE ? s.origin().toBigInteger().longValueExact() : 0;
    }

    /** Applies Σ a_j L^j to Σ_i c_i v^i·(e^{αv} or α^v) in K[v] and tests for zero. */
    static boolean annihilates(Domain domain, List<Rational> operator, Component component) {
        NumberField k = new NumberField(component.factor().polynomial());
        List<RationalPolynomial> current = component.coefficients();
        List<RationalPolynomial> total = scale(current, operator.get(0));
        for (int j = 1; j < operator.size(); j++) {
            Deadline.checkCurrent();
            current = domain == Domain.DIFFERENTIAL ? differentiate(k, current) : shift(k, current);
            total = add(total, scale(current, operator.get(j)));
        }
        return total.stream().allMatch(RationalPolynomial::isZero);
    }

    /** D(C(v)e^{αv}) = (C'(v) + αC(v))e^{αv}. */
    private static List<RationalPolynomial> differentiate(NumberField k, List<RationalPolynomial> c) {
        List<RationalPolynomial> r = new ArrayList<>(c.size());
        for (int i = 0; i < c.size(); i++) {
            RationalPolynomial d = i + 1 < c.size() ? c.get(i + 1).multiply(Rational.of(i + 1)) : RationalPolynomial.ZERO;
            r.add(d.add(k.timesGenerator(c.get(i))));
        }
        return r;
    }

    /** E(C(n)α^n) = α·C(n+1)·α^n. */
    private static List<RationalPolynomial> shift(NumberField k, List<RationalPolynomial> c) {
        List<RationalPolynomial> r = new ArrayList<>(c.size());
        for (int l = 0; l < c.size(); l++) {
            RationalPolynomial s = RationalPolynomial.ZERO;
            Rational binomial = Rational.ONE;
            for (int i = l; i < c.size(); i++) {
                s = s.add(c.get(i).multiply(binomial));
                binomial = binomial.multiply(Rational.of(i + 1, i + 1 - l));
            }
            r.add(k.timesGenerator(s));
        }
        return r;
    }

    private static List<RationalPolynomial> scale(List<RationalPolynomial> c, Rational f) {
        return c.stream().map(p -> p.multiply(f)).toList();
    }

    private static List<RationalPolynomial> add(List<RationalPolynomial> a, List<RationalPolynomial> b) {
        List<RationalPolynomial> r = new ArrayList<>(a.size());
        for (int i = 0; i < a.size(); i++) {
            r.add(a.get(i).add(b.get(i)));
        }
        return r;
    }

    private static Check conditions(Exact exact, List<Condition> conditions) {
        for (Condition c : conditions) {
            Deadline.checkCurrent();
            Rational actual = exact.y().apply(exact.solution().domain() == Domain.DIFFERENCE
                    ? c.at().toBigInteger().longValueExact() : c.derivative());
            if (!actual.equals(c.value())) {
                return new Check(CONDITIONS, false,
                        "condition at " + c.at() + " gives " + actual + ", expected " + c.value());
            }
        }
        return new Check(CONDITIONS, true, "each condition evaluated exactly");
    }

    /**
     * Exact rational iteration over the problem's own time scale: every index of the first
     * k + {@link #REFERENCE_TERMS}, then on to 4 times the longest time scale of the solution's modes
     * ({@link #longestScale}, at most {@link #MAX_ITERATION} terms), compared there at about 12
     * indices per decade and the last.
     */
    private static Check iteration(Exact exact) {
        ExactSolution solution = exact.solution();
        long first = first(solution);
        int k = solution.equation().order();
        int terms = (int) Math.min(MAX_ITERATION, Math.max(k + REFERENCE_TERMS, Math.ceil(4 * longestScale(solution))));
        List<Rational> x = extend(exact, terms);
        int compared = 0;
        for (int i = 0; i < x.size(); i++) {
            if (i >= k + REFERENCE_TERMS && i != x.size() - 1 && Math.floor(12 * Math.log10(i)) == Math.floor(12 * Math.log10(i - 1))) {
                continue;
            }
            Deadline.checkCurrent();
            Rational closed = exact.y().apply(first + i);
            compared++;
            if (!x.get(i).equals(closed)) {
                return new Check("agrees with exact iteration", false, "differs at n = " + (first + i)
                        + ": iteration gives " + x.get(i) + ", closed form " + closed);
            }
        }
        return new Check("agrees with exact iteration", true, "exact rational iteration, n = " + first + ".."
                + (first + x.size() - 1) + (compared < x.size() ? " (compared at " + compared + " of them)" : ""));
    }

    /**
     * The longest time scale of the modes, in steps, approximately: 1/|ln|ρ|| for a rational root ρ ≠
     * ±1, 1/|ln|α|| and the period 2π/arg α for a quadratic factor's roots α, the order of a root of
     * unity; modulus 1 gives no decay or growth scale, and factors of higher degree are not counted. 1
     * when there is none.
     */
    static double longestScale(ExactSolution s) {
        double longest = 1;
        for (Component c : s.components()) {
            RationalPolynomial f = c.factor().polynomial();
            java.util.OptionalInt order = Cyclotomic.order(f);
            List<Double> scales = new ArrayList<>();
            if (order.isPresent()) {
                scales.add((double) order.getAsInt());
            } else if (f.degree() == 1) {
                scales.add(1 / Math.abs(Math.log(Math.abs(f.coefficient(0).doubleValue()))));
            } else if (f.degree() == 2) {
                double b = f.coefficient(1).doubleValue();
                double q = f.coefficient(0).doubleValue();
                double disc = b * b - 4 * q;
                if (disc < 0) {
                    scales.add(2 / Math.abs(Math.log(q)));
                    scales.add(2 * Math.PI / Math.acos(-b / (2 * Math.sqrt(q))));
                } else {
                    scales.add(1 / Math.abs(Math.log(Math.abs((-b + Math.sqrt(disc)) / 2))));
                    scales.add(1 / Math.abs(Math.log(Math.abs((-b - Math.sqrt(disc)) / 2))));
                }
            }
            for (double scale : scales) {
                longest = Double.isFinite(scale) ? Math.max(longest, scale) : longest; // |ρ| = 1: no decay or growth scale
            }
        }
        return longest;
    }

    private static Check taylor(Exact exact) {
        List<Rational> d = extend(exact, exact.solution().equation().order() + REFERENCE_TERMS);
        for (int i = 0; i < d.size(); i++) {
            Deadline.checkCurrent();
            if (!d.get(i).equals(exact.y().apply(i))) {
                return new Check("agrees with the Taylor series", false, "derivative " + i + " at t0 differs");
            }
        }
        return new Check("agrees with the Taylor series", true,
                "derivatives 0.." + (d.size() - 1) + " at t0, generated exactly from the equation");
    }

    /**
     * The solution's first k values (x[origin + i] or y^(i)(t0)) followed by more, {@code count} in all,
     * each from s_{i+k} = (g_i - Σ_{j<k} a_j s_{i+j})/a_k: the recurrence itself, or the derivatives
     * that the differential equation forces.
     */
    private static List<Rational> extend(Exact exact, int count) {
        List<Rational> a = exact.solution().equation().coefficients();
        int k = a.size() - 1;
        long first = first(exact.solution());
        LongFunction<Rational> y = exact.y();
        LongFunction<Rational> g = exact.g();
        List<Rational> s = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            Deadline.checkCurrent();
            s.add(y.apply(first + i));
        }
        while (s.size() < count) {
            Deadline.checkCurrent();
            int base = s.size() - k;
            Rational sum = g.apply(first + base);
            for (int j = 0; j < k; j++) {
                sum = sum.subtract(a.get(j).multiply(s.get(base + j)));
            }
            s.add(sum.divide(a.get(k)));
        }
        return s;
    }
}
