package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.model.Condition;
import java.util.Objects;

/**
 * One condition of the problem, claimed against required.
 *
 * @param condition the condition
 * @param claimed the claim's value there, exact ({@code 3/2}, {@code 1 + √2}, {@code 3·e^(-2)}) or a
 *     decimal when decided numerically; "not claimed" when the claim does not cover the point
 * @param decision holds, fails, or undecided
 * @param exact true when decided exactly
 * @since 0.3
 */
public record ConditionFinding(Condition condition, String claimed, Decision decision, boolean exact) {
    public ConditionFinding {
        Objects.requireNonNull(condition, "condition");
        Objects.requireNonNull(claimed, "claimed");
        Objects.requireNonNull(decision, "decision");
    }
}
