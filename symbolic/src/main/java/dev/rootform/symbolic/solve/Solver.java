package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.sinusoid.SinusoidSolver;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The exact pipeline: χ → irreducible factors → (with forcing: times the annihilator A) → exact
 * constants from the conditions → verified closed form. Stateless.
 *
 * @since 0.1
 */
public final class Solver {
    /** Highest order of χ times the forcing's annihilator: the equation's limit plus one forcing term's. */
    static final int MAX_OPERATOR_ORDER = Limits.MAX_ORDER + 2 * (Limits.MAX_FORCING_DEGREE + 1);

    private Solver() {
    }

    /**
     * Solves a problem exactly: the fitted solution when conditions are given, else the general
     * solution with free constants C1..Ck (plus a particular solution for a forced equation).
     *
     * @throws dev.rootform.symbolic.model.InputException if the forcing has no exact annihilator or
     *     rational values, or the conditions are wrong in number, inconsistent or do not determine
     *     the solution
     */
    public static Solution solve(Problem problem) {
        LinearEquation eq = problem.equation();
        if (SinusoidSolver.appliesTo(eq)) {
            return SinusoidFit.solve(problem, Solver::solve);
        }
        RationalPolynomial chi = eq.characteristicPolynomial();
        List<Factor> factors = JasFactorizer.factor(chi);
        boolean trial = eq.domain() == Domain.DIFFERENTIAL && eq.forcing().stream().anyMatch(Solver::transcendentalFrequency);
        List<Factor> operatorFactors = merge(factors, eq.isHomogeneous() || trial ? List.of() : Annihilator.of(eq));
        int order = operatorFactors.stream().mapToInt(f -> f.polynomial().degree() * f.multiplicity()).sum();
        if (order > MAX_OPERATOR_ORDER) {
            throw new InputException("the equation with its forcing has order " + order + " (the forcing adds "
                    + (order - chi.degree()) + "): at most " + MAX_OPERATOR_ORDER + " is accepted", "", -1);
        }
        int radicand = eq.domain() == Domain.DIFFERENCE && !eq.isHomogeneous() ? ForcingValues.radicand(eq) : 1;
        Operator mu = new Operator(product(chi.leadingCoefficient(), operatorFactors), operatorFactors, factors, radicand);
        if (trial) {
            return withTrialForm(problem, chi, factors);
        }
        if (problem.conditions().isEmpty() || numericConstants(eq, problem.conditions())) {
            return withFreeConstants(problem, chi, mu);
        }
        ExactSolution exact = fitted(eq, mu, problem.conditions(), ForcingPart.RATIONAL);
        List<Check> checks = new ArrayList<>(ExactVerifier.verify(exact, problem.conditions()));
        ClosedForm general = ClosedFormBuilder.general(eq, factors);
        if (radicand == 1) {
            return new Solution(problem, chi, factors, ClosedFormBuilder.roots(factors), ClosedFormBuilder.fitted(exact, factors),
                    general, Optional.of(exact), Optional.empty(), Optional.empty(), false, checks);
        }
        List<Condition> zero = zeroed(problem.conditions());
        RadicalSolution both = new RadicalSolution(radicand, exact, fitted(eq, mu, zero, ForcingPart.RADICAL));
        checks.addAll(radicalChecks(both.radical(), zero, radicand));
        return new Solution(problem, chi, factors, ClosedFormBuilder.roots(factors),
                ClosedFormBuilder.fitted(exact, Optional.of(both), factors), general, Optional.empty(), Optional.empty(),
                Optional.of(both), false, checks);
    }

    /** A forcing frequency qπ ≠ 0 in a differential equation: its annihilator has no rational coefficients. */
    private static boolean transcendentalFrequency(ForcingTerm t) {
        return t.oscillation() != ForcingTerm.Oscillation.NONE && t.frequencyTimesPi() && !t.frequency().isZero();
    }

    /**
     * The general solution plus the trial form of undetermined coefficients ({@link TrialForm}),
     * whose constants the numeric layer fixes: P1.. always, C1..Ck from the conditions when given.
     */
    private static Solution withTrialForm(Problem problem, RationalPolynomial chi, List<Factor> factors) {
        LinearEquation eq = problem.equation();
        if (!problem.conditions().isEmpty()) {
            ConditionFitter.validate(eq, problem.conditions());
        }
        ClosedForm general = ClosedFormBuilder.general(eq, factors);
        return new Solution(problem, chi, factors, ClosedFormBuilder.roots(factors), TrialForm.of(eq, general, factors), general,
                Optional.empty(), Optional.empty(), Optional.empty(), true, List.of(basisCheck(eq, factors)));
    }

