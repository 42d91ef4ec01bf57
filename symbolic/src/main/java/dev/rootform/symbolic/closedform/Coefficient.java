package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.math.BigInteger;
import java.util.Objects;

/**
 * The coefficient of a basis function: an exact real number, an exact number built from cos ω and
 * sin ω of a sampled sinusoid, or a free constant of the general solution.
 *
 * @since 0.1
 */
public sealed interface Coefficient permits Coefficient.Exact, Coefficient.Trig, Coefficient.Free {
    /** An exact real coefficient. */
    record Exact(Surd value) implements Coefficient {
        public Exact {
            Objects.requireNonNull(value, "value");
        }
    }

    /**
     * The exact real number a + b·√r with a, b in Q(cos ω)[sin ω] (cos ω and sin ω kept as named
     * exact quantities; see {@link TrigNumber}), for a recurrence forced at the frequency ω.
     *
     * @param frequency ω, a positive rational
     * @param rational a
     * @param radical b (zero when r = 1)
     * @param radicand r, squarefree, 1 when there is no square root
     */
    record Trig(Rational frequency, TrigNumber rational, TrigNumber radical, BigInteger radicand) implements Coefficient {
        public Trig {
            Objects.requireNonNull(frequency, "frequency");
            Objects.requireNonNull(rational, "rational");
            Objects.requireNonNull(radical, "radical");
            Objects.requireNonNull(radicand, "radicand");
        }

        /** a + b·√r, as an {@link Exact} surd when a and b are rational (no cos ω, no sin ω). */
        public static Coefficient of(Rational frequency, TrigNumber a, TrigNumber b, BigInteger radicand) {
            if (a.isRational() && b.isRational()) {
                return new Exact(b.isZero() ? Surd.of(a.toRational()) : Surd.of(a.toRational(), b.toRational(), Rational.of(radicand)));
            }
            return new Trig(frequency, a, b.isZero() ? TrigNumber.ZERO : b, b.isZero() ? BigInteger.ONE : radicand);
        }
    }

    /** A free constant such as {@code C1}. */
    record Free(String name) implements Coefficient {
        public Free {
            Objects.requireNonNull(name, "name");
        }
    }

    /** True for an exact zero (a term with this coefficient can be left out). */
    default boolean isZero() {
        return this instanceof Exact e && e.value().isZero();
    }
}
