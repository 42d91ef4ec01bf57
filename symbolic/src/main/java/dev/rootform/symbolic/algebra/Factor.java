package dev.rootform.symbolic.algebra;

import java.util.Objects;

/**
 * A monic irreducible factor f of a polynomial over Q, with its multiplicity m &ge; 1.
 *
 * @since 0.1
 */
public record Factor(RationalPolynomial polynomial, int multiplicity) {
    public Factor {
        Objects.requireNonNull(polynomial, "polynomial");
        if (polynomial.degree() < 1 || !polynomial.leadingCoefficient().isOne()) {
            throw new IllegalArgumentException("factor must be monic of degree >= 1: " + polynomial);
        }
        if (multiplicity < 1) {
            throw new IllegalArgumentException("multiplicity (" + multiplicity + ") must be >= 1");
        }
    }

    public int degree() {
        return polynomial.degree();
    }
}
