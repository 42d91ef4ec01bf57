package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import java.util.Objects;
import java.util.Optional;

/**
 * The dominant mode of a solution and its asymptotic growth: the mode with the largest Re λ
 * (continuous) or |λ| (discrete), ties broken by the higher power of t or n, gives
 * Θ(t^{m-1}·e^{σt}) or Θ(n^{m-1}·ρ^n) for the envelope of the solution (an oscillating mode
 * touches zero, so for it the bound holds for the envelope, not pointwise).
 *
 * @param root the dominant root (the one with Im λ &ge; 0 of a pair); empty for a zero solution and
 *     when a term of the forcing outgrows every mode of the characteristic roots
 * @param power m − 1, the power of t or n
 * @param rate σ = Re λ or ρ = |λ|, approximate (double precision from the certified root value)
 * @param theta the bound as text, e.g. {@code "Θ(t·e^(-t))"} or {@code "Θ(1.618034^n)"}
 * @since 0.2
 */
public record Growth(Optional<RootApproximation> root, int power, double rate, String theta) {
    public Growth {
        Objects.requireNonNull(root, "root");
        Objects.requireNonNull(theta, "theta");
    }
}
