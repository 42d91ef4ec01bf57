package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * One exact check of a claim in one field. The decision rests on the uniqueness of solutions of
 * linear constant-coefficient equations (common practice):
 * <ul>
 *   <li>a sequence: claim and solution are exponential polynomials from some index S on, obeying
 *       recurrences of orders d (the claim's {@link ExpSum#order()}) and K (the solution's), so
 *       their difference obeys one of order ≤ d + K with nonzero roots and vanishes for all n ≥ S
 *       once it vanishes at S, …, S + d + K − 1; the indices before S are compared one by one;</li>
 *   <li>a function: the claim is the solution exactly when it satisfies the equation and every
 *       condition (the conditions determine the solution; the solver has established that), and
 *       the residual, an exponential polynomial, is zero exactly when its canonical form is (or,
 *       with root sums, when its first ord derivatives vanish at one point).</li>
 * </ul>
 */
final class ExactCheck {
    private final ExactRing ring;
    private final Solution solution;
    private final LinearEquation eq;
    private final Claim claim;
    private final Domain domain;
    private final ClaimEvaluator evaluator;
    /** Why a part was left undecided, for the findings. */
    private String inexact;
    /** The right-hand side in exact form, once read. */
    private ExpSum forcing;

    ExactCheck(ExactRing ring, Solution solution, Claim claim) {
        this.ring = ring;
        this.solution = solution;
        this.eq = solution.problem().equation();
        this.claim = claim;
        this.domain = eq.domain();
        this.evaluator = new ClaimEvaluator(ring, domain);
    }

    ExactRing ring() {
        return ring;
    }

    ClaimEvaluator evaluator() {
        return evaluator;
    }

    LinearEquation equation() {
        return eq;
    }

    Solution solution() {
        return solution;
    }

    Claim claim() {
        return claim;
    }

    ClaimFindings run() {
        Candidate claimed;
        try {
            claimed = read();
        } catch (NotExact e) {
            return ClaimChecker.undecided(solution, e.getMessage());
        }
        EquationFinding equation = equation(claimed);
        List<ConditionFinding> conditions = conditions(claimed);
        Decision verdict;
        Optional<Mismatch> mismatch = Optional.empty();
        if (domain == Domain.DIFFERENCE && hasValues()) {
            Optional<Long> first = firstMismatch(claimed);
            verdict = Decision.of(first.isEmpty());
            mismatch = first.map(n -> new Mismatch(Long.toString(n), ValueText.of(claimed.at(n)),
                    ValueText.of(solutionValue(n)), ""));
        } else {
            verdict = equation.decision();
            for (ConditionFinding c : conditions) {
                verdict = verdict.and(c.decision());
            }
        }
        List<Slip> slips = verdict == Decision.FAILS ? new SlipFinder(this, claimed).find() : List.of();
        return new ClaimFindings(verdict, Optional.ofNullable(verdict == Decision.UNDECIDED ? inexact : null),
                statement(claimed), equation, conditions, mismatch, slips);
    }

    /** The claim in exact form. */
    private Candidate read() {
        ExpSum formula = evaluator.evaluate(claim.formula());
        Map<Long, ExactValue> values = new LinkedHashMap<>();
        for (Claim.ExplicitValue v : claim.values()) {
            ExpSum value = evaluator.evaluate(v.value());
            if (!isNumber(value)) {
                throw new NotExact("a value claimed on its own must be a number");
            }
            values.put(v.index(), value.valueAt(0));
        }
        long from = domain == Domain.DIFFERENCE ? claim.from().orElse(firstIndex()) : Long.MIN_VALUE;
        return new Candidate(formula, from, values);
    }

    /** Σ c·e^κ with no variable. */
    private static boolean isNumber(ExpSum s) {
        Algebraic neutral = ExpSum.neutral(s.ring(), s.domain()).rate();
        return s.blocks().isEmpty() && s.modes().entrySet().stream()
                .allMatch(e -> e.getValue().size() == 1 && e.getKey().rate().equals(neutral));
    }

    /** True when the candidate holds exactly; used for slips, so undecided counts as not holding. */
    boolean holds(Candidate c) {
        try {
            if (domain == Domain.DIFFERENCE && hasValues()) {
                return firstMismatch(c).isEmpty();
            }
            // the conditions first: they are cheaper than the residual and rule out most candidates
            return conditions(c).stream().allMatch(f -> f.decision() == Decision.HOLDS)
                    && equation(c).decision() == Decision.HOLDS;
        } catch (NotExact e) {
            return false;
        }
    }

