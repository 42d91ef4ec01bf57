package dev.rootform.symbolic.model;

/**
 * The sizes rootform accepts, in one place. Input beyond any of them is refused at once as bad
 * input (a {@link InputException} naming the size and the limit) instead of running into the time
 * limit or out of memory; input within them is answered. The README's "Limits" table lists them.
 *
 * @since 0.2
 */
public final class Limits {
    /** Characters of one input string (the equation with its conditions, or one further condition). */
    public static final int MAX_INPUT_LENGTH = 10_000;
    /** Levels of nesting: parentheses, brackets, signs and exponents inside one another. */
    public static final int MAX_NESTING = 100;
    /** Operations one after another in one side of an equation (the depth of its expression tree). */
    public static final int MAX_EXPRESSION_DEPTH = 500;
    /** Digits of one number literal. */
    public static final int MAX_LITERAL_DIGITS = 1000;
    /** Size of the decimal exponent of a literal ({@code 1e1000} is the largest power of ten). */
    public static final int MAX_DECIMAL_EXPONENT = 1000;
    /** Digits of numerator and denominator of any exact number computed while reading (e.g. {@code 3^2000}). */
    public static final int MAX_NUMBER_DIGITS = 2000;
    /** Order of the equation: the highest derivative, the span of the shifts, the degree of an operator. */
    public static final int MAX_ORDER = 200;
    /** Degree of the polynomial part of one forcing term ({@code n^100}). */
    public static final int MAX_FORCING_DEGREE = 100;
    /** Distinct terms of the forcing after expansion. */
    public static final int MAX_FORCING_TERMS = 100;
    /** Size of a sequence index in conditions and values ({@code x[1000000]}). */
    public static final long MAX_INDEX = 1_000_000;
    /**
     * Size of a condition's index in a recurrence forced at a frequency ω that is not a rational multiple
     * of π: cos(kω) is a polynomial of degree k in cos ω, so the exact constants grow with k
     * (x[100] = 1 takes seconds, x[300] = 1 minutes; measured in README "Input syntax").
     */
    public static final long MAX_SINUSOID_INDEX = 100;
    /** Size of a point of a function in conditions and values ({@code y(1e6)}). */
    public static final long MAX_POINT = 1_000_000;
    /** Parameters declared with --params. */
    public static final int MAX_PARAMETERS = 12;
    /** Order of an equation with parameters, including the forcing's annihilator. */
    public static final int MAX_PARAMETRIC_ORDER = 8;
    /** Significant digits of numeric output. */
    public static final int MAX_DIGITS = 10_000;
    /**
     * Size of a sequence index whose value is asked for with all its digits ({@code --all-digits}); the
     * value's own size, {@link #MAX_EXACT_DIGITS}, is the bound that usually decides.
     */
    public static final long MAX_EXACT_INDEX = 1_000_000_000;
    /**
     * Digits of one value given with all its digits, estimated before it is computed (F(10^7) has
     * 2,089,877). Beyond about 10^7 digits apfloat would keep the numbers in temporary files.
     */
    public static final long MAX_EXACT_DIGITS = 5_000_000;

    private Limits() {
    }
}
