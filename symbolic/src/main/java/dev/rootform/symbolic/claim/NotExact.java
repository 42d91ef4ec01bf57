package dev.rootform.symbolic.claim;

/**
 * Signals that a claim (or part of the problem) has no exact representation here, such as π as a
 * coefficient, cos(2n), or a condition at a multiple of π: that part is then checked numerically.
 * Its message says why, for the answer's notes.
 */
final class NotExact extends RuntimeException {
    private static final long serialVersionUID = 1L;

    NotExact(String reason) {
        super(reason, null, false, false);
    }
}
