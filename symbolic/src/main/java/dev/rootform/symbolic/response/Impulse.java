package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * One impulsive term of a response: coefficient·δ^(order)(t) (continuous time: a derivative of the
 * Dirac impulse at t = 0, from the polynomial part of the output transform) or
 * coefficient·δ[n − order] (discrete time: a unit sample at n = order, from the polynomial part in
 * z^-1).
 *
 * @since 0.3
 */
public record Impulse(int order, Rational coefficient) {
    public Impulse {
        Objects.requireNonNull(coefficient, "coefficient");
        if (order < 0) {
            throw new IllegalArgumentException("order (" + order + ") must be >= 0");
        }
    }
}
