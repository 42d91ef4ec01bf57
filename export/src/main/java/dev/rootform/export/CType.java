package dev.rootform.export;

import java.util.Arrays;
import java.util.Optional;

/**
 * The floating type of generated C: {@code double}, or {@code float} for microcontrollers whose FPU
 * has single precision only (the math functions are then {@code powf}, {@code expf}, {@code cosf}
 * and every literal carries the suffix {@code f}).
 *
 * @since 0.3
 */
public enum CType {
    /** IEEE binary64. */
    DOUBLE("double", Double.MAX_VALUE, Double.MIN_NORMAL, CodeFacts.CAP),
    /** IEEE binary32; inputs are searched up to 2^24, the last integer with every integer below it a float. */
    FLOAT("float", Float.MAX_VALUE, Float.MIN_NORMAL, 16_777_216);

    private final String keyword;
    private final double max;
    private final double minNormal;
    private final double cap;

    CType(String keyword, double max, double minNormal, double cap) {
        this.keyword = keyword;
        this.max = max;
        this.minNormal = minNormal;
        this.cap = cap;
    }

    /** The C keyword, also the option value: {@code double} or {@code float}. */
    public String keyword() {
        return keyword;
    }

    /** The largest finite value (DBL_MAX, FLT_MAX). */
    public double max() {
        return max;
    }

    /** The smallest normal value (DBL_MIN, FLT_MIN). */
    public double minNormal() {
        return minNormal;
    }

    /** Where the search of the valid range stops: the largest index of a sequence, and the largest |t − t0| of a function. */
    public double cap() {
        return cap;
    }

    /** {@code x} rounded to this type (to nearest, ties to even), as a double. */
    public double round(double x) {
        return this == FLOAT ? (double) (float) x : x;
    }

    /** The type of a keyword, or empty when it names none. */
    public static Optional<CType> byKeyword(String keyword) {
        return Arrays.stream(values()).filter(t -> t.keyword.equals(keyword)).findFirst();
    }
}
