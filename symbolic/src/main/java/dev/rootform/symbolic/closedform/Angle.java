package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * An exact angle or angular frequency: q·π, a surd value, or arccos of a surd in (-1, 1).
 *
 * @since 0.1
 */
public sealed interface Angle permits Angle.PiMultiple, Angle.Value, Angle.ArcCos {
    /** q·π with rational q. */
    record PiMultiple(Rational multiple) implements Angle {
        public PiMultiple {
            Objects.requireNonNull(multiple, "multiple");
        }
    }

    /** A surd ω, e.g. the frequency 2 or √3/2 of an oscillation e^{at}cos(ωt). */
    record Value(Surd value) implements Angle {
        public Value {
            Objects.requireNonNull(value, "value");
        }
    }

    /** arccos(x), in (0, π). */
    record ArcCos(Surd cosine) implements Angle {
        public ArcCos {
            Objects.requireNonNull(cosine, "cosine");
        }
    }

    /** The angle in radians, to double precision. */
    default double doubleValue() {
        if (this instanceof PiMultiple p) {
            return p.multiple().doubleValue() * Math.PI;
        }
        if (this instanceof Value v) {
            return v.value().doubleValue();
        }
        if (this instanceof ArcCos a) {
            return Math.acos(a.cosine().doubleValue());
        }
        throw new AssertionError(this);
    }
}
