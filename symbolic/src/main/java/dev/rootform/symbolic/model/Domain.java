package dev.rootform.symbolic.model;

/**
 * The kind of independent variable: a discrete index n (difference equations, recurrences) or a
 * continuous time t (differential equations).
 *
 * @since 0.1
 */
public enum Domain {
    /** Sequences x[n]; the operator is the forward shift E: (E x)[n] = x[n+1]. */
    DIFFERENCE,
    /** Functions y(t); the operator is the derivative D = d/dt. */
    DIFFERENTIAL
}
