package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.model.ForcingTerm;
import java.math.BigDecimal;
import java.util.Objects;

/**
 * The steady-state response of a stable system to one sinusoidal input term c·cos(ωv) or
 * c·sin(ωv): the output settles to |c|·gain·cos(ωv + phase) (or sin), with gain = |H| and
 * phase = arg H for the frequency response H at ω. Approximate, to the requested digits.
 *
 * @param input the forcing term
 * @param gain |H(ω)|
 * @param amplitude |c|·gain
 * @param phaseDegrees arg H(ω) in degrees, in (-180, 180]
 * @since 0.1
 */
public record SteadyState(ForcingTerm input, BigDecimal gain, BigDecimal amplitude, BigDecimal phaseDegrees) {
    public SteadyState {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(gain, "gain");
        Objects.requireNonNull(amplitude, "amplitude");
        Objects.requireNonNull(phaseDegrees, "phaseDegrees");
    }
}
