package dev.rootform.symbolic.claim;

/**
 * Signals that a number needs a larger field than the current {@link ExactRing}: a square root of a
 * prime, or roots of unity of some order. The check then starts again in the larger field.
 */
final class FieldTooSmall extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int prime;
    private final int rootOrder;

    private FieldTooSmall(int prime, int rootOrder) {
        super(null, null, false, false);
        this.prime = prime;
        this.rootOrder = rootOrder;
    }

    static FieldTooSmall squareRoot(int prime) {
        return new FieldTooSmall(prime, 0);
    }

    static FieldTooSmall rootsOfUnity(int order) {
        return new FieldTooSmall(0, order);
    }

    /** The prime whose square root is needed, or 0. */
    int prime() {
        return prime;
    }

    /** The order of the roots of unity needed, or 0. */
    int rootOrder() {
        return rootOrder;
    }
}
