package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
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
 * @param exactSurd the exact value a + b·√r when it is irrational but known (forcing with values
 *     in Q(√r))
 * @since 0.1
 */
public record PointValue(Rational at, BigDecimal value, Optional<Rational> exact, Optional<Surd> exactSurd) {
    public PointValue {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(exact, "exact");
        Objects.requireNonNull(exactSurd, "exactSurd");
    }

    /** A value that is rational or only approximate. */
    public PointValue(Rational at, BigDecimal value, Optional<Rational> exact) {
        this(at, value, exact, Optional.empty());
    }

    /** The exact value as text ({@code 55}, {@code 3/4 + 1/2·√2}), when known. */
    public Optional<String> exactText() {
        return exact.map(Rational::toString).or(() -> exactSurd.map(Surd::toString));
    }
}
