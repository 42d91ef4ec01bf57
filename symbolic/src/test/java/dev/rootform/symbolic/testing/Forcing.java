package dev.rootform.symbolic.testing;

/** Which right-hand sides a generated problem may have. */
public enum Forcing {
    /** Homogeneous: right-hand side 0. */
    NONE,
    /**
     * About a third of the problems forced: sums of one to three terms c·v^p·(exponential)·(cos or
     * sin), with exponents that are sometimes a characteristic root (resonance) and frequencies
     * whose values are rational (multiples of π/3 and π/2 for recurrences, rational ω for
     * differential equations, whose forced conditions are then at t = 0).
     */
    MIXED
}
