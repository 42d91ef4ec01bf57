package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Arrays;
import java.util.List;

/**
 * Timing of {@link RootFinder} on a seeded random integer polynomial of degree 200 (coefficients
 * uniform in [−1000, 1000], leading coefficient positive), certified to 50 digits. Lives in the test
 * sources so it is not shipped; it is a plain main, not a unit test. Run with
 * {@code mvn -pl numeric -am test-compile} and then
 * {@code java -cp <test and runtime classpath> dev.rootform.numeric.roots.RootBenchmark}.
 * Prints each run and the median of {@link #RUNS} runs after {@link #WARM_UPS} warm-up runs.
 */
public final class RootBenchmark {
    static final int DEGREE = 200;
    static final int DIGITS = 50;
    static final long SEED = 7;
    static final int WARM_UPS = 3;
    static final int RUNS = 5;

    private RootBenchmark() {
    }

    public static void main(String[] args) {
        RationalPolynomial p = RootFinderTest.randomPolynomial(DEGREE, SEED);
        RootFinder finder = new RootFinder(DIGITS);
        for (int i = 0; i < WARM_UPS; i++) {
            finder.roots(p);
        }
        double[] millis = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long start = System.nanoTime();
            List<Enclosure> roots = finder.roots(p);
            millis[i] = (System.nanoTime() - start) / 1e6;
            System.out.printf("run %d: %.0f ms, %d enclosures%n", i + 1, millis[i], roots.size());
        }
        Arrays.sort(millis);
        System.out.printf("degree %d, %d digits: median %.0f ms%n", DEGREE, DIGITS, millis[RUNS / 2]);
    }
}
