package dev.rootform.export.notation;

/**
 * How every format labels constants fixed numerically: they are numeric only when the system that
 * fixes them has an entry that is not exact in one real quadratic field (exact systems are solved
 * exactly by the solver).
 *
 * @since 0.2
 */
public final class NumericConstants {
    /** Why the constants are numeric, for the label. */
    public static final String REASON = "not exact: their system has transcendental entries such as e^(a·t1) or π, "
            + "or algebraic ones beyond one square root";

    private NumericConstants() {
    }
}
