package dev.rootform.reference;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;

/**
 * The independent reference for sequences: exact rational iteration of Σ_{j=0..k} a_j x[m+j] = 0
 * forward from k consecutive starting values, x[m+k] = −(Σ_{j&lt;k} a_j x[m+j]) / a_k.
 */
final class ExactIteration {
    private ExactIteration() {
    }

    /**
     * The values x[first], x[first+1], …, x[first+count−1].
     *
     * @param coefficients a_0 … a_k with a_k ≠ 0
     * @param start x[first] … x[first+k−1]
     */
    static List<Rational> values(List<Rational> coefficients, List<Rational> start, int count) {
        int k = coefficients.size() - 1;
        if (start.size() != k) {
            throw new IllegalArgumentException("need " + k + " starting values, got " + start.size());
        }
        List<Rational> x = new ArrayList<>(start);
        while (x.size() < count) {
            int m = x.size() - k;
            Rational sum = Rational.ZERO;
            for (int j = 0; j < k; j++) {
                sum = sum.add(coefficients.get(j).multiply(x.get(m + j)));
            }
            x.add(sum.negate().divide(coefficients.get(k)));
        }
        return List.copyOf(x.subList(0, count));
    }
}
