package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import java.util.Objects;

/**
 * One factor of μ = χ·A (χ the characteristic polynomial, A the forcing's annihilator) over
 * Q(params): a root ρ (λ − ρ) or a pair σ ± √W ((λ − σ)² − W, irreducible). The basis functions it
 * contributes are v^j·e^(ρv) (differential) or v^j·ρ^v (difference) for a root, and for a pair
 * v^j·X_E and v^j·X_O with X_E = e^(σt)·cosh(√W t), X_O = e^(σt)·sinh(√W t)/√W (differential) or
 * X_E = ((σ+√W)^n + (σ−√W)^n)/2, X_O = ((σ+√W)^n − (σ−√W)^n)/(2√W) (difference): both are entire in
 * W, so one formula serves W &gt; 0 (real roots), W = 0 (a double root) and W &lt; 0 (a complex pair).
 *
 * @param pair true for a pair, false for a single root
 * @param centre ρ or σ
 * @param square W (zero for a single root)
 * @param discriminant the factor's discriminant b² − 4ac over Q[params] (a pair of χ), or null
 * @param inEquation the multiplicity in χ (0 for a mode of the forcing alone)
 * @param multiplicity the multiplicity in μ, at least 1
 * @since 0.3
 */
public record ParamMode(boolean pair, ParamFunction centre, ParamFunction square, ParamPolynomial discriminant,
        int inEquation, int multiplicity) {
    public ParamMode {
        Objects.requireNonNull(centre, "centre");
        Objects.requireNonNull(square, "square");
        if (multiplicity < 1 || inEquation < 0 || inEquation > multiplicity) {
            throw new IllegalArgumentException("multiplicities (" + inEquation + ", " + multiplicity + ") out of order");
        }
    }

    /** Basis functions per power of the variable: 1 for a root, 2 for a pair. */
    public int width() {
        return pair ? 2 : 1;
    }

    /** True when this mode has the same root(s) as {@code other}. */
    public boolean sameRoots(ParamMode other) {
        return pair == other.pair && centre.equals(other.centre) && square.equals(other.square);
    }

    ParamMode withMultiplicities(int inEquation, int multiplicity) {
        return new ParamMode(pair, centre, square, discriminant, inEquation, multiplicity);
    }
}
