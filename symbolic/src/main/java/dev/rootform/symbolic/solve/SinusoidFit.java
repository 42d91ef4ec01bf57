package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.sinusoid.SinusoidSolver;
import dev.rootform.symbolic.sinusoid.SinusoidalParticular;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

/**
 * Solves a recurrence forced by sampled sinusoids at rational frequencies ({@link SinusoidSolver})
 * by superposition (common practice for linear equations): the other forcing terms with the given
 * conditions by the exact pipeline, the sinusoids by undetermined coefficients over Q(c)[s], and the
 * homogeneous correction Σ_j w_j·h_j that makes the sum meet the conditions, each h_j an exact
 * homogeneous solution for unit conditions. The closed form keeps cos ω0 and sin ω0 as named exact
 * quantities ({@link Coefficient.Trig}).
 */
final class SinusoidFit {
    private static final String FIELD = "Q(cos ω)[sin ω]/(sin²ω + cos²ω − 1)";

    private SinusoidFit() {
    }

    /**
     * @param solver the exact pipeline for problems without sampled sinusoids
     * @throws InputException as the pipeline does for the conditions, or for a zero characteristic root
     */
    static Solution solve(Problem problem, Function<Problem, Solution> solver) {
        LinearEquation eq = problem.equation();
        List<SinusoidalParticular> particular = SinusoidSolver.particular(eq);
        List<Check> checks = new ArrayList<>();
        boolean exact = particular.stream().allMatch(p -> SinusoidSolver.verifies(eq, p));
        checks.add(new Check("sinusoidal particular solution satisfies the equation", exact,
                exact ? "residual zero as an element of " + FIELD : "a residual is not zero in " + FIELD));
        List<ForcingTerm> others = eq.forcing().stream().filter(t -> !SinusoidSolver.handles(t)).toList();
        LinearEquation restEquation = new LinearEquation(eq.domain(), eq.function(), eq.variable(), eq.coefficients(),
                eq.shift(), others);
        Solution rest = solver.apply(new Problem(restEquation, problem.conditions()));
        rest.checks().forEach(c -> checks.add(new Check(c.name() + " (part without the sinusoid)", c.passed(), c.detail(), c.ran())));
        List<Term> waveTerms = particularTerms(particular);
        if (problem.conditions().isEmpty()) {
            ClosedForm form = withParticular(rest.closedForm(), rest.closedForm().terms(), rest.closedForm().particularFrom(), waveTerms);
            return new Solution(problem, rest.characteristic(), rest.factors(), rest.roots(), form, rest.general(),
                    Optional.empty(), rest.particular(), Optional.empty(), false, checks, Optional.empty());
        }
        ExactSolution fitted = rest.exact().orElseThrow(() -> new IllegalStateException("no exact fit for " + problem));
        if (!fitted.leadingValues().isEmpty()) {
            throw new InputException("a recurrence with the characteristic root 0 forced by a sampled sinusoid is not "
                    + "supported (write it without the lag that gives the root 0)", "", -1);
        }
        for (Condition c : problem.conditions()) {
            if (c.at().abs().compareTo(Rational.of(Limits.MAX_SINUSOID_INDEX)) > 0) {
                throw new InputException("the condition at index " + c.point() + ": with a sampled sinusoid at a frequency that is not a "
                        + "rational multiple of π, conditions at indices up to " + Limits.MAX_SINUSOID_INDEX
                        + " in size are accepted (cos(kω) is a polynomial of degree k in cos ω)", "", -1);
            }
        }
        List<ExactSolution> units = new ArrayList<>();
        List<Long> indices = new ArrayList<>();
        boolean unitsHold = true;
        for (int j = 0; j < problem.conditions().size(); j++) {
            Deadline.checkCurrent();
            List<Condition> unit = new ArrayList<>();
            for (int i = 0; i < problem.conditions().size(); i++) {
                Condition c = problem.conditions().get(i);
                unit.add(new Condition(c.derivative(), c.at(), c.atTimesPi(), i == j ? Rational.ONE : Rational.ZERO));
            }
            Solution h = solver.apply(new Problem(eq.homogeneous(), unit));
            unitsHold &= h.verified();
            units.add(h.exact().orElseThrow(() -> new IllegalStateException("no exact fit for unit condition " + unit)));
            indices.add(problem.conditions().get(j).at().toBigInteger().longValueExact());
        }
        checks.add(new Check("homogeneous corrections solve the homogeneous equation", unitsHold,
                "one exact solution per unit condition, each verified in Q(α)"));
        SinusoidSolution solution = new SinusoidSolution(fitted, units, indices, waves(particular, indices));
        checks.add(conditionsCheck(solution));
        List<Term> transients = transientTerms(solution, rest.factors());
        ClosedForm restForm = rest.closedForm();
        ClosedForm form = withParticular(restForm, transients, transients.size(), concat(restForm.particularTerms(), waveTerms));
        return new Solution(problem, rest.characteristic(), rest.factors(), rest.roots(), form, rest.general(),
                Optional.empty(), Optional.empty(), Optional.empty(), false, checks, Optional.of(solution));
    }

