package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Collections;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * What an expression evaluates to: a linear combination of the unknown (keyed by derivative
 * order, or by offset for sequences) plus a part that does not involve it.
 *
 * @param unknown coefficient of y^(j) or x[v+j] for each j; no zero entries
 * @param forcing everything that does not involve the unknown
 */
record Value(SortedMap<Integer, Rational> unknown, Forcing forcing) {

    Value {
        unknown = Collections.unmodifiableSortedMap(new TreeMap<>(unknown));
    }

    static Value of(Forcing forcing) {
        return new Value(new TreeMap<>(), forcing);
    }

    /** The unknown itself, differentiated or shifted by {@code offset}. */
    static Value unknown(int offset, Forcing zero) {
        return new Value(new TreeMap<>(Map.of(offset, Rational.ONE)), zero);
    }

    boolean hasUnknown() {
        return !unknown.isEmpty();
    }

    /** The value if this is a constant not involving the unknown. */
    Optional<Rational> constantValue() {
        return hasUnknown() ? Optional.empty() : forcing.constantValue();
    }

    Value add(Value other) {
        TreeMap<Integer, Rational> sum = new TreeMap<>(unknown);
        other.unknown.forEach((j, c) -> accumulate(sum, j, c));
        return new Value(sum, forcing.add(other.forcing));
    }

    Value negate() {
        return scale(Rational.MINUS_ONE);
    }

    Value scale(Rational factor) {
        TreeMap<Integer, Rational> scaled = new TreeMap<>();
        unknown.forEach((j, c) -> accumulate(scaled, j, c.multiply(factor)));
        return new Value(scaled, forcing.scale(factor));
    }

    /** The operator Σ p_i L^i applied to the unknown part: each L raises the order or offset by one. */
    Value apply(RationalPolynomial operator) {
        TreeMap<Integer, Rational> result = new TreeMap<>();
        unknown.forEach((j, c) -> {
            for (int i = 0; i <= operator.degree(); i++) {
                accumulate(result, i + j, c.multiply(operator.coefficient(i)));
            }
        });
        return new Value(result, forcing);
    }

    private static void accumulate(TreeMap<Integer, Rational> map, int key, Rational c) {
        Rational total = map.getOrDefault(key, Rational.ZERO).add(c);
        if (total.isZero()) {
            map.remove(key);
        } else {
            map.put(key, total);
        }
    }
}
