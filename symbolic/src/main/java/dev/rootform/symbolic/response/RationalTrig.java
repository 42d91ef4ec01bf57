package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.Optional;

/**
 * cos(qπ) and sin(qπ) when they are rational. By Niven's theorem (I. Niven, Irrational Numbers,
 * 1956, Corollary 3.12, from memory) the only rational values of cos at rational multiples of π
 * are 0, ±1/2 and ±1, so both functions are rational only at multiples of π/6.
 */
final class RationalTrig {
    /** cos(kπ/6) for k = 0..11, null where irrational. */
    private static final Rational[] COS = {Rational.ONE, null, Rational.of(1, 2), Rational.ZERO, Rational.of(-1, 2), null,
        Rational.MINUS_ONE, null, Rational.of(-1, 2), Rational.ZERO, Rational.of(1, 2), null};

    private RationalTrig() {
    }

    /** cos(qπ), or empty when it is irrational. */
    static Optional<Rational> cos(Rational q) {
        return sixths(q).map(k -> COS[k]);
    }

    /** sin(qπ) = cos((q − 1/2)π), or empty when it is irrational. */
    static Optional<Rational> sin(Rational q) {
        return cos(q.subtract(Rational.of(1, 2)));
    }

    /** k in 0..11 with q ≡ k/6 (mod 2), when 6q is an integer. */
    private static Optional<Integer> sixths(Rational q) {
        Rational six = q.multiply(6);
        if (!six.isInteger()) {
            return Optional.empty();
        }
        return Optional.of(six.toBigInteger().mod(BigInteger.valueOf(12)).intValueExact());
    }
}
