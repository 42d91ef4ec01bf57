package dev.rootform.numeric.diagnostics;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.Objects;

/**
 * A value of the fitted solution at one point, which the cancellation estimate compares with the
 * size of the solution's terms there.
 *
 * @param at the point (an index of a sequence, or t)
 * @param value the solution's value there, to a stated number of significant digits
 * @since 0.2
 */
public record SampleValue(Rational at, BigDecimal value) {
    public SampleValue {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
    }
}