    private static ExactSolution fitted(LinearEquation eq, Operator mu, List<Condition> conditions, ForcingPart part) {
        return ExactSolver.solve(eq, part, mu.polynomial(), mu.factors(), fit(eq, mu, conditions, part));
    }

    /** The same points with value 0: the conditions of the √r part. */
    private static List<Condition> zeroed(List<Condition> conditions) {
        return conditions.stream().map(c -> new Condition(c.derivative(), c.at(), c.atTimesPi(), Rational.ZERO)).toList();
    }

    /** The checks of the √r part, named as such. */
    private static List<Check> radicalChecks(ExactSolution radical, List<Condition> zero, int radicand) {
        return ExactVerifier.verify(radical, zero).stream()
                .map(c -> new Check(c.name() + " (√" + radicand + " part)", c.passed(), c.detail(), c.ran())).toList();
    }

    /**
     * The operator μ that annihilates the solution: χ, times the forcing's annihilator.
     *
     * @param polynomial μ
     * @param factors the factors of μ
     * @param characteristic the factors of χ
     * @param radicand r when the forcing's values lie in Q(√r), else 1
     */
    private record Operator(RationalPolynomial polynomial, List<Factor> factors, List<Factor> characteristic,
            int radicand) {
    }

    /**
     * The general solution (basis with free constants C1..Ck, plus an exact particular solution
     * with zero initial values and no transient part for a forced equation); its constants stay
     * free, or the numeric layer fixes them from conditions that are not exact.
     */
    private static Solution withFreeConstants(Problem problem, RationalPolynomial chi, Operator mu) {
        LinearEquation eq = problem.equation();
        List<Factor> factors = mu.characteristic();
        if (!problem.conditions().isEmpty()) {
            ConditionFitter.validate(eq, problem.conditions());
        }
        ClosedForm general = ClosedFormBuilder.general(eq, factors);
        List<Check> checks = new ArrayList<>(List.of(basisCheck(eq, factors)));
        if (eq.isHomogeneous()) {
            return exactBoundary(problem, chi, mu, general, general).orElseGet(() -> new Solution(problem, chi, factors,
                    ClosedFormBuilder.roots(factors), general, general, Optional.empty(), Optional.empty(), Optional.empty(), false,
                    checks));
        }
        List<Condition> zero = zeroConditions(eq);
        ExactSolution particular = withoutTransient(fitted(eq, mu, zero, ForcingPart.RATIONAL), factors);
        checks.addAll(ExactVerifier.verify(particular, List.of()));
        Optional<RadicalSolution> both = Optional.empty();
        if (mu.radicand() > 1) {
            ExactSolution radical = withoutTransient(fitted(eq, mu, zero, ForcingPart.RADICAL), factors);
            checks.addAll(radicalChecks(radical, List.of(), mu.radicand()));
            both = Optional.of(new RadicalSolution(mu.radicand(), particular, radical));
        }
        ClosedForm form = ClosedFormBuilder.withParticular(general, ClosedFormBuilder.fitted(particular, both, factors));
        return exactBoundary(problem, chi, mu, general, form).orElseGet(() -> new Solution(problem, chi, factors,
                ClosedFormBuilder.roots(factors), form, general, Optional.empty(), Optional.of(particular), Optional.empty(), false,
                checks));
    }

    /**
     * The exact answer to conditions of a differential equation at several points or at a multiple of
     * π, when the constants are exact ({@link ExactBoundary}); empty when there are no conditions or an
     * entry of their system is not exact.
     */
    private static Optional<Solution> exactBoundary(Problem problem, RationalPolynomial chi, Operator mu, ClosedForm general,
            ClosedForm form) {
        LinearEquation eq = problem.equation();
        if (problem.conditions().isEmpty() || eq.domain() != Domain.DIFFERENTIAL) {
            return Optional.empty();
        }
        return ExactBoundary.solve(problem, chi, mu.characteristic(), general, form,
                conditions -> fitted(eq, mu, conditions, ForcingPart.RATIONAL),
                conditions -> fitted(eq.homogeneous(), mu, conditions, ForcingPart.RATIONAL));
    }

    /** {@link ConditionFitter#fit}, with a free solution attached when the conditions leave one. */
    private static InitialState fit(LinearEquation eq, Operator mu, List<Condition> conditions, ForcingPart part) {
        try {
            return ConditionFitter.fit(eq, mu.polynomial(), conditions, part);
        } catch (UnderdeterminedConditions e) {
            ExactSolution free = ExactSolver.solve(eq.homogeneous(), ForcingPart.RATIONAL, mu.polynomial(), mu.factors(),
                    e.freeState());
            throw ConditionsException.underdetermined(e.getMessage(), ClosedFormBuilder.fitted(free, mu.characteristic()));
        }
    }

