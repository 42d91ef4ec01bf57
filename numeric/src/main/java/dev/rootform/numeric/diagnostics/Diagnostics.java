package dev.rootform.numeric.diagnostics;

import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The facts an engineer reviews about one answer: the stability verdict, the dominant mode and
 * growth, per-mode time scales, the sensitivity of the fitted constants to the conditions, and
 * plain-language warnings.
 *
 * @param stability the verdict by the time domain's rule (from all roots of χ)
 * @param growth the dominant mode and asymptotic growth of the solution shown
 * @param modes one entry per real root or conjugate pair, in root order
 * @param conditionNumber κ_∞ of the constant-fitting system, computed exactly and rounded here;
 *     empty for a general solution
 * @param warnings nearly repeated roots, severe cancellation in double precision
 * @param settles whether the homogeneous part of a forced solution is a transient and its particular
 *     part a steady state: the system is asymptotically stable and no forcing term decays or grows
 *     (each is a polynomial times a constant, an oscillation or a sequence with |base| = 1), so the
 *     homogeneous part dies out and the particular part is what remains; otherwise the parts are
 *     only homogeneous and particular (a loan balance, an unstable recurrence, a decaying input, a
 *     beam in space)
 * @since 0.2
 */
public record Diagnostics(Stability stability, Growth growth, List<Mode> modes, Optional<BigDecimal> conditionNumber,
        List<String> warnings, boolean settles) {
    public Diagnostics {
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(growth, "growth");
        modes = List.copyOf(modes);
        Objects.requireNonNull(conditionNumber, "conditionNumber");
        warnings = List.copyOf(warnings);
    }
}
