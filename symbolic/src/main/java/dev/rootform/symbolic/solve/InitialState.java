package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.Objects;

/**
 * The state that fixes one solution of an order-k equation: the values v_0..v_{k-1} at the origin.
 * For a differential equation v_j = y^(j)(origin); for a difference equation v_j = x[origin + j]
 * and the origin is an integer.
 *
 * @since 0.1
 */
record InitialState(Rational origin, List<Rational> values) {
    InitialState {
        Objects.requireNonNull(origin, "origin");
        values = List.copyOf(values);
    }
}
