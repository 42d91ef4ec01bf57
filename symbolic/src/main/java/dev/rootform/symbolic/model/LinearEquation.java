package dev.rootform.symbolic.model;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.Objects;

/**
 * A linear constant-coefficient equation Σ_{j=0..k} a_j·L^j y = forcing, where L is the derivative
 * D (differential) or the forward shift E (difference), normalised so that a_0 ... a_k are exact
 * rationals with a_k ≠ 0.
 *
 * <p>For a difference equation the terms as written were x[n + shift + j]; {@code shift} is the
 * lowest offset that appeared when it is negative (e.g. -2 for {@code x[n] = 3x[n-1] - 2x[n-2]}),
 * else 0, so the normalised equation Σ a_j x[m + j] = forcing(m - shift) holds with m = n + shift.
 * Forward shifts that skip x[n] ({@code x[n+3] = 2x[n+1]}) keep zero coefficients a_0.., which
 * make λ = 0 a root. For differential equations {@code shift} is 0.
 *
 * @param domain difference or differential
 * @param function name of the unknown, e.g. {@code y} or {@code x}
 * @param variable name of the independent variable, e.g. {@code t} or {@code n}
 * @param coefficients a_0..a_k in ascending order (index = order of derivative or shift)
 * @param shift lowest written shift (difference equations); 0 for differential equations
 * @param forcing the right-hand side as a sum of terms; empty for a homogeneous equation
 * @since 0.1
 */
public record LinearEquation(Domain domain, String function, String variable, List<Rational> coefficients,
        int shift, List<ForcingTerm> forcing) {

    public LinearEquation {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(function, "function");
        Objects.requireNonNull(variable, "variable");
        coefficients = List.copyOf(coefficients);
        forcing = List.copyOf(forcing);
        if (coefficients.size() < 2 || coefficients.get(coefficients.size() - 1).isZero()) {
            throw new IllegalArgumentException("order must be >= 1 with a nonzero leading coefficient: " + coefficients);
        }
        if (domain == Domain.DIFFERENTIAL && shift != 0) {
            throw new IllegalArgumentException("shift (" + shift + ") must be 0 for a differential equation");
        }
    }

    /** The order k. */
    public int order() {
        return coefficients.size() - 1;
    }

    /** True when there is no forcing term. */
    public boolean isHomogeneous() {
        return forcing.isEmpty();
    }

    /** The same equation without its right-hand side. */
    public LinearEquation homogeneous() {
        return new LinearEquation(domain, function, variable, coefficients, shift, List.of());
    }

    /** The characteristic polynomial χ(λ) = Σ a_j λ^j. */
    public RationalPolynomial characteristicPolynomial() {
        return RationalPolynomial.of(coefficients);
    }
}
