package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Optional;

/**
 * Exact values cos(qπ) = a + b·√s for the rational q whose cosine lies in Q or in a real quadratic
 * field: multiples of π/4 (s = 2), π/6 (s = 3) and π/5 (s = 5) — handbook values, e.g.
 * cos(π/5) = (1 + √5)/4 and cos(2π/5) = (√5 - 1)/4 (Abramowitz &amp; Stegun 4.3.46, number from
 * memory). By Niven's theorem the rational values are exactly 0, ±1/2 and ±1.
 */
final class CosineTable {
    /** a + b·√s; s = 1 for a rational value (b = 0). */
    record Value(Rational rational, Rational radical, int radicand) {
    }

    private static final Rational H = Rational.of(1, 2);
    private static final Rational Q = Rational.of(1, 4);
    private static final Rational Z = Rational.ZERO;

    /** cos(jπ/4), j = 0..7. */
    private static final Value[] QUARTERS = {
        rational(Rational.ONE), new Value(Z, H, 2), rational(Z), new Value(Z, H.negate(), 2),
        rational(Rational.MINUS_ONE), new Value(Z, H.negate(), 2), rational(Z), new Value(Z, H, 2),
    };
    /** cos(jπ/6), j = 0..11. */
    private static final Value[] SIXTHS = {
        rational(Rational.ONE), new Value(Z, H, 3), rational(H), rational(Z), rational(H.negate()), new Value(Z, H.negate(), 3),
        rational(Rational.MINUS_ONE), new Value(Z, H.negate(), 3), rational(H.negate()), rational(Z), rational(H), new Value(Z, H, 3),
    };
    /** cos(jπ/5), j = 0..9. */
    private static final Value[] FIFTHS = {
        rational(Rational.ONE), new Value(Q, Q, 5), new Value(Q.negate(), Q, 5), new Value(Q, Q.negate(), 5),
        new Value(Q.negate(), Q.negate(), 5), rational(Rational.MINUS_ONE), new Value(Q.negate(), Q.negate(), 5),
        new Value(Q, Q.negate(), 5), new Value(Q.negate(), Q, 5), new Value(Q, Q, 5),
    };

    private CosineTable() {
    }

    /** cos(qπ) exactly, when it lies in Q or in Q(√2), Q(√3), Q(√5). */
    static Optional<Value> cosPi(Rational q) {
        Optional<Value> v = lookup(q, 4, QUARTERS);
        if (v.isEmpty()) {
            v = lookup(q, 6, SIXTHS);
        }
        return v.isPresent() ? v : lookup(q, 5, FIFTHS);
    }

    private static Optional<Value> lookup(Rational q, int parts, Value[] table) {
        Rational scaled = q.multiply(parts);
        if (!scaled.isInteger()) {
            return Optional.empty();
        }
        return Optional.of(table[Math.floorMod(scaled.toBigInteger().intValue(), 2 * parts)]);
    }

    private static Value rational(Rational a) {
        return new Value(a, Z, 1);
    }
}