    /** One wave per frequency, with the weights −(Σ particular)(at_j) that bring it to 0 at the conditions. */
    private static List<SinusoidSolution.Wave> waves(List<SinusoidalParticular> particular, List<Long> indices) {
        Map<Rational, List<SinusoidalParticular>> byFrequency = new LinkedHashMap<>();
        particular.forEach(p -> byFrequency.computeIfAbsent(p.frequency(), k -> new ArrayList<>()).add(p));
        List<SinusoidSolution.Wave> waves = new ArrayList<>();
        byFrequency.forEach((w, ps) -> {
            List<TrigNumber> weights = new ArrayList<>();
            for (long at : indices) {
                TrigNumber value = TrigNumber.ZERO;
                for (SinusoidalParticular p : ps) {
                    value = value.add(p.valueAt(at));
                }
                weights.add(value.negate());
            }
            waves.add(new SinusoidSolution.Wave(w, weights, ps));
        });
        return waves;
    }

    private static List<Term> concat(List<Term> a, List<Term> b) {
        List<Term> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }

    /** The closed form with {@code leading} terms (the first {@code transients} of them transient), then {@code more}. */
    private static ClosedForm withParticular(ClosedForm f, List<Term> leading, int transients, List<Term> more) {
        return new ClosedForm(f.domain(), f.function(), f.variable(), f.origin(), f.validFrom(), f.leadingValues(),
                concat(leading, more), f.freeConstants(), transients);
    }

    /**
     * The conditions hold: the rest meets them (its own checks), and every wave is exactly 0 at each
     * condition's index in its field, recomputed from the fitted weights.
     */
    private static Check conditionsCheck(SinusoidSolution s) {
        for (SinusoidSolution.Wave w : s.waves()) {
            for (long at : s.indices()) {
                if (!s.waveAt(w, at).isZero()) {
                    return new Check("satisfies the conditions", false, "the part at frequency " + w.frequency() + " is not 0 at " + at);
                }
            }
        }
        return new Check("satisfies the conditions", true,
                "the part of each frequency ω is 0 at every condition, exactly in " + FIELD);
    }

    /** n^j·r^n·(A_j·cos(ωn) + B_j·sin(ωn)) for every particular solution and power. */
    private static List<Term> particularTerms(List<SinusoidalParticular> particular) {
        List<Term> terms = new ArrayList<>();
        for (SinusoidalParticular p : particular) {
            for (int j = 0; j <= p.degree(); j++) {
                Term t = new Term.Oscillating(trig(p.frequency(), p.cosine().get(j)), trig(p.frequency(), p.sine().get(j)), j,
                        Surd.of(p.base()), new Angle.Value(Surd.of(p.frequency())));
                if (!t.vanishes()) {
                    terms.add(t);
                }
            }
        }
        return terms;
    }

    private static Coefficient trig(Rational frequency, TrigNumber value) {
        return Coefficient.Trig.of(List.of(new Coefficient.Trig.Part(frequency, value, TrigNumber.ZERO)), BigInteger.ONE);
    }

