package dev.rootform.symbolic.closedform;

import java.util.Objects;

/**
 * The coefficient of a basis function: an exact real number, or a free constant of the general
 * solution.
 *
 * @since 0.1
 */
public sealed interface Coefficient permits Coefficient.Exact, Coefficient.Free {
    /** An exact real coefficient. */
    record Exact(Surd value) implements Coefficient {
        public Exact {
            Objects.requireNonNull(value, "value");
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
