package dev.rootform.symbolic.testing;

/**
 * Which right-hand sides a generated problem may have. Only homogeneous problems are generated
 * until the solver handles forcing terms; forced kinds are added here when it does.
 */
public enum Forcing {
    /** Homogeneous: right-hand side 0. */
    NONE
}
