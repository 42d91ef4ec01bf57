package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Timing of a whole solve of an order-64 differential equation with mixed multiplicities,
 * (D+1)^8 (D^2+2D+5)^6 (D^3−D−1)^4 (D^5−D−1)^4 (D^4+D+1)^3 = 0 — fitted to y^(j)(0) = 1, verified
 * exactly and analysed (certified roots, integrator cross-check, diagnostics) at 30 digits. A plain
 * main in the test sources, not a unit test; the README "Performance" section gives the command.
 * Prints each run and the median of {@link #RUNS} runs after one warm-up run.
 */
public final class SolveBenchmark {
    static final String OPERATOR = "(D+1)^8 (D^2+2D+5)^6 (D^3-D-1)^4 (D^5-D-1)^4 (D^4+D+1)^3";
    static final int RUNS = 5;

    private SolveBenchmark() {
    }

    public static void main(String[] args) {
        StringBuilder input = new StringBuilder(OPERATOR + " y = 0");
        int order = 8 + 12 + 12 + 20 + 12;
        for (int j = 0; j < order; j++) {
            input.append("; y").append(j == 0 ? "" : "^(" + j + ")").append("(0) = 1");
        }
        List<String> none = new ArrayList<>();
        Runnable once = () -> {
            Solution s = Solver.solve(ProblemParser.parse(input.toString(), none, null));
            if (!s.verified() || !new Analyzer(30).analyze(s, List.of()).checks().stream().allMatch(c -> c.passed())) {
                throw new IllegalStateException("order-" + order + " solve did not verify");
            }
        };
        once.run();
        double[] millis = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long start = System.nanoTime();
            once.run();
            millis[i] = (System.nanoTime() - start) / 1e6;
            System.out.printf("run %d: %.0f ms%n", i + 1, millis[i]);
        }
        Arrays.sort(millis);
        System.out.printf("order %d, solve + verify + analysis: median %.0f ms%n", order, millis[RUNS / 2]);
    }
}
