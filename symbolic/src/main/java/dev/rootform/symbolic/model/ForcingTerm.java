package dev.rootform.symbolic.model;

import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * One term of a right-hand side: coefficient · v^power · exponential · oscillation, where v is the
 * independent variable (n or t).
 * <ul>
 *   <li>difference equations: the exponential is {@code base^n} ({@code exponential} = base, 1 if absent);</li>
 *   <li>differential equations: the exponential is {@code e^(rate·t)} ({@code exponential} = rate, 0 if absent).</li>
 * </ul>
 * The oscillation is 1, cos(ω·v) or sin(ω·v) with ω = {@code frequency}, times π when
 * {@code frequencyTimesPi} is set.
 *
 * @since 0.1
 */
public record ForcingTerm(Rational coefficient, int power, Rational exponential, Oscillation oscillation,
        Rational frequency, boolean frequencyTimesPi) {

    /** The trigonometric factor of a forcing term. */
    public enum Oscillation { NONE, COS, SIN }

    public ForcingTerm {
        Objects.requireNonNull(coefficient, "coefficient");
        Objects.requireNonNull(exponential, "exponential");
        Objects.requireNonNull(oscillation, "oscillation");
        Objects.requireNonNull(frequency, "frequency");
        if (power < 0) {
            throw new IllegalArgumentException("power (" + power + ") must be >= 0");
        }
        if (oscillation == Oscillation.NONE && (!frequency.isZero() || frequencyTimesPi)) {
            throw new IllegalArgumentException("a term without oscillation must have frequency 0");
        }
    }
}
