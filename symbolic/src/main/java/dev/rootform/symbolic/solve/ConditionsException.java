package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.InputException;
import java.util.Optional;

/**
 * Conditions that do not pick exactly one solution. When they leave a solution free, the exception
 * carries a nonzero solution of the homogeneous equation that meets the homogeneous conditions:
 * any multiple of it can be added to a solution without breaking a condition.
 *
 * @since 0.1
 */
public final class ConditionsException extends InputException {
    private static final long serialVersionUID = 1L;

    private final transient ClosedForm freeSolution;

    /**
     * @param message one line naming the problem
     * @param freeSolution the free solution, or null when the conditions contradict each other or
     *     the free solution is not known exactly
     */
    public ConditionsException(String message, ClosedForm freeSolution) {
        super(message, "", -1);
        this.freeSolution = freeSolution;
    }

    /** The free solution, when the conditions are underdetermined. */
    public Optional<ClosedForm> freeSolution() {
        return Optional.ofNullable(freeSolution);
    }
}
