package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.Objects;

/**
 * The part of a solution that belongs to the roots of one irreducible factor f of multiplicity m:
 * Σ over the roots α of f of Σ_{i&lt;m} c_i(α)·u^i·e^{αu} (differential, u = t - origin) or
 * Σ_α Σ_i c_i(α)·n^i·α^n (difference). Each c_i is an exact element of Q(α) = Q[x]/(f), written as
 * a rational polynomial in α of degree &lt; deg f, so the sum is real and exact for any degree.
 *
 * @param factor f and m
 * @param coefficients c_0..c_{m-1}
 * @since 0.1
 */
public record Component(Factor factor, List<RationalPolynomial> coefficients) {
    public Component {
        Objects.requireNonNull(factor, "factor");
        coefficients = List.copyOf(coefficients);
        if (coefficients.size() != factor.multiplicity()) {
            throw new IllegalArgumentException("need " + factor.multiplicity() + " coefficients, got " + coefficients.size());
        }
        for (RationalPolynomial c : coefficients) {
            if (c.degree() >= factor.degree()) {
                throw new IllegalArgumentException("coefficient " + c + " not reduced modulo " + factor.polynomial());
            }
        }
    }
}
