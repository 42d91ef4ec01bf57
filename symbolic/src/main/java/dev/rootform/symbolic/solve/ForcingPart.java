package dev.rootform.symbolic.solve;

/**
 * Which part of a right-hand side whose values lie in a real quadratic field Q(√r) a solution
 * answers: g = g_rational + √r·g_radical with both parts rational-valued (cos(πn/4) = √2/2 at n = 1,
 * for example). The whole solution is then x = x_rational + √r·x_radical by linearity.
 *
 * @since 0.1
 */
public enum ForcingPart {
    /** The rational part (the whole forcing when its values are rational). */
    RATIONAL,
    /** The coefficient of √r. */
    RADICAL
}
