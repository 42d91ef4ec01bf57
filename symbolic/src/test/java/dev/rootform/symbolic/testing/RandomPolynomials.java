package dev.rootform.symbolic.testing;

import java.util.Random;

/** Seeded random integer polynomials for tests and benchmarks of the root finder. */
public final class RandomPolynomials {
    private RandomPolynomials() {
    }

    /**
     * Coefficients a_0..a_degree uniform in [−1000, 1000], the leading one in [1, 1000] and a_0 ≠ 0
     * (so 0 is not a root), from {@code new Random(seed)}.
     */
    public static long[] integerCoefficients(int degree, long seed) {
        Random random = new Random(seed);
        long[] c = new long[degree + 1];
        for (int i = 0; i <= degree; i++) {
            c[i] = random.nextInt(2001) - 1000;
        }
        c[degree] = 1 + random.nextInt(1000);
        c[0] = c[0] == 0 ? 1 : c[0];
        return c;
    }
}
