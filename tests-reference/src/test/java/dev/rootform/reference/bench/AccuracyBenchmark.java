package dev.rootform.reference.bench;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import java.util.List;

/**
 * Warm times of the answers issue 16 asks to be fast: values at n = 10^5 and 10^6 of recurrences with
 * a rational non-integer root (241/240) and surd roots (1 ± √2) to 30 digits, certified rather than
 * exact; a high-frequency oscillator y'' + 10^12·y = 0 (its cross-check on its own time scale); and
 * the generated-code model of an RLC step response (its accuracy measured on the problem's time
 * scales). Each whole job through {@link Rootform#solve}; 3 warm-up rounds, then the median of 5.
 */
public final class AccuracyBenchmark {
    private static final int WARM_UP = 3;
    private static final int REPEATS = 5;

    /** One timed job: what it is, the input and its options. */
    private record Job(String name, String input, Options options) {
    }

    private AccuracyBenchmark() {
    }

    public static void main(String[] args) {
        run();
    }

    /** Prints one median per job. */
    static void run() {
        Options large = Options.builder().digits(30).points("100000", "1000000").build();
        List<Job> jobs = List.of(
                new Job("x[n+1] = 241/240 x[n] - 1 at n = 10^5, 10^6 (30 digits)", "x[n+1] = 241/240 x[n] - 1; x[0] = 100", large),
                new Job("x[n+2] = 2x[n+1] + x[n] at n = 10^5, 10^6 (30 digits)", "x[n+2] = 2x[n+1] + x[n]; x[0] = 1; x[1] = 2", large),
                new Job("y'' + 10^12 y = 0, solved, verified, cross-checked", "y'' + 1000000000000 y = 0; y(0) = 1; y'(0) = 0",
                        Options.builder().build()),
                new Job("RLC step response with its generated-code model", "y'' + 1000y' + 1000000y = 1000000; y(0) = 0; y'(0) = 0",
                        Options.builder().code(true).build()));
        System.out.println("accuracy and large-n jobs (warm, median of " + REPEATS + "):");
        for (Job job : jobs) {
            Timings timings = new Timings();
            for (int round = 0; round < WARM_UP + REPEATS; round++) {
                long start = System.nanoTime();
                Result result = Rootform.solve(SolveRequest.of(job.input()).with(job.options()));
                long end = System.nanoTime();
                if (!(result instanceof Result.Solved)) {
                    throw new IllegalStateException(job.input() + ": " + result);
                }
                if (round >= WARM_UP) {
                    timings.add(end - start);
                }
            }
            System.out.printf("  %-62s %8.1f ms%n", job.name(), timings.medianMillis());
        }
    }
}
