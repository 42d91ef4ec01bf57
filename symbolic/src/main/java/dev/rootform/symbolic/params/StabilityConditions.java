package dev.rootform.symbolic.params;

import java.util.List;
import java.util.Objects;

/**
 * Asymptotic stability of an equation with parameters as conditions on them: every root of the
 * characteristic polynomial in the open left half-plane (differential) or inside the unit circle
 * (difference), simplified under the assumptions.
 *
 * @param criterion the test used: Routh–Hurwitz or Schur–Cohn / Jury
 * @param verdict whether the equation is stable always, never, or under {@code conditions}
 * @param conditions all must hold (empty unless the verdict is {@link Verdict#WHEN})
 * @since 0.3
 */
public record StabilityConditions(String criterion, Verdict verdict, List<Constraint> conditions) {
    /** Stable for all parameters allowed, for none, or when the conditions hold. */
    public enum Verdict { ALWAYS, NEVER, WHEN }

    public StabilityConditions {
        Objects.requireNonNull(criterion, "criterion");
        Objects.requireNonNull(verdict, "verdict");
        conditions = List.copyOf(conditions);
    }
}
