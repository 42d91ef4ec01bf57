package dev.rootform.symbolic.claim;

/**
 * The outcome of one part of a check.
 *
 * @since 0.3
 */
public enum Decision {
    /** The part holds. */
    HOLDS,
    /** The part fails. */
    FAILS,
    /** Not decided here: not exactly (the numeric check decides it), or not claimed at all. */
    UNDECIDED;

    /** HOLDS for true, FAILS for false. */
    public static Decision of(boolean holds) {
        return holds ? HOLDS : FAILS;
    }

    /** Both hold: FAILS if either fails, else UNDECIDED if either is undecided. */
    public Decision and(Decision other) {
        if (this == FAILS || other == FAILS) {
            return FAILS;
        }
        return this == UNDECIDED || other == UNDECIDED ? UNDECIDED : HOLDS;
    }
}
