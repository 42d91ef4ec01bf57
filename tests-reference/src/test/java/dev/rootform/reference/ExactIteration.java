package dev.rootform.reference;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.ForcingTerm;
import java.util.ArrayList;
import java.util.List;

/**
 * The independent reference for sequences: exact rational iteration of Σ_{j=0..k} a_j x[m+j] = g(m)
 * forward from k consecutive starting values, x[m+k] = (g(m) − Σ_{j&lt;k} a_j x[m+j]) / a_k. The
 * right-hand side g is evaluated here on its own (cos/sin(qπn) from doubles rounded to the nearest
 * half, which is exact for the multiples of π/3 and π/2 that the generator uses).
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
        return values(coefficients, List.of(), 0, start, count);
    }

    /**
     * The values x[first] … x[first+count−1] of the forced recurrence with right-hand side
     * {@code forcing} (terms in the index n of x[n]).
     */
    static List<Rational> values(List<Rational> coefficients, List<ForcingTerm> forcing, long first,
            List<Rational> start, int count) {
        int k = coefficients.size() - 1;
        if (start.size() != k) {
            throw new IllegalArgumentException("need " + k + " starting values, got " + start.size());
        }
        List<Rational> x = new ArrayList<>(start);
        while (x.size() < count) {
            int m = x.size() - k;
            Rational sum = rightSide(forcing, first + m);
            for (int j = 0; j < k; j++) {
                sum = sum.subtract(coefficients.get(j).multiply(x.get(m + j)));
            }
            x.add(sum.divide(coefficients.get(k)));
        }
        return List.copyOf(x.subList(0, count));
    }

    private static Rational rightSide(List<ForcingTerm> forcing, long n) {
        Rational sum = Rational.ZERO;
        for (ForcingTerm t : forcing) {
            Rational v = t.coefficient().multiply(Rational.of(n).pow(t.power())).multiply(t.exponential().pow((int) n));
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                double angle = t.frequency().doubleValue() * (t.frequencyTimesPi() ? Math.PI : 1) * n;
                double trig = t.oscillation() == ForcingTerm.Oscillation.COS ? Math.cos(angle) : Math.sin(angle);
                v = v.multiply(Rational.of(Math.round(2 * trig), 2));
            }
            sum = sum.add(v);
        }
        return sum;
    }
}
