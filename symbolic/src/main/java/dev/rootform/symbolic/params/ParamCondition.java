package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * A condition y^(order)(point) = value (differential) or x[point] = value (difference, order 0),
 * the value in Q(params).
 *
 * @since 0.3
 */
public record ParamCondition(int order, Rational point, ParamFunction value) {
    public ParamCondition {
        Objects.requireNonNull(point, "point");
        Objects.requireNonNull(value, "value");
        if (order < 0) {
            throw new IllegalArgumentException("order (" + order + ") must be >= 0");
        }
    }
}
