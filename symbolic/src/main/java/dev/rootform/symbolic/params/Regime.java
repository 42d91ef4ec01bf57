package dev.rootform.symbolic.params;

/** The form a mode takes in one case. */
public enum Regime {
    /** A single root ρ: e^(ρt) or ρ^n. */
    ROOT,
    /** A pair with W &gt; 0 (discriminant &gt; 0): two real roots σ ± √W. */
    REAL_PAIR,
    /** A pair with W = 0: the double root σ. */
    DOUBLE_ROOT,
    /** A pair with W &lt; 0: the complex pair σ ± i√(−W). */
    COMPLEX_PAIR
}