    /** The factors of both lists, multiplicities added where a factor appears in both (resonance). */
    static List<Factor> merge(List<Factor> a, List<Factor> b) {
        Map<RationalPolynomial, Integer> m = new LinkedHashMap<>();
        for (Factor f : a) {
            m.merge(f.polynomial(), f.multiplicity(), Integer::sum);
        }
        for (Factor f : b) {
            m.merge(f.polynomial(), f.multiplicity(), Integer::sum);
        }
        List<Factor> result = new ArrayList<>();
        m.forEach((f, k) -> result.add(new Factor(f, k)));
        result.sort(Comparator.comparingInt(Factor::degree).thenComparing(f -> f.polynomial().toString()));
        return result;
    }

    private static RationalPolynomial product(Rational lead, List<Factor> factors) {
        RationalPolynomial p = RationalPolynomial.constant(lead);
        for (Factor f : factors) {
            p = p.multiply(f.polynomial().pow(f.multiplicity()));
        }
        return p;
    }

    /**
     * True when the constants of a differential equation cannot be exact rationals and are fitted
     * numerically: conditions at several points (a boundary-value problem), at one point that is a
     * multiple of π (the exact basis in t - t0 needs a rational t0), or at one point t0 ≠ 0 with
     * exponential or oscillating forcing (the particular solution's values there involve e^{c·t0}
     * and cos(ω·t0)).
     */
    private static boolean numericConstants(LinearEquation eq, List<Condition> conditions) {
        if (eq.domain() != Domain.DIFFERENTIAL) {
            return false;
        }
        boolean several = conditions.stream().anyMatch(c -> !c.samePoint(conditions.get(0)));
        boolean awayFromZero = conditions.stream().anyMatch(c -> c.atTimesPi() || !c.at().isZero());
        boolean transcendentalForcing = eq.forcing().stream()
                .anyMatch(t -> !t.exponential().isZero() || t.oscillation() != ForcingTerm.Oscillation.NONE);
        return several || conditions.stream().anyMatch(Condition::atTimesPi) || (awayFromZero && transcendentalForcing);
    }

    /** x[0..k-1] = 0 or y^(i)(0) = 0: the conditions of a particular solution. */
    private static List<Condition> zeroConditions(LinearEquation eq) {
        List<Condition> zero = new ArrayList<>();
        for (int i = 0; i < eq.order(); i++) {
            zero.add(eq.domain() == Domain.DIFFERENCE
                    ? new Condition(0, Rational.of(i), Rational.ZERO)
                    : new Condition(i, Rational.ZERO, Rational.ZERO));
        }
        return zero;
    }

    /** The solution with the homogeneous powers (below the multiplicity in χ) set to zero. */
    private static ExactSolution withoutTransient(ExactSolution s, List<Factor> characteristic) {
        List<Component> result = new ArrayList<>();
        for (Component c : s.components()) {
            int homogeneous = ClosedFormBuilder.multiplicity(characteristic, c.factor().polynomial());
            List<RationalPolynomial> kept = new ArrayList<>(c.coefficients());
            for (int i = 0; i < Math.min(homogeneous, kept.size()); i++) {
                kept.set(i, RationalPolynomial.ZERO);
            }
            result.add(new Component(c.factor(), kept));
        }
        return s.withComponents(result);
    }

    /** Every basis function v^i·α^j·(e^{αv} or α^v) of every factor is annihilated, in Q(α). */
    private static Check basisCheck(LinearEquation eq, List<Factor> factors) {
        for (Factor f : factors) {
            if (eq.domain() == Domain.DIFFERENCE && f.polynomial().equals(RationalPolynomial.X)) {
                continue;
            }
            NumberField k = new NumberField(f.polynomial());
            for (int i = 0; i < f.multiplicity(); i++) {
                for (int j = 0; j < f.degree(); j++) {
                    Deadline.checkCurrent();
                    List<RationalPolynomial> c = new ArrayList<>();
                    for (int l = 0; l < f.multiplicity(); l++) {
                        c.add(l == i ? k.pow(k.generator(), j) : RationalPolynomial.ZERO);
                    }
                    if (!ExactVerifier.annihilates(eq.domain(), eq.coefficients(), new Component(f, c))) {
                        return new Check("basis solves the homogeneous equation", false, "basis function of " + f.polynomial() + " fails");
                    }
                }
            }
        }
        return new Check("basis solves the homogeneous equation", true,
                "every basis function, by exact substitution in Q(α)");
    }
}