    // ---- the equation ----

    /** g, the equation's right-hand side, read once. */
    ExpSum forcing() {
        if (forcing == null) {
            forcing = evaluator.evaluate(Expressions.forcing(eq));
        }
        return forcing;
    }

    /** L(formula) − g in the equation's own variable. */
    ExpSum residual(ExpSum formula) {
        ExpSum r = forcing().negate();
        ExpSum derivative = formula;
        for (int j = 0; j < eq.coefficients().size(); j++) {
            Rational a = eq.coefficients().get(j);
            ExpSum term = domain == Domain.DIFFERENCE ? formula.shift(eq.shift() + j) : derivative;
            if (!a.isZero()) {
                r = r.add(term.scale(ring.rational(a)));
            }
            if (domain == Domain.DIFFERENTIAL) {
                derivative = derivative.derivative();
            }
        }
        return r;
    }

    EquationFinding equation(Candidate c) {
        ExpSum r;
        try {
            r = residual(c.formula());
            if (!isZero(r, domain == Domain.DIFFERENCE ? firstFormulaWindow(c) - eq.shift() : 0)) {
                Optional<ClosedForm> closed = RealForm.of(r, eq.function(), eq.variable());
                return new EquationFinding(Decision.FAILS, true, closed, closed.isPresent()
                        ? "exact substitution: the residual is not zero" : "exact substitution: the residual is not zero; "
                        + residualSample(r));
            }
            if (domain == Domain.DIFFERENCE) {
                Optional<String> window = mixedWindows(c);
                if (window.isPresent()) {
                    return new EquationFinding(Decision.FAILS, true, Optional.empty(), window.get());
                }
            }
        } catch (NotExact e) {
            inexact = e.getMessage();
            return new EquationFinding(Decision.UNDECIDED, false, Optional.empty(), e.getMessage());
        }
        return new EquationFinding(Decision.HOLDS, true, Optional.empty(),
                "exact substitution: the residual is 0 identically");
    }

    /**
     * Zero as a function: canonical form zero; with root sums (which may share roots with other
     * terms) zero values at ord consecutive indices from n0 (sequences) or zero derivatives of
     * orders below ord at a root sum's origin (functions).
     */
    private boolean isZero(ExpSum r, long n0) {
        if (r.isZero()) {
            return true;
        }
        if (r.blocks().isEmpty()) {
            return false;
        }
        int order = r.order();
        Rational at = r.blocks().keySet().iterator().next().origin();
        for (int i = 0; i < order; i++) {
            Deadline.checkCurrent();
            ExactValue v = domain == Domain.DIFFERENCE ? r.valueAt(n0 + i) : r.derivativeAt(i, at);
            if (!v.isZero()) {
                return false;
            }
        }
        return true;
    }

    /** The first window start m = n + shift from which every value the equation links is the formula's. */
    private long firstFormulaWindow(Candidate c) {
        return Math.max(Math.max(c.from(), firstIndex()), c.lastValue() == Long.MIN_VALUE ? Long.MIN_VALUE : c.lastValue() + 1);
    }

    /** The equation at windows that use values claimed one by one: "at n = 2 it leaves 3". */
    private Optional<String> mixedWindows(Candidate c) {
        long end = firstFormulaWindow(c);
        int k = eq.order();
        ExpSum g = forcing();
        for (long m = firstIndex(); m < end; m++) {
            Deadline.checkCurrent();
            ExactValue sum = g.valueAt(m - eq.shift()).negate();
            boolean complete = true;
            for (int j = 0; j <= k && complete; j++) {
                ExactValue v = c.at(m + j);
                complete = v != null;
                if (complete) {
                    sum = sum.add(scale(v, eq.coefficients().get(j)));
                }
            }
            if (complete && !sum.isZero()) {
                return Optional.of("at " + eq.variable() + " = " + (m - eq.shift()) + " (with the values claimed one by one) it leaves "
                        + ValueText.of(sum));
            }
        }
        return Optional.empty();
    }

    private ExactValue scale(ExactValue v, Rational a) {
        ExactValue r = ExactValue.zero(ring);
        for (Map.Entry<Algebraic, Algebraic> e : v.terms().entrySet()) {
            r = r.plus(e.getKey(), e.getValue().multiply(a));
        }
        return r;
    }

