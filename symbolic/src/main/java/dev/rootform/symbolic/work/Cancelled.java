package dev.rootform.symbolic.work;

/**
 * Thrown by {@link Deadline#check()} inside a long loop when the work must stop: the deadline
 * has passed, or the thread was interrupted. Unchecked, so it passes through every layer
 * untouched; only the caller that installed the deadline catches it. The work's partial results
 * are discarded; nothing it touched is left in a shared state.
 *
 * @since 0.2
 */
public final class Cancelled extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param reason why the work stopped, e.g. "the time limit of 50 ms passed" */
    public Cancelled(String reason) {
        super(reason);
    }
}
