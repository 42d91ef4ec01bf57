package dev.rootform.symbolic.solve;

/**
 * Thrown by {@link ConditionFitter} when the conditions leave a solution free: carries the initial
 * state of a nonzero solution of the homogeneous equation that meets the homogeneous conditions.
 * {@link Solver} turns it into a {@link ConditionsException} with that solution as a closed form.
 */
final class UnderdeterminedConditions extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final transient InitialState freeState;

    UnderdeterminedConditions(String message, InitialState freeState) {
        super(message);
        this.freeState = freeState;
    }

    InitialState freeState() {
        return freeState;
    }
}
