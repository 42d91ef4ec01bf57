package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solver;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Seeded property: for random recurrences a_k·x[n+k] + … + a_0·x[n] = b_0 + b_1·n + b_2·r^n of order
 * 1 to 4 with small integer coefficients (a leading coefficient up to 4, so roots with denominators),
 * rational starting values and r ∈ {2, −1/3}, the value with all its digits at a random index equals
 * exact rational iteration of the recurrence itself (no closed form involved), in lowest terms.
 */
class IndexPoweringPropertyTest {
    private static final int PROBLEMS = 60 * Integer.getInteger("tests.multiplier", 1);

    @Test
    void agreesWithExactIteration() {
        Random random = new Random(20261202);
        for (int p = 0; p < PROBLEMS; p++) {
            int k = 1 + random.nextInt(4);
            long[] a = new long[k + 1];
            for (int j = 0; j < k; j++) {
                a[j] = random.nextInt(9) - 4;
            }
            a[k] = 1 + random.nextInt(4);
            long[] b = {random.nextInt(7) - 3, random.nextInt(5) - 2, random.nextInt(5) - 2};
            Rational r = random.nextBoolean() ? Rational.of(2) : Rational.of(-1, 3);
            List<Rational> start = new ArrayList<>();
            for (int j = 0; j < k; j++) {
                start.add(Rational.of(random.nextInt(11) - 5, 1 + random.nextInt(3)));
            }
            String input = input(a, b, r, start);
            int n = k + random.nextInt(300);
            Rational expected = iterate(a, b, r, start, n);
            var solution = Solver.solve(ProblemParser.parse(input, List.of(), null)).exact().orElseThrow(() -> new AssertionError(input));
            assertEquals(expected.toString(), IndexPowering.value(solution, n).toString(), input + " at n = " + n);
        }
    }

    private static String input(long[] a, long[] b, Rational r, List<Rational> start) {
        int k = a.length - 1;
        StringBuilder s = new StringBuilder(a[k] + " x[n+" + k + "]");
        for (int j = k - 1; j >= 0; j--) {
            s.append(" + (").append(a[j]).append(") x[n+").append(j).append("]");
        }
        s.append(" = (").append(b[0]).append(") + (").append(b[1]).append(") n + (").append(b[2]).append(") (").append(r).append(")^n");
        for (int j = 0; j < k; j++) {
            s.append("; x[").append(j).append("] = ").append(start.get(j));
        }
        return s.toString();
    }

    /** x[n] by the recurrence: x[m+k] = (f(m) − Σ_{j<k} a_j·x[m+j]) / a_k. */
    private static Rational iterate(long[] a, long[] b, Rational r, List<Rational> start, int n) {
        int k = a.length - 1;
        List<Rational> x = new ArrayList<>(start);
        Rational power = Rational.ONE;
        for (int m = 0; x.size() <= n; m++) {
            Rational f = Rational.of(b[0]).add(Rational.of(b[1] * m)).add(Rational.of(b[2]).multiply(power));
            for (int j = 0; j < k; j++) {
                f = f.subtract(Rational.of(a[j]).multiply(x.get(m + j)));
            }
            x.add(f.divide(Rational.of(a[k])));
            power = power.multiply(r);
        }
        return x.get(n);
    }
}
