package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.solve.Solution;
import java.util.List;
import java.util.Optional;

/**
 * Checks a claimed solution against the exact solution of its problem, exactly where the claim's
 * numbers allow it: the equation (the residual L(claim) − g), each condition, for a sequence every
 * value against the solution's (up to the index beyond which agreement is proved), and named slips.
 * Parts that cannot be decided exactly come back {@link Decision#UNDECIDED}, with the reason.
 *
 * <p>The claim's numbers live in a field Q(ζ_m)(√p, …) chosen for it ({@link ExactRing}); the
 * check starts again in a larger field whenever a number needs one. Stateless and thread-safe.
 *
 * @since 0.3
 */
public final class ClaimChecker {
    private ClaimChecker() {
    }

    /** The exact findings for {@code claim} about the problem that {@code solution} solves. */
    public static ClaimFindings check(Solution solution, Claim claim) {
        try {
            return new FieldNeeds().run(ring -> new ExactCheck(ring, solution, claim).run());
        } catch (NotExact e) {
            return undecided(solution, e.getMessage());
        }
    }

    /** Everything left to the numeric check, for the given reason. */
    static ClaimFindings undecided(Solution solution, String reason) {
        List<ConditionFinding> conditions = solution.problem().conditions().stream()
                .map((Condition c) -> new ConditionFinding(c, "", Decision.UNDECIDED, false)).toList();
        return new ClaimFindings(Decision.UNDECIDED, Optional.of(reason), Optional.empty(),
                new EquationFinding(Decision.UNDECIDED, false, Optional.empty(), reason), conditions, Optional.empty(), List.of());
    }
}
