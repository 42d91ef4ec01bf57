package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A claimed solution as read: the formula, where it is claimed to hold, and values claimed one by
 * one. A sequence claim {@code x[n] = 2^n - 1 for n >= 1; x[0] = 5} has the formula 2^n - 1,
 * {@code from} 1 and the value x[0] = 5; without a range the formula is claimed from the
 * problem's first index on. A function claim holds for all t.
 *
 * @param text the claim as typed
 * @param domain difference (sequence) or differential (function), as the equation's
 * @param variable the equation's independent variable
 * @param formula the closed form
 * @param from the first index the formula is claimed for (sequences), when stated
 * @param values values claimed one by one, in the order written (sequences only)
 * @since 0.3
 */
public record Claim(String text, Domain domain, String variable, Expr formula, Optional<Long> from,
        List<ExplicitValue> values) {
    public Claim {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(variable, "variable");
        Objects.requireNonNull(formula, "formula");
        Objects.requireNonNull(from, "from");
        values = List.copyOf(values);
    }

    /**
     * One value claimed on its own, such as {@code x[0] = 1}.
     *
     * @param index the index
     * @param value the value
     */
    public record ExplicitValue(long index, Expr value) {
        public ExplicitValue {
            Objects.requireNonNull(value, "value");
        }
    }
}
