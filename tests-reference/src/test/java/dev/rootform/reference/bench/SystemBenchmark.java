package dev.rootform.reference.bench;

import dev.rootform.api.Rootform;
import dev.rootform.api.SystemRequest;
import dev.rootform.api.SystemResult;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * Warm medians of e^(At) for 10×10 models through {@link Rootform#system}, wall and process CPU
 * time: a coupled chain of five carriages (positions and velocities; an invented conveyor) and a
 * dense random integer matrix.
 * Run: {@code mvn -B -o -pl tests-reference -am -DskipTests -Pbench -Dbench.class=dev.rootform.reference.bench.SystemBenchmark verify}.
 */
public final class SystemBenchmark {
    private static final int WARM_UP = 3;
    private static final int RUNS = 7;
    /** Process CPU time (all threads, JIT and GC included): less sensitive than wall time to other jobs on the machine. */
    private static final com.sun.management.OperatingSystemMXBean CPU =
            (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();

    private SystemBenchmark() {
    }

    public static void main(String[] args) {
        report("carriage chain (5 masses, springs 4, dampers 1/2)", chain());
        report("dense random integers -3..3 (seed 10)", dense());
    }

    private static void report(String name, String a) {
        for (int i = 0; i < WARM_UP; i++) {
            run(a);
        }
        List<Double> ms = new ArrayList<>();
        List<Double> cpu = new ArrayList<>();
        for (int i = 0; i < RUNS; i++) {
            long t0 = System.nanoTime();
            long c0 = CPU.getProcessCpuTime();
            SystemResult r = run(a);
            ms.add((System.nanoTime() - t0) / 1e6);
            cpu.add((CPU.getProcessCpuTime() - c0) / 1e6);
            if (!(r instanceof SystemResult.Analysed)) {
                throw new IllegalStateException("not verified: " + r);
            }
        }
        Collections.sort(ms);
        Collections.sort(cpu);
        System.out.printf("%s: median %.0f ms (min %.0f, max %.0f, %d warm runs); process CPU median %.0f ms%n", name,
                ms.get(RUNS / 2), ms.get(0), ms.get(RUNS - 1), RUNS, cpu.get(RUNS / 2));
    }

    private static SystemResult run(String a) {
        return Rootform.system(SystemRequest.continuous(a));
    }

    /** States (p1, v1, …, p5, v5): p' = v, v_i' = 4(p_{i-1} − 2p_i + p_{i+1}) − v_i/2, free ends. */
    private static String chain() {
        int n = 5;
        String[][] m = new String[2 * n][2 * n];
        for (String[] row : m) {
            java.util.Arrays.fill(row, "0");
        }
        for (int i = 0; i < n; i++) {
            m[2 * i][2 * i + 1] = "1";
            int neighbours = (i > 0 ? 1 : 0) + (i < n - 1 ? 1 : 0);
            m[2 * i + 1][2 * i] = Integer.toString(-4 * neighbours);
            if (i > 0) {
                m[2 * i + 1][2 * i - 2] = "4";
            }
            if (i < n - 1) {
                m[2 * i + 1][2 * i + 2] = "4";
            }
            m[2 * i + 1][2 * i + 1] = "\"-1/2\"";
        }
        return json(m);
    }

    private static String dense() {
        Random random = new Random(10);
        String[][] m = new String[10][10];
        for (String[] row : m) {
            for (int j = 0; j < 10; j++) {
                row[j] = Integer.toString(random.nextInt(7) - 3);
            }
        }
        return json(m);
    }

    private static String json(String[][] m) {
        List<String> rows = new ArrayList<>();
        for (String[] row : m) {
            rows.add("[" + String.join(",", row) + "]");
        }
        return "[" + String.join(",", rows) + "]";
    }
}
