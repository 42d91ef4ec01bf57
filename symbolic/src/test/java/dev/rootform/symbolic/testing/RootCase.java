package dev.rootform.symbolic.testing;

/**
 * The kinds of characteristic-polynomial factor a random problem is built from. Every kind may be
 * raised to a power (repeated roots up to multiplicity 5) when the order allows it.
 */
public enum RootCase {
    /** A rational root x − r. */
    RATIONAL,
    /** A complex pair a ± ib with rational a, b ≠ 0: x² − 2ax + a² + b². */
    COMPLEX_PAIR,
    /** Real quadratic surds: x² + bx + c with a non-square discriminant (or a split one). */
    QUADRATIC_SURD,
    /** Roots of unity: a cyclotomic polynomial Φ_m. */
    ROOT_OF_UNITY,
    /** Roots of an irreducible cubic (one with a single real root, one casus irreducibilis, a pure cube root). */
    IRREDUCIBLE_CUBIC,
    /** Roots of an irreducible quintic, not solvable by radicals in general. */
    IRREDUCIBLE_QUINTIC,
    /** The root λ = 0 (a sequence whose first values are free; a constant term for an ODE). */
    ZERO,
    /** Roots with decimal coefficients: x − 0.3 or (x − 0.7)(x − 0.8) = x² − 1.5x + 0.56. */
    DECIMAL
}
