package dev.rootform.symbolic.params;

import java.util.List;
import java.util.Objects;

/**
 * The solution in one case: where it holds, the modes with the form each takes, and the pieces.
 *
 * @param when the conditions that define the case (a discriminant's sign or zero, a resonance)
 * @param excluded the conditions p ≠ 0 under which the formula holds (elsewhere it takes another form)
 * @param substitution how the case's equality was used, e.g. {@code k = m·w^2}; empty for none
 * @param modes the modes of μ over Q(params) in this case
 * @param regimes the form of each mode, by index
 * @param scales per mode, the root written in the formula: √W for real roots σ ± √W, √(−W) for a
 *     complex pair of a differential equation, the modulus √(σ² − W) for one of a recurrence; empty
 *     for a single or a double root
 * @param pieces the solution's pieces
 * @param freeConstants the names of the free constants of a general solution (no conditions), else empty
 * @param verified true when the exact check over Q(params) passed
 * @since 0.3
 */
public record ParametricCase(List<Constraint> when, List<Constraint> excluded, String substitution, List<ParamMode> modes,
        List<Regime> regimes, List<java.util.Optional<SquareRoot>> scales, List<ParamPiece> pieces, List<String> freeConstants, boolean verified) {
    public ParametricCase {
        when = List.copyOf(when);
        excluded = List.copyOf(excluded);
        Objects.requireNonNull(substitution, "substitution");
        modes = List.copyOf(modes);
        regimes = List.copyOf(regimes);
        scales = List.copyOf(scales);
        pieces = List.copyOf(pieces);
        freeConstants = List.copyOf(freeConstants);
        if (regimes.size() != modes.size()) {
            throw new IllegalArgumentException("one regime per mode");
        }
    }

    /** Whether the case holds at rational parameter values (its conditions and exclusions). */
    public boolean holdsAt(java.util.Map<String, dev.rootform.symbolic.algebra.Rational> values) {
        return when.stream().allMatch(c -> c.holdsAt(values)) && excluded.stream().allMatch(c -> c.holdsAt(values));
    }
}
