package dev.rootform.export;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.List;

/**
 * What rootform measured about the floating-point formula of generated code in one C variant (the
 * double one is also the Java code's): the input range where every term stays finite and the
 * largest stays a normal number of the variant's type, and the largest relative error against the
 * exact values over a sample of points inside that range.
 *
 * @param low smallest valid input (first index, or smallest t)
 * @param high largest valid input
 * @param bounded whether {@code high}/{@code low} are real limits, not the search cap
 * @param points the sample points
 * @param exact the exact values there (sequences) or values to 30 digits (functions)
 * @param maxRelativeError max |value − exact|/|exact| over the points with exact ≠ 0 (points where the
 *     exact value is 0 are left out of the relative measure)
 * @since 0.2
 */
public record CodeFacts(double low, double high, boolean bounded, List<Rational> points, List<BigDecimal> exact,
        double maxRelativeError) {
    /** Farthest input examined when searching the valid range in double ({@link CType#cap()}). */
    public static final double CAP = 1e15;

    public CodeFacts {
        points = List.copyOf(points);
        exact = List.copyOf(exact);
    }
}
