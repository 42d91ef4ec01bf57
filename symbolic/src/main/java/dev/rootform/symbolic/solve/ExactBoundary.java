package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Problem;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

/**
 * The exact answer of a differential equation whose conditions are at several points (or at a
 * multiple of π) when its constants are exact ({@link ExactBoundaryFit}): the exact initial state
 * at 0 is split as a + b·√r, the part a is fitted with the equation and its forcing, the part b with
 * the homogeneous equation (a {@link RadicalSolution} when b ≠ 0), both verified exactly like any
 * initial-value solution; the original conditions are then checked exactly at their own points.
 */
final class ExactBoundary {
    private ExactBoundary() {
    }

    /**
     * @param form the general solution plus exact particular terms
     * @param fit the exact solution of the equation from initial values at 0
     * @param fitHomogeneous the same for the homogeneous equation
     */
    static Optional<Solution> solve(Problem problem, RationalPolynomial chi, List<Factor> factors, ClosedForm general,
            ClosedForm form, Function<List<Condition>, ExactSolution> fit, Function<List<Condition>, ExactSolution> fitHomogeneous) {
        int order = problem.equation().order();
        Optional<List<Surd>> state = ExactBoundaryFit.initialState(form, problem.conditions(), order);
        if (state.isEmpty()) {
            return Optional.empty();
        }
        List<Condition> rational = new ArrayList<>();
        List<Condition> radical = new ArrayList<>();
        int radicand = 1;
        for (int d = 0; d < order; d++) {
            Surd s = state.get().get(d);
            rational.add(new Condition(d, Rational.ZERO, s.rational()));
            radical.add(new Condition(d, Rational.ZERO, s.coefficient()));
            radicand = s.isRational() ? radicand : s.radicand().intValueExact();
        }
        ExactSolution exact = fit.apply(rational);
        List<Check> checks = new ArrayList<>(withoutConditions(ExactVerifier.verify(exact, rational)));
        Optional<RadicalSolution> both = Optional.empty();
        if (radicand > 1) {
            ExactSolution part = fitHomogeneous.apply(radical);
            int r = radicand;
            withoutConditions(ExactVerifier.verify(part, radical)).stream()
                    .map(c -> new Check(c.name() + " (√" + r + " part)", c.passed(), c.detail())).forEach(checks::add);
            both = Optional.of(new RadicalSolution(radicand, exact, part));
        }
        ClosedForm closed = ClosedFormBuilder.fitted(exact, both, factors);
        checks.add(conditionsCheck(closed, problem.conditions()));
        return Optional.of(new Solution(problem, chi, factors, ClosedFormBuilder.roots(factors), closed, general,
                both.isEmpty() ? Optional.of(exact) : Optional.empty(), Optional.empty(), both, false, checks));
    }

    /** The checks without the one of the conditions at 0, which were derived here rather than given. */
    private static List<Check> withoutConditions(List<Check> checks) {
        return checks.stream().filter(c -> !c.name().equals(ExactVerifier.CONDITIONS)).toList();
    }

    /** Each given condition evaluated exactly at its own point on the fitted closed form. */
    private static Check conditionsCheck(ClosedForm closed, List<Condition> conditions) {
        for (Condition c : conditions) {
            Surd sum = Surd.of(Rational.ZERO);
            for (Term t : closed.terms()) {
                Optional<Surd> v = ExactPointValues.derivative(t, -1, c.derivative(), c);
                if (v.isEmpty()) {
                    return new Check(ExactVerifier.CONDITIONS, false, "the condition at " + c.point() + " cannot be evaluated exactly");
                }
                sum = sum.add(v.get());
            }
            if (!sum.equals(Surd.of(c.value()))) {
                return new Check(ExactVerifier.CONDITIONS, false, "the condition at " + c.point() + " gives " + sum + ", expected " + c.value());
            }
        }
        return new Check(ExactVerifier.CONDITIONS, true, "each condition evaluated exactly at its point; the constants are exact "
                + "because every entry of the system that fixes them is");
    }
}