    /**
     * The homogeneous terms of x per factor f of χ and power i: c(α) = c_rest(α) + Σ_ω Σ_j w_{ω,j}·c_j(α),
     * whose real terms are linear in the coefficients of c, so each is Σ_l γ_l·(the real term of α^l),
     * with one γ per frequency (and the rational one of the rest).
     */
    private static List<Term> transientTerms(SinusoidSolution s, List<Factor> characteristic) {
        List<Term> terms = new ArrayList<>();
        Rational first = s.waves().get(0).frequency();
        for (Factor f : characteristic) {
            if (f.polynomial().equals(RationalPolynomial.X)) {
                continue;
            }
            for (int i = 0; i < f.multiplicity(); i++) {
                Map<Rational, List<TrigNumber>> gammas = new LinkedHashMap<>();
                List<TrigNumber> own = new ArrayList<>();
                for (int l = 0; l < f.degree(); l++) {
                    own.add(TrigNumber.of(coefficient(s.rest(), f, i, l)));
                }
                gammas.put(Rational.ZERO, own);
                for (SinusoidSolution.Wave w : s.waves()) {
                    List<TrigNumber> gamma = new ArrayList<>();
                    for (int l = 0; l < f.degree(); l++) {
                        TrigNumber g = TrigNumber.ZERO;
                        for (int j = 0; j < s.units().size(); j++) {
                            g = g.add(w.weights().get(j).multiply(coefficient(s.units().get(j), f, i, l)));
                        }
                        gamma.add(g);
                    }
                    gammas.put(w.frequency(), gamma);
                }
                terms.addAll(realTerms(first, s.rest().equation(), f.polynomial(), i, gammas));
            }
        }
        terms.removeIf(Term::vanishes);
        return terms;
    }

    /** The coefficient of α^l in c_i(α) of the component of f, zero when f has none. */
    private static Rational coefficient(ExactSolution s, Factor f, int i, int l) {
        return s.components().stream().filter(c -> c.factor().polynomial().equals(f.polynomial()))
                .map(c -> c.coefficients().get(i).coefficient(l)).findFirst().orElse(Rational.ZERO);
    }

    /**
     * The real terms of Σ_l γ_l·α^l·v^i over the roots of f, γ_l = Σ over the keys ω of gammas[ω][l]
     * (key 0: rational values, written into the part of {@code first}).
     */
    private static List<Term> realTerms(Rational first, LinearEquation eq, RationalPolynomial f, int i,
            Map<Rational, List<TrigNumber>> gammas) {
        List<List<Term>> unit = new ArrayList<>();
        for (int l = 0; l < f.degree(); l++) {
            unit.add(RealTerms.of(eq.domain(), f, i, RationalPolynomial.monomial(Rational.ONE, l)));
        }
        if (unit.get(0).get(0) instanceof Term.ConjugateSum) {
            List<Coefficient> cs = new ArrayList<>();
            for (int l = 0; l < f.degree(); l++) {
                List<Coefficient.Trig.Part> parts = new ArrayList<>();
                for (Map.Entry<Rational, List<TrigNumber>> e : gammas.entrySet()) {
                    parts.add(new Coefficient.Trig.Part(e.getKey().isZero() ? first : e.getKey(), e.getValue().get(l), TrigNumber.ZERO));
                }
                cs.add(Coefficient.Trig.of(parts, BigInteger.ONE));
            }
            return List.of(new Term.ConjugateSum(f, cs, i));
        }
        List<Term> result = new ArrayList<>();
        for (int p = 0; p < unit.get(0).size(); p++) {
            List<Coefficient> cs = new ArrayList<>();
            for (int q = 0; q < unit.get(0).get(p).coefficients().size(); q++) {
                List<Coefficient.Trig.Part> parts = new ArrayList<>();
                BigInteger radicand = BigInteger.ONE;
                for (Map.Entry<Rational, List<TrigNumber>> e : gammas.entrySet()) {
                    TrigNumber a = TrigNumber.ZERO;
                    TrigNumber b = TrigNumber.ZERO;
                    for (int l = 0; l < f.degree(); l++) {
                        Surd u = ((Coefficient.Exact) unit.get(l).get(p).coefficients().get(q)).value();
                        a = a.add(e.getValue().get(l).multiply(u.rational()));
                        if (!u.isRational()) {
                            b = b.add(e.getValue().get(l).multiply(u.coefficient()));
                            radicand = u.radicand();
                        }
                    }
                    parts.add(new Coefficient.Trig.Part(e.getKey().isZero() ? first : e.getKey(), a, b));
                }
                cs.add(Coefficient.Trig.of(parts, radicand));
            }
            result.add(unit.get(0).get(p).withCoefficients(cs));
        }
        return result;
    }
}
