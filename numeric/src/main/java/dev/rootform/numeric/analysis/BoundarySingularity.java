package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.solve.Solution;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Explains a boundary-value system that is singular at the working precision, as a
 * {@link ConditionsException} with a one-line message: either
 * the conditions contradict each other (a zero row with a nonzero right side), or they leave a
 * solution free, given by the kernel vector of the reduced matrix; when its entries (scaled so
 * the largest is 1) are small rationals to the working precision, that free solution is returned
 * exactly as a closed form, e.g. sin(t) for y'' + y = 0, y(0) = 0, y(π) = 0.
 */
final class BoundarySingularity {
    private BoundarySingularity() {
    }

    /** A kernel entry within 10^-(working - 10) of a multiple of 1/60 is taken as that rational. */
    private static final int SMALL_DENOMINATORS = 60;

    static ConditionsException explain(Apfloat[][] a, int[] pivotRow, int rank, Apfloat tiny, Apfloat[] scales,
            long working, Solution solution, List<String> constants) {
        int k = a.length;
        String digits = " (singular to " + (working - 10) + " digits)";
        for (int r = rank; r < k; r++) {
            if (ApfloatMath.abs(a[r][k]).compareTo(tiny.multiply(scales[r])) > 0) {
                return ConditionsException.contradictory("the boundary conditions contradict each other: no solution meets them all" + digits);
            }
        }
        int free = 0;
        while (pivotRow[free] >= 0) {
            free++;
        }
        Apfloat[] v = new Apfloat[k];
        for (int c = 0; c < k; c++) {
            v[c] = c == free ? new Apfloat(1, working)
                    : pivotRow[c] < 0 ? Apfloat.ZERO : a[pivotRow[c]][free].negate().divide(a[pivotRow[c]][c]);
        }
        Apfloat largest = Apfloat.ONE;
        for (Apfloat x : v) {
            largest = ApfloatMath.abs(x).compareTo(largest) > 0 ? ApfloatMath.abs(x) : largest;
        }
        Map<String, Rational> exact = new HashMap<>();
        StringBuilder combination = new StringBuilder();
        for (int c = 0; c < k; c++) {
            Apfloat x = v[c].divide(largest);
            combination.append(c == 0 ? "" : ", ").append(constants.get(c)).append(" ≈ ")
                    .append(Decimals.toBigDecimal(x, 10).stripTrailingZeros().toPlainString());
            Rational r = Rational.of(Math.round(x.doubleValue() * SMALL_DENOMINATORS), SMALL_DENOMINATORS);
            if (ApfloatMath.abs(x.subtract(Decimals.toApfloat(r, working))).compareTo(tiny) <= 0) {
                exact.put(constants.get(c), r);
            }
        }
        String message = "the boundary conditions leave a solution free" + digits;
        if (exact.size() == k) {
            return ConditionsException.underdetermined(message, solution.general().withConstantValues(exact));
        }
        return ConditionsException.underdetermined(message + ": adding any multiple of the homogeneous solution with "
                + combination + " keeps every condition", null);
    }
}
