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
 * @param allDigits the exact rational value with all its digits, when they were asked for; at a
 *     large index the only exact form given ({@code exact} is then empty: converting millions of
 *     digits to a binary fraction would take seconds)
 * @since 0.1
 */
public record PointValue(Rational at, BigDecimal value, Optional<Rational> exact, Optional<Surd> exactSurd,
        Optional<ExactDigits> allDigits) {
    public PointValue {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(exact, "exact");
        Objects.requireNonNull(exactSurd, "exactSurd");
        Objects.requireNonNull(allDigits, "allDigits");
    }

    /** A value that is known exactly in Q(√r) or only approximately, without all its digits asked for. */
    public PointValue(Rational at, BigDecimal value, Optional<Rational> exact, Optional<Surd> exactSurd) {
        this(at, value, exact, exactSurd, Optional.empty());
    }

    /** A value that is rational or only approximate. */
    public PointValue(Rational at, BigDecimal value, Optional<Rational> exact) {
        this(at, value, exact, Optional.empty());
    }

    /** The exact value as text ({@code 55}, {@code 3/4 + 1/2·√2}), with all its digits when asked for; when known. */
    public Optional<String> exactText() {
        return allDigits.map(ExactDigits::toString).or(() -> exact.map(Rational::toString)).or(() -> exactSurd.map(Surd::toString));
    }
}
