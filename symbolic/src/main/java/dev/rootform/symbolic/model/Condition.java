package dev.rootform.symbolic.model;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * A condition y^(derivative)(at) = value (differential) or x[at] = value (difference, derivative 0
 * and an integer {@code at}).
 *
 * @since 0.1
 */
public record Condition(int derivative, Rational at, Rational value) {
    public Condition {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
        if (derivative < 0) {
            throw new IllegalArgumentException("derivative (" + derivative + ") must be >= 0");
        }
    }
}
