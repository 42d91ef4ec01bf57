package dev.rootform.numeric.response;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The figures of a stable step response y, relative to its final value y∞ (final-value
 * theorem: y∞ = H(0) for s, H(1) for z): 10–90 % rise time, the time and value of the largest
 * overshoot, percent overshoot 100·(y_peak − y∞)/|y∞|, and the 2 % settling time (the last time
 * |y − y∞| = 0.02·|y∞|). Continuous time: seconds (the time unit of H), to the requested digits;
 * discrete time: sample counts and exact values.
 *
 * @param finalValue y∞, exact
 * @param discrete true for sample counts
 * @param riseTime t90 − t10; empty when y∞ = 0
 * @param peakTime time of the largest value beyond y∞; empty without overshoot
 * @param peakValue y there
 * @param overshootPercent 0 without overshoot
 * @param exactOvershootPercent the overshoot exactly (discrete time)
 * @param settlingTime 2 % settling time; empty when y∞ = 0
 * @param notes how the figures were decided, and why any is missing
 * @since 0.3
 */
public record StepFigures(Rational finalValue, boolean discrete, Optional<BigDecimal> riseTime, Optional<BigDecimal> peakTime,
        Optional<BigDecimal> peakValue, Optional<BigDecimal> overshootPercent, Optional<Rational> exactOvershootPercent,
        Optional<BigDecimal> settlingTime, List<String> notes) {
    public StepFigures {
        Objects.requireNonNull(finalValue, "finalValue");
        Objects.requireNonNull(riseTime, "riseTime");
        Objects.requireNonNull(peakTime, "peakTime");
        Objects.requireNonNull(peakValue, "peakValue");
        Objects.requireNonNull(overshootPercent, "overshootPercent");
        Objects.requireNonNull(exactOvershootPercent, "exactOvershootPercent");
        Objects.requireNonNull(settlingTime, "settlingTime");
        notes = List.copyOf(notes);
    }
}
