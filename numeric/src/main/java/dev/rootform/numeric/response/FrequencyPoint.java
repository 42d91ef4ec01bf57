package dev.rootform.numeric.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigDecimal;
import java.util.Objects;
import java.util.Optional;

/**
 * H(jω) (continuous time, ω in rad/s) or H(e^{jω}) (discrete time, ω in rad/sample) at one
 * frequency: magnitude, magnitude in dB (20·log10|H|), and phase in degrees, unwrapped by adding
 * the angle each pole and zero contributes (so it is continuous in ω away from roots on the
 * axis or circle). Decimals are rounded to the requested digits; the exact values are present
 * when they are exact (magnitude √q whenever H is evaluated at a Gaussian rational point; dB
 * when |H|² is a power of 10; phase at multiples of 45°).
 *
 * @param frequency ω
 * @param kind whether H is finite and nonzero there, zero, or infinite (a pole on the axis or circle)
 * @param exactMagnitude |H| exactly, when known
 * @param magnitude |H| rounded; empty at a pole
 * @param exactDecibels 20·log10|H| exactly, when it is rational
 * @param decibels 20·log10|H| rounded; empty at a zero or a pole
 * @param exactPhaseDegrees the phase exactly, when it is a multiple of 45°
 * @param phaseDegrees the phase rounded; empty at a zero or a pole
 * @since 0.3
 */
public record FrequencyPoint(Frequency frequency, Kind kind, Optional<Surd> exactMagnitude, Optional<BigDecimal> magnitude,
        Optional<Rational> exactDecibels, Optional<BigDecimal> decibels, Optional<Rational> exactPhaseDegrees,
        Optional<BigDecimal> phaseDegrees) {
    /** What H is at the frequency. */
    public enum Kind { FINITE, ZERO, POLE }

    public FrequencyPoint {
        Objects.requireNonNull(frequency, "frequency");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(exactMagnitude, "exactMagnitude");
        Objects.requireNonNull(magnitude, "magnitude");
        Objects.requireNonNull(exactDecibels, "exactDecibels");
        Objects.requireNonNull(decibels, "decibels");
        Objects.requireNonNull(exactPhaseDegrees, "exactPhaseDegrees");
        Objects.requireNonNull(phaseDegrees, "phaseDegrees");
    }
}
