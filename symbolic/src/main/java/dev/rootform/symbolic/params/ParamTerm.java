package dev.rootform.symbolic.params;

import java.util.Objects;

/**
 * One forcing term with parameters: amplitude·v^power·growth·wave, where growth is e^(rate·t) for a
 * differential equation and rate^n for a recurrence, and wave is 1, cos(frequency·t) or
 * sin(frequency·t) (differential equations only).
 *
 * @param amplitude the factor in Q(params)
 * @param power the power of the independent variable, at least 0
 * @param rate e^(rate·t)'s rate (differential) or the base of rate^n (difference; 1 for none)
 * @param frequency the angular frequency (zero with {@link Wave#NONE})
 * @param wave which wave multiplies the term
 * @since 0.3
 */
public record ParamTerm(ParamFunction amplitude, int power, ParamFunction rate, ParamFunction frequency, Wave wave) {
    /** The wave factor of a term. */
    public enum Wave { NONE, COS, SIN }

    public ParamTerm {
        Objects.requireNonNull(amplitude, "amplitude");
        Objects.requireNonNull(rate, "rate");
        Objects.requireNonNull(frequency, "frequency");
        Objects.requireNonNull(wave, "wave");
        if (power < 0) {
            throw new IllegalArgumentException("power (" + power + ") must be >= 0");
        }
        if ((wave == Wave.NONE) != frequency.isZero()) {
            throw new IllegalArgumentException("a wave needs a nonzero frequency and only a wave has one");
        }
    }
}
