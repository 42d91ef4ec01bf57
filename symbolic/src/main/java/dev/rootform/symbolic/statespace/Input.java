package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import java.util.List;
import java.util.Objects;

/**
 * The input signal u applied to every input channel at once (u = u(t)·[1, …, 1]), from t = 0 or
 * n = 0 on.
 *
 * @since 0.3
 */
public sealed interface Input permits Input.None, Input.Impulse, Input.Step, Input.Signal {
    /** u = 0: the response to the initial state alone. */
    record None() implements Input {
    }

    /** The unit impulse δ(t) (continuous) or the unit pulse δ[n] (discrete). */
    record Impulse() implements Input {
    }

    /** The unit step: u = 1 for t &ge; 0 or n &ge; 0. */
    record Step() implements Input {
    }

    /**
     * A forcing in solve's syntax, e.g. {@code sin(2t)} or {@code (1/2)^n}.
     *
     * @param text as written
     * @param terms the same as a sum of terms
     */
    record Signal(String text, List<ForcingTerm> terms) implements Input {
        public Signal {
            Objects.requireNonNull(text, "text");
            terms = List.copyOf(terms);
        }
    }

    /** The input as forcing terms in the given time domain: empty for none, 1 for a step; an impulse has none. */
    default List<ForcingTerm> terms(Domain domain) {
        if (this instanceof Signal s) {
            return s.terms();
        }
        return this instanceof Step ? List.of(InputCalculus.constant(domain, Rational.ONE)) : List.of();
    }

    /** How the input is written: {@code 0}, {@code δ}, {@code 1}, or the signal's text. */
    default String label() {
        if (this instanceof Signal s) {
            return s.text();
        }
        return this instanceof Impulse ? "impulse" : this instanceof Step ? "step" : "none";
    }
}
