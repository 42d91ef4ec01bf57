package dev.rootform.symbolic.algebra;

import java.util.Objects;

/**
 * One factor of a polynomial over Q in the parameters, with its multiplicity.
 *
 * @param polynomial the factor (monic in {@link ParamPolynomial}'s order, or a rational constant)
 * @param multiplicity how often it divides, at least 1
 * @since 0.3
 */
public record ParamFactor(ParamPolynomial polynomial, int multiplicity) {
    public ParamFactor {
        Objects.requireNonNull(polynomial, "polynomial");
        if (multiplicity < 1) {
            throw new IllegalArgumentException("multiplicity (" + multiplicity + ") must be >= 1");
        }
    }
}
