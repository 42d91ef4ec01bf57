package dev.rootform.symbolic.params;

import java.util.Objects;

/**
 * The part v^power·(even·X_E + odd·X_O) of a solution that belongs to one mode (for a single root
 * X_E is its exponential or power and odd is zero). See {@link ParamMode}.
 *
 * @param mode index into the case's modes
 * @param power the power of the variable
 * @param even the coefficient of v^power·X_E
 * @param odd the coefficient of v^power·X_O
 * @param steady true when the power is at least the mode's multiplicity in χ (the particular part)
 * @since 0.3
 */
public record ParamPiece(int mode, int power, ParamFunction even, ParamFunction odd, boolean steady) {
    public ParamPiece {
        Objects.requireNonNull(even, "even");
        Objects.requireNonNull(odd, "odd");
    }

    public boolean isZero() {
        return even.isZero() && odd.isZero();
    }
}
