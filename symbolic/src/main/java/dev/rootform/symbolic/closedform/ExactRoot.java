package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Objects;

/**
 * A root of the characteristic polynomial, exactly, with its multiplicity.
 *
 * @since 0.1
 */
public sealed interface ExactRoot permits ExactRoot.Explicit, ExactRoot.OfUnity, ExactRoot.Implicit {
    /** Multiplicity m &ge; 1. */
    int multiplicity();

    /** A root re + i·im with surd parts (rational roots and roots of quadratic factors). */
    record Explicit(Surd re, Surd im, int multiplicity) implements ExactRoot {
        public Explicit {
            Objects.requireNonNull(re, "re");
            Objects.requireNonNull(im, "im");
        }
    }

    /** The root of unity e^{2πi·k/order} = cos(2πk/order) + i·sin(2πk/order), gcd(k, order) = 1. */
    record OfUnity(int order, int k, int multiplicity) implements ExactRoot {
    }

    /**
     * Root number {@code index} (1-based, in the numeric layer's canonical order) of the monic
     * irreducible {@code factor}, which is kept exact as an algebraic number; its value comes with a
     * certified enclosure from the numeric layer.
     */
    record Implicit(RationalPolynomial factor, int index, int multiplicity) implements ExactRoot {
        public Implicit {
            Objects.requireNonNull(factor, "factor");
        }
    }
}
