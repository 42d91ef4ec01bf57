package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.Problem;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything the exact layer knows about a solved problem.
 *
 * @param problem the input
 * @param characteristic χ(λ) = Σ a_j λ^j
 * @param factors monic irreducible factors of χ with multiplicities
 * @param roots the exact roots, factor by factor
 * @param closedForm the real closed form that renderers walk
 * @param general the general solution, whose terms are the basis functions with free constants
 * @param exact the fitted solution in number-field form (empty for a general solution and for a
 *     boundary-value problem, whose constants are not exact)
 * @param particular a particular solution of a forced equation with no transient part, in
 *     number-field form, when {@code exact} is empty (general solution or boundary-value problem)
 * @param radical the fitted solution as rational + √r·radical parts when the forcing takes values
 *     in Q(√r) (then {@code exact} is empty)
 * @param numericParticular true when the particular solution is a trial form whose constants P1..
 *     are transcendental (forcing with a frequency qπ in a differential equation)
 * @param checks the exact verification steps, all run
 * @param sinusoid the fitted solution of a recurrence forced by a sampled sinusoid at a rational
 *     frequency, exact over Q(cos ω)[sin ω] (then {@code exact} and {@code radical} are empty)
 * @since 0.1
 */
public record Solution(Problem problem, RationalPolynomial characteristic, List<Factor> factors,
        List<ExactRoot> roots, ClosedForm closedForm, ClosedForm general, Optional<ExactSolution> exact,
        Optional<ExactSolution> particular, Optional<RadicalSolution> radical, boolean numericParticular, List<Check> checks,
        Optional<SinusoidSolution> sinusoid) {
    public Solution {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(characteristic, "characteristic");
        factors = List.copyOf(factors);
        roots = List.copyOf(roots);
        Objects.requireNonNull(closedForm, "closedForm");
        Objects.requireNonNull(general, "general");
        Objects.requireNonNull(exact, "exact");
        Objects.requireNonNull(particular, "particular");
        Objects.requireNonNull(radical, "radical");
        checks = List.copyOf(checks);
        Objects.requireNonNull(sinusoid, "sinusoid");
    }

    /** A solution without a sampled sinusoid. */
    public Solution(Problem problem, RationalPolynomial characteristic, List<Factor> factors,
            List<ExactRoot> roots, ClosedForm closedForm, ClosedForm general, Optional<ExactSolution> exact,
            Optional<ExactSolution> particular, Optional<RadicalSolution> radical, boolean numericParticular, List<Check> checks) {
        this(problem, characteristic, factors, roots, closedForm, general, exact, particular, radical, numericParticular, checks,
                Optional.empty());
    }

    /**
     * True when constants of {@link #closedForm} are not exact rationals (a boundary-value problem,
     * a point that is a multiple of π, transcendental forcing with conditions away from t = 0, or a
     * trial form for a frequency qπ): the numeric layer then fixes them (all of them when conditions
     * are given, else only the trial form's P1..).
     */
    public boolean hasNumericConstants() {
        return exact.isEmpty() && radical.isEmpty() && sinusoid.isEmpty() && (!problem.conditions().isEmpty() || numericParticular);
    }

    /** True when every check ran and held. */
    public boolean verified() {
        return checks.stream().allMatch(Check::passed);
    }
}
