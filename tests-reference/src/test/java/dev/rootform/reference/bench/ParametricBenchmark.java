package dev.rootform.reference.bench;

import dev.rootform.api.Options;
import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.Rootform;
import dev.rootform.symbolic.params.Assumptions;
import dev.rootform.symbolic.params.ParametricSolver;
import dev.rootform.symbolic.parse.ParametricParser;
import java.util.List;
import java.util.function.Supplier;

/**
 * Warm times of the answers with parameters issue 12 asks to be fast: the symbolic solve of a forced
 * order-2 equation with three parameters (cases, exact check), the same with five, and order-4
 * stability conditions (Routh–Hurwitz; Jury for a recurrence); also the whole API call, which adds
 * two specialisations solved by the ordinary solver. 3 warm-up rounds, then the median of 5.
 */
public final class ParametricBenchmark {
    private static final int WARM_UP = 3;
    private static final int REPEATS = 5;

    private ParametricBenchmark() {
    }

    public static void main(String[] args) {
        run();
    }

    /** Prints one median per job. */
    static void run() {
        System.out.println("parameters (warm, median of " + REPEATS + "):");
        time("order 2, m, c, k, forced by cos(2t): symbolic solve", () -> solve(
                "m y'' + c y' + k y = cos(2 t); y(0) = 0; y'(0) = 0", "m,c,k", "m > 0, c > 0, k > 0"));
        time("order 2, m, c, k, F, w, forced by F cos(w t): symbolic solve", () -> solve(
                "m y'' + c y' + k y = F cos(w t); y(0) = 0; y'(0) = 0", "m,c,k,F,w", "m > 0, c > 0, k > 0, w > 0"));
        time("order 4, Routh–Hurwitz conditions", () -> stability("y'''' + a3 y''' + a2 y'' + a1 y' + a0 y = 0"));
        time("order 4 recurrence, Jury conditions", () -> stability("x[n+4] + a3 x[n+3] + a2 x[n+2] + a1 x[n+1] + a0 x[n] = 0"));
        time("order 2, m, c, k, forced: whole API call with 2 specialisation checks", () -> Rootform.solveWithParameters(
                ParametricRequest.of("m y'' + c y' + k y = cos(2 t); y(0) = 0; y'(0) = 0", "m,c,k").where("m > 0, c > 0, k > 0")
                        .with(Options.defaults())) instanceof ParametricResult.Solved);
    }

    private static boolean solve(String text, String params, String where) {
        List<String> names = ParametricParser.names(params);
        return ParametricSolver.solve(ParametricParser.parse(text, names, null), Assumptions.parse(where, names)).verified();
    }

    private static boolean stability(String text) {
        List<String> names = ParametricParser.names("a3,a2,a1,a0");
        return ParametricSolver.stability(ParametricParser.parse(text, names, null), Assumptions.none()) != null;
    }

    private static void time(String name, Supplier<Boolean> job) {
        Timings timings = new Timings();
        for (int round = 0; round < WARM_UP + REPEATS; round++) {
            long start = System.nanoTime();
            boolean ok = job.get();
            long end = System.nanoTime();
            if (!ok) {
                throw new IllegalStateException(name + ": not verified");
            }
            if (round >= WARM_UP) {
                timings.add(end - start);
            }
        }
        System.out.printf("  %-66s %8.1f ms%n", name, timings.medianMillis());
    }
}