    /** A few values of a residual without a closed form. */
    private String residualSample(ExpSum r) {
        List<String> values = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            values.add(ValueText.of(domain == Domain.DIFFERENCE ? r.valueAt(i) : r.derivativeAt(i, Rational.ZERO)));
        }
        return domain == Domain.DIFFERENCE ? "at " + eq.variable() + " = 0, 1, 2 it is " + String.join(", ", values)
                : "its value and first two derivatives at " + eq.variable() + " = 0 are " + String.join(", ", values);
    }

    // ---- conditions ----

    List<ConditionFinding> conditions(Candidate c) {
        List<ConditionFinding> findings = new ArrayList<>();
        for (Condition condition : solution.problem().conditions()) {
            findings.add(condition(c, condition));
        }
        return findings;
    }

    private ConditionFinding condition(Candidate c, Condition condition) {
        try {
            ExactValue claimed;
            if (domain == Domain.DIFFERENCE) {
                claimed = c.at(condition.at().toBigInteger().longValueExact());
                if (claimed == null) {
                    return new ConditionFinding(condition, "not claimed", Decision.UNDECIDED, true);
                }
            } else {
                claimed = condition.atTimesPi() ? c.formula().derivativeAtPiMultiple(condition.derivative(), condition.at())
                        : c.formula().derivativeAt(condition.derivative(), condition.at());
            }
            boolean holds = claimed.subtract(ExactValue.of(ring.rational(condition.value()))).isZero();
            return new ConditionFinding(condition, ValueText.of(claimed), Decision.of(holds), true);
        } catch (NotExact e) {
            inexact = e.getMessage();
            return new ConditionFinding(condition, "", Decision.UNDECIDED, false);
        }
    }

    // ---- comparison with the solution (sequences) ----

    /** True when the solution's values are known exactly (a fitted sequence). */
    boolean hasValues() {
        return solution.exact().isPresent() || solution.radical().isPresent();
    }

    /** The first index where the candidate and the solution differ, if any. */
    Optional<Long> firstMismatch(Candidate c) {
        ClosedForm x = solution.closedForm();
        long first = firstIndex();
        long from = Math.max(c.from(), x.validFrom());
        long last = Math.max(from + c.formula().order() + solutionOrder() - 1, c.lastValue());
        for (long n = first; n <= last; n++) {
            Deadline.checkCurrent();
            ExactValue claimed = c.at(n);
            if (claimed != null && !claimed.subtract(solutionValue(n)).isZero()) {
                return Optional.of(n);
            }
        }
        return Optional.empty();
    }

    /** The solution's exact value x[n]. */
    ExactValue solutionValue(long n) {
        if (solution.exact().isPresent()) {
            return ExactValue.of(ring.rational(solution.exact().get().valueAt(n)));
        }
        Surd s = solution.radical().orElseThrow().valueAt(n);
        return ExactValue.of(ring.rational(s.rational()).add(ring.sqrt(Rational.of(s.radicand())).multiply(s.coefficient())));
    }

    /** The order of the recurrence the solution's formula obeys (nonzero roots, forcing included). */
    private int solutionOrder() {
        ExactSolution s = solution.exact().orElseGet(() -> solution.radical().orElseThrow().rational());
        int order = 0;
        for (Component c : s.components()) {
            order += c.factor().degree() * c.coefficients().size();
        }
        return order;
    }

    /** The problem's first index: the solution's origin. */
    long firstIndex() {
        return solution.closedForm().origin().toBigInteger().longValueExact();
    }

    /** The candidate as a closed form with its range and values claimed one by one, when it has one. */
    Optional<ClosedForm> statement(Candidate c) {
        Optional<ClosedForm> formula = RealForm.of(c.formula(), eq.function(), eq.variable());
        if (formula.isEmpty() || domain == Domain.DIFFERENTIAL) {
            return formula;
        }
        ClosedForm f = formula.get();
        long from = c.from();
        long origin = Math.min(from, c.values().keySet().stream().mapToLong(Long::longValue).min().orElse(from));
        List<Rational> leading = new ArrayList<>();
        for (long n = origin; n < from; n++) {
            Optional<Rational> v = Optional.ofNullable(c.values().get(n)).flatMap(ExactValue::algebraic).flatMap(Algebraic::toRational);
            if (v.isEmpty()) {
                leading.clear();
                origin = from;
                break;
            }
            leading.add(v.get());
        }
        return Optional.of(new ClosedForm(f.domain(), f.function(), f.variable(), Rational.of(origin), from, leading,
                f.terms(), List.of()));
    }
}
