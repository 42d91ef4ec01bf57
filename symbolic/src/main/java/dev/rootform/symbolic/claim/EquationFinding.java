package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.closedform.ClosedForm;
import java.util.Objects;
import java.util.Optional;

/**
 * Whether the claim satisfies the equation: the residual L(claim) − g, left side minus right side
 * with the claim put in for the unknown.
 *
 * @param decision holds, fails, or undecided
 * @param exact true when decided exactly
 * @param residual the residual in closed form, when it is not zero and has one
 * @param detail how it was decided, or where it fails when there is no closed form (e.g.
 *     "at n = 2 (a value claimed on its own) it leaves 3")
 * @since 0.3
 */
public record EquationFinding(Decision decision, boolean exact, Optional<ClosedForm> residual, String detail) {
    public EquationFinding {
        Objects.requireNonNull(decision, "decision");
        Objects.requireNonNull(residual, "residual");
        Objects.requireNonNull(detail, "detail");
    }
}
