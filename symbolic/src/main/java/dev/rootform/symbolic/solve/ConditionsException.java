package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.InputException;
import java.util.Optional;

/**
 * Conditions that do not pick exactly one solution: either they contradict each other (no
 * solution meets them all; the message states the relation every solution obeys), or they leave
 * a solution free. In the second case the exception carries, when it is known exactly, a nonzero
 * solution of the homogeneous equation that meets the homogeneous conditions: any multiple of it
 * can be added to a solution without breaking a condition.
 *
 * @since 0.1
 */
public final class ConditionsException extends InputException {
    private static final long serialVersionUID = 1L;

    private final boolean contradictory;
    private final transient ClosedForm freeSolution;

    private ConditionsException(String message, boolean contradictory, ClosedForm freeSolution) {
        super(message, "", -1);
        this.contradictory = contradictory;
        this.freeSolution = freeSolution;
    }

    /** Conditions no solution meets; {@code message} states why (the certificate). */
    public static ConditionsException contradictory(String message) {
        return new ConditionsException(message, true, null);
    }

    /** Conditions that leave a solution free; {@code freeSolution} may be null when not known exactly. */
    public static ConditionsException underdetermined(String message, ClosedForm freeSolution) {
        return new ConditionsException(message, false, freeSolution);
    }

    /** True when no solution meets the conditions; false when they leave a solution free. */
    public boolean contradictory() {
        return contradictory;
    }

    /** The free solution, when the conditions are underdetermined and it is known exactly. */
    public Optional<ClosedForm> freeSolution() {
        return Optional.ofNullable(freeSolution);
    }
}
