package dev.rootform.export;

import java.util.Objects;

/**
 * How generated C evaluates the closed form: in which floating type, and whether it may call the C
 * math library. Without it ({@code libm} false) the code uses only + − × ÷: powers of a sequence by
 * repeated squaring, and exact integer terms; a closed form that needs e^x or cos x has no such
 * variant.
 *
 * @param type the floating type of the value function
 * @param libm whether the code may call pow/exp/cos (powf/expf/cosf)
 * @since 0.3
 */
public record CVariant(CType type, boolean libm) {
    /** double precision with the math library: the C of release 0.2, and what the Java code computes. */
    public static final CVariant DEFAULT = new CVariant(CType.DOUBLE, true);

    public CVariant {
        Objects.requireNonNull(type, "type");
    }

    /** {@code double}, {@code float}, {@code double without libm}, {@code float without libm}. */
    @Override
    public String toString() {
        return type.keyword() + (libm ? "" : " without libm");
    }
}
