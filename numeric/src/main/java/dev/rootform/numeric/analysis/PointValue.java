package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.Objects;
import java.util.Optional;

/**
 * The solution's value at one point: rounded to the requested significant digits, and exact when
 * the point is an index of a difference equation.
 *
 * @param at the point as the user wrote it, normalised (e.g. {@code 1000} for {@code 1e3})
 * @param value the value rounded to the requested digits
 * @param exact the exact rational value when known
 * @since 0.1
 */
public record PointValue(Rational at, BigDecimal value, Optional<Rational> exact) {
    public PointValue {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(exact, "exact");
    }
}
