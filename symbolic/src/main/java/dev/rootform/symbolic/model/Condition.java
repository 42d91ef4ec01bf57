package dev.rootform.symbolic.model;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * A condition y^(derivative)(t) = value (differential) or x[at] = value (difference, derivative 0
 * and an integer {@code at}). The point t is {@code at}, or {@code at}·π when {@code atTimesPi}
 * (differential equations only, e.g. {@code y(pi/2) = 0}).
 *
 * @since 0.1
 */
public record Condition(int derivative, Rational at, boolean atTimesPi, Rational value) {
    public Condition {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(value, "value");
        if (derivative < 0) {
            throw new IllegalArgumentException("derivative (" + derivative + ") must be >= 0");
        }
    }

    /** A condition at the rational point {@code at}. */
    public Condition(int derivative, Rational at, Rational value) {
        this(derivative, at, false, value);
    }

    /** The point as written: {@code 3/2}, {@code π}, {@code 3π/4}, {@code -π/2}. */
    public String point() {
        if (!atTimesPi) {
            return at.toString();
        }
        String sign = at.signum() < 0 ? "-" : "";
        java.math.BigInteger p = at.numerator().abs();
        String top = (p.equals(java.math.BigInteger.ONE) ? "" : p.toString()) + "π";
        return sign + top + (at.isInteger() ? "" : "/" + at.denominator());
    }

    /** True when both conditions are at the same point. */
    public boolean samePoint(Condition other) {
        return atTimesPi == other.atTimesPi && at.equals(other.at);
    }

    /** True when both conditions constrain the same derivative at the same point. */
    public boolean samePlace(Condition other) {
        return derivative == other.derivative && samePoint(other);
    }
}
