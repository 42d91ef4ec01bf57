package dev.rootform.reference.bench;

import dev.rootform.api.Options;
import dev.rootform.api.ResponseRequest;
import dev.rootform.api.ResponseResult;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import java.util.List;

/**
 * Warm time of {@code rootform response} through the library API for order-10 transfer functions
 * (target: median ≤ 100 ms for H(s)), each the whole job: parse, exact facts, planned problem
 * solved and verified (exact checks, the integrator cross-check), pole and zero values, and for
 * the step input the certified step figures. Not part of the test run; started by the
 * {@code bench} profile with {@code -Dbench.class=dev.rootform.reference.bench.ResponseBenchmark}
 * (command in README "Performance").
 */
public final class ResponseBenchmark {
    private static final int WARM_UP = 30;
    private static final int RUNS = 60;
    /** Stable, order 10, factors of degrees 1 and 2 (poles -1, -2, -3, -4 and three complex pairs). */
    private static final String FACTORED = "H(s) = 30(s^2 + 3s + 1)/((s + 1)(s + 2)(s + 3)(s + 4)(s^2 + 2s + 5)(s^2 + s + 3)(s^2 + 4s + 13))";
    /** Stable, order 10, the denominator expanded, with an irreducible factor of degree 8. */
    private static final String EXPANDED = "H(s) = (s^3 + 2s + 1)/((s + 1)^10 + 1)";
    /** Order 10 in z: a cascade of five second-order sections, written in z^-1. */
    private static final String DIGITAL = "H(z) = 0.01/((1 - 0.5z^-1 + 0.25z^-2)(1 - 0.9z^-1 + 0.2z^-2)(1 + 0.3z^-1 + 0.1z^-2)"
            + "(1 - 1.2z^-1 + 0.72z^-2)(1 - 0.1z^-1 - 0.3z^-2))";

    /** Process CPU time (all threads, JIT and GC included): less sensitive than wall time to other jobs on the machine. */
    private static final com.sun.management.OperatingSystemMXBean CPU =
            (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();

    private ResponseBenchmark() {
    }

    public static void main(String[] args) {
        System.out.printf("rootform response benchmark — Java %s, %d CPUs, %d runs after %d warm-up, 30 digits%n",
                System.getProperty("java.version"), Runtime.getRuntime().availableProcessors(), RUNS, WARM_UP);
        for (String[] c : List.of(new String[] {FACTORED, "impulse"}, new String[] {FACTORED, "step"},
                new String[] {EXPANDED, "impulse"}, new String[] {DIGITAL, "impulse"}, new String[] {DIGITAL, "step"})) {
            measure(c[0], c[1]);
        }
    }

    /**
     * The response, then for comparison {@code rootform solve} of the problem the response solved
     * (the same equation, initial values and points: the share of the time that solve itself takes).
     */
    private static void measure(String transfer, String input) {
        Options options = Options.builder().points("1", "5").build();
        ResponseRequest request = ResponseRequest.of(transfer).to(input).with(options);
        ResponseResult first = Rootform.response(request);
        if (!(first instanceof ResponseResult.Answered answered)) {
            throw new IllegalStateException(transfer + ": " + first);
        }
        SolveRequest solve = SolveRequest.of(answered.report().problem()).with(options);
        System.out.printf("%-8s %s%n", input, transfer);
        report("response", time(() -> Rootform.response(request).answer().orElseThrow()));
        report("its solve", time(() -> Rootform.solve(solve).answer().orElseThrow()));
    }

    /** Wall and process-CPU times of RUNS calls after WARM_UP. */
    private static Timings[] time(Runnable call) {
        for (int i = 0; i < WARM_UP; i++) {
            call.run();
        }
        Timings wall = new Timings();
        Timings cpu = new Timings();
        for (int i = 0; i < RUNS; i++) {
            long start = System.nanoTime();
            long startCpu = CPU.getProcessCpuTime();
            call.run();
            wall.add(System.nanoTime() - start);
            cpu.add(CPU.getProcessCpuTime() - startCpu);
        }
        return new Timings[] {wall, cpu};
    }

    private static void report(String what, Timings[] t) {
        System.out.printf("         %-10s wall median %.1f ms, p90 %.1f ms; process CPU median %.1f ms%n", what,
                t[0].medianMillis(), t[0].quantileMillis(0.9), t[1].medianMillis());
    }
}
