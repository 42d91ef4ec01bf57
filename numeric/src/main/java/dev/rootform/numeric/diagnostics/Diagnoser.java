package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ConditionFitter;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Computes the {@link Diagnostics} of a solved problem from its exact solution and certified root
 * values. The stability verdict and the condition number are exact or certified; the mode
 * quantities, the growth rate and the warnings are approximate (double precision).
 *
 * @since 0.2
 */
public final class Diagnoser {
    private final int digits;

    /** @param digits significant digits of the root values and of the condition number shown */
    public Diagnoser(int digits) {
        this.digits = digits;
    }

    /**
     * @param roots numeric values of {@code solution.roots()}, in the same order
     * @param samples values of the fitted solution at sample points, for the cancellation estimate
     */
    public Diagnostics diagnose(Solution solution, List<RootApproximation> roots, List<SampleValue> samples) {
        LinearEquation eq = solution.problem().equation();
        List<FactorRoot> entries = FactorRoot.of(solution.factors(), roots);
        Stability stability = new StabilityJudge(eq.domain(), digits).judge(entries);
        DominantMode dominant = new DominantMode(eq.domain(), solution.closedForm().variable(), digits);
        Growth growth = dominant.withTerms(dominant.of(entries, solution.exact().map(Diagnoser::effectivePowers)
                .or(() -> solution.radical().map(Diagnoser::effectivePowers))
                .orElseGet(() -> generalPowers(eq.domain(), solution.factors()))), solution.closedForm().terms());
        List<String> warnings = new ArrayList<>();
        CloseRoots.warning(entries).ifPresent(warnings::add);
        solution.exact().flatMap(s -> Cancellation.warning(s, entries, samples)).ifPresent(warnings::add);
        Optional<BigDecimal> kappa = solution.exact().isEmpty() ? Optional.empty()
                : ConditionFitter.conditionNumber(eq, solution.problem().conditions())
                        .map(k -> k.toBigDecimal(new MathContext(digits)));
        boolean settles = stability.verdict() == Stability.Verdict.ASYMPTOTICALLY_STABLE && !eq.isHomogeneous()
                && eq.forcing().stream().allMatch(t -> eq.domain() == Domain.DIFFERENTIAL ? t.exponential().isZero()
                        : t.exponential().abs().isOne());
        return new Diagnostics(stability, growth, ModeFacts.of(eq.domain(), entries), kappa, warnings, settles);
    }

    /** Per factor, one more than the highest power of t or n whose coefficient is nonzero. */
    private static Map<RationalPolynomial, Integer> effectivePowers(ExactSolution s) {
        Map<RationalPolynomial, Integer> powers = new HashMap<>();
        for (Component c : s.components()) {
            int m = 0;
            for (int i = 0; i < c.coefficients().size(); i++) {
                m = c.coefficients().get(i).isZero() ? m : i + 1;
            }
            powers.put(c.factor().polynomial(), m);
        }
        return powers;
    }

    /**
     * Per factor of x = a + √r·b, the larger effective power of the two parts: a term
     * (c(α) + √r·d(α))·v^i·α^v vanishes at every root α only when c = d = 0 (c and d have rational
     * coefficients and degree below the factor's), so a nonzero c or d is a term of some mode.
     */
    private static Map<RationalPolynomial, Integer> effectivePowers(RadicalSolution s) {
        Map<RationalPolynomial, Integer> powers = effectivePowers(s.rational());
        effectivePowers(s.radical()).forEach((factor, power) -> powers.merge(factor, power, Math::max));
        return powers;
    }

    /** Every factor's multiplicity, except λ = 0 of a recurrence (not a mode). */
    private static Map<RationalPolynomial, Integer> generalPowers(Domain domain, List<Factor> factors) {
        Map<RationalPolynomial, Integer> powers = new HashMap<>();
        for (Factor f : factors) {
            boolean zero = domain == Domain.DIFFERENCE && f.polynomial().equals(RationalPolynomial.X);
            powers.put(f.polynomial(), zero ? 0 : f.multiplicity());
        }
        return powers;
    }
}
