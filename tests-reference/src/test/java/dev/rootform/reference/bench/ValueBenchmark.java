package dev.rootform.reference.bench;

import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Report;
import dev.rootform.reference.FastDoubling;
import java.lang.invoke.MethodHandle;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.math.BigInteger;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.LongToDoubleFunction;
import javax.tools.ToolProvider;

/**
 * The value and generated-code rows of issue 17 (a plain main, not a test; started by the
 * {@code bench} profile with {@code -Dbench.class=dev.rootform.reference.bench.ValueBenchmark}):
 * <ul>
 * <li>exact values with all their digits through {@link Rootform#solve}: F(10^7) (the first call in
 * this JVM, then warm; its 2,089,877 digits compared with fast doubling), the Pell number P(10^7) and
 * the rational root 241/240 at n = 10^6 (a 4.8-million-digit fraction);
 * <li>warm whole jobs through {@link Rootform#solve} with a value at n = 10^6 to 50 digits
 * (Fibonacci, the rational root 241/240, the surds 1 ± √2);
 * <li>the generated Java {@code term(n)} against plain fast doubling on {@code BigInteger} at
 * n = 10^7 (Fibonacci; both in this JVM, results compared);
 * <li>the generated double evaluator {@code value(n)} against naive double iteration at n = 10^6,
 * for Fibonacci and for a decaying oscillation whose value there is finite.
 * </ul>
 * {@code -Dbench.parts=values,term,evaluator} picks the parts. Fast doubling is {@link FastDoubling}.
 */
public final class ValueBenchmark {
    private static final int WARM_UP = 3;
    private static final int REPEATS = Integer.getInteger("bench.repeats", 5);
    private static final long HUGE = 10_000_000L;
    private static final long N = 1_000_000L;

    private ValueBenchmark() {
    }

    public static void main(String[] args) throws Throwable {
        System.out.printf("value and generated-code benchmark — Java %s, %d CPUs%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors());
        String parts = System.getProperty("bench.parts", "all,values,term,evaluator");
        if (parts.contains("all")) {
            allDigits();
        }
        if (parts.contains("values")) {
            values();
        }
        if (parts.contains("term")) {
            generatedTerm();
        }
        if (parts.contains("evaluator")) {
            generatedValue();
        }
    }

    /** One timed solve: what it is, the input, the options. */
    private record Job(String name, String input, Options options) {
    }

    private static void values() {
        Options fifty = Options.builder().digits(50).points("1000000").build();
        Options none = Options.builder().digits(50).build();
        List<String[]> problems = List.of(
                new String[] {"Fibonacci", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1"},
                new String[] {"x[n+1] = 241/240 x[n] - 1", "x[n+1] = 241/240 x[n] - 1; x[0] = 100"},
                new String[] {"x[n+2] = 2x[n+1] + x[n] (1 ± √2)", "x[n+2] = 2x[n+1] + x[n]; x[0] = 1; x[1] = 2"});
        System.out.println("values at n = 10^6 to 50 digits, whole job through Rootform.solve (warm, median of " + REPEATS
                + "; wall clock and CPU time of the solving thread), and the same solve without the value:");
        for (String[] problem : problems) {
            String shown = time(new Job(problem[0] + " at n = 10^6", problem[1], fifty));
            time(new Job(problem[0] + " without values", problem[1], none));
            System.out.println("    x[10^6] = " + shown);
        }
    }

    private static void allDigits() {
        Options huge = Options.builder().points(Long.toString(HUGE)).allDigits(true).build();
        String fibonacci = "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1";
        long start = System.nanoTime();
        Result first = Rootform.solve(SolveRequest.of(fibonacci).with(huge));
        String digits = first.answer().orElseThrow(() -> new IllegalStateException(first.toString())).values().get(0).exactText().orElseThrow();
        long end = System.nanoTime();
        System.out.printf("exact values with all their digits through Rootform.solve%n  F(10^7), first call in this JVM, "
                + "with its text: %.0f ms wall (%d digits)%n", (end - start) / 1e6, digits.length());
        if (!digits.equals(FastDoubling.fibonacci(HUGE).toString())) {
            throw new IllegalStateException("F(10^7) differs from fast doubling");
        }
        time(new Job("F(10^7), all digits (warm)", fibonacci, huge));
        time(new Job("Pell P(10^7), all digits (warm)", "x[n+2] = 2x[n+1] + x[n]; x[0] = 0; x[1] = 1", huge));
        time(new Job("x[n+1] = 241/240 x[n] - 1 at n = 10^6, all digits (warm)", "x[n+1] = 241/240 x[n] - 1; x[0] = 100",
                Options.builder().points(Long.toString(N)).allDigits(true).build()));
    }

    /** CPU time of the calling thread, in nanoseconds (steadier than the wall clock on a shared machine). */
    private static long cpuNanos() {
        return ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    /** Times one job, prints the medians; returns the first value shown, if any. */
    private static String time(Job job) {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        Timings wall = new Timings();
        Timings cpu = new Timings();
        String shown = "";
        for (int round = 0; round < WARM_UP + REPEATS; round++) {
            long cpu0 = threads.getCurrentThreadCpuTime();
            long start = System.nanoTime();
            Result result = Rootform.solve(SolveRequest.of(job.input()).with(job.options()));
            long end = System.nanoTime();
            long cpu1 = threads.getCurrentThreadCpuTime();
            Report report = result.answer().orElseThrow(() -> new IllegalStateException(job.input() + ": " + result));
            shown = report.analysis().values().isEmpty() ? "" : report.analysis().values().get(0).value().toString();
            if (round >= WARM_UP) {
                wall.add(end - start);
                cpu.add(cpu1 - cpu0);
            }
        }
        System.out.printf("  %-50s %8.1f ms wall %8.1f ms CPU%n", job.name(), wall.medianMillis(), cpu.medianMillis());
        return shown;
    }

    private static void generatedTerm() throws Throwable {
        Generated fib = Generated.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "Fib");
        MethodHandle term = fib.handle("term", MethodType.methodType(BigInteger.class, long.class));
        BigInteger warm = (BigInteger) term.invokeExact(100_000L);
        if (!warm.equals(FastDoubling.fibonacci(100_000L))) {
            throw new IllegalStateException("term(10^5) differs from fast doubling");
        }
        Timings generated = new Timings();
        Timings doubling = new Timings();
        int rounds = Integer.getInteger("bench.termRepeats", 3);
        for (int round = 0; round < rounds; round++) {
            long t0 = cpuNanos();
            BigInteger a = (BigInteger) term.invokeExact(HUGE);
            long t1 = cpuNanos();
            BigInteger b = FastDoubling.fibonacci(HUGE);
            long t2 = cpuNanos();
            if (!a.equals(b)) {
                throw new IllegalStateException("term(10^7) differs from fast doubling");
            }
            generated.add(t1 - t0);
            doubling.add(t2 - t1);
        }
        System.out.printf("generated term(10^7) %.0f ms, fast doubling on BigInteger %.0f ms: ratio %.2f (CPU time, median of %d)%n",
                generated.medianMillis(), doubling.medianMillis(), generated.medianMillis() / doubling.medianMillis(), rounds);
    }

    private static void generatedValue() throws Throwable {
        generatedValue("Fibonacci", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", new double[] {0, 1}, new double[] {1, 1});
        generatedValue("decaying oscillation (roots 0.99997·e^(±0.00707i))",
                "x[n+2] = 19999/10000 x[n+1] - 19999/20000 x[n]; x[0] = 0; x[1] = 1", new double[] {0, 1},
                new double[] {-0.99995, 1.9999});
        generatedValue("triple root 0.9999",
                "x[n+3] = 29997/10000 x[n+2] - 299940003/100000000 x[n+1] + 999700029999/1000000000000 x[n]; "
                        + "x[0] = 0; x[1] = 1; x[2] = 2", new double[] {0, 1, 2}, new double[] {0.999700029999, -2.99940003, 2.9997});
    }

    /** value(10^6) of the generated code against iterating x[k+K] = Σ_j c[j]·x[k+j] in doubles from the start values. */
    private static void generatedValue(String name, String input, double[] start, double[] c) throws Throwable {
        Generated g = Generated.of(input, "Gen" + Math.abs(input.hashCode()));
        LongToDoubleFunction value = g.evaluator();
        double sink = 0;
        for (int i = 0; i < 50_000; i++) {
            sink += value.applyAsDouble(N - (i & 7)) + naive(1000 + (i & 7), start, c);
        }
        Timings closed = new Timings();
        Timings naive = new Timings();
        int batch = 200_000;
        for (int round = 0; round < REPEATS; round++) {
            long t0 = cpuNanos();
            for (int i = 0; i < batch; i++) {
                sink += value.applyAsDouble(N - (i & 7));
            }
            closed.add((cpuNanos() - t0) / batch);
            t0 = cpuNanos();
            for (int i = 0; i < 20; i++) {
                sink += naive(N - (i & 7), start, c);
            }
            naive.add((cpuNanos() - t0) / 20);
        }
        double closedNs = closed.medianMillis() * 1e6;
        double naiveNs = naive.medianMillis() * 1e6;
        System.out.printf("generated value(10^6), %s: %.1f ns; naive double iteration %.2f ms; ratio %.0fx (CPU time; value %s, iteration %s)%n",
                name, closedNs, naiveNs / 1e6, naiveNs / closedNs, value.applyAsDouble(N), naive(N, start, c));
        System.out.println(sink == 42 ? "" : "(checksum kept)");
    }

    /**
     * x[n] by iterating x[k+K] = Σ_j c[j]·x[k+j] in doubles (K = c.length, 2 or 3) from x[0..K-1] =
     * start, the state in locals as one would write it by hand.
     */
    private static double naive(long n, double[] start, double[] c) {
        if (c.length == 2) {
            double a = start[0];
            double b = start[1];
            for (long m = 0; m < n; m++) {
                double next = c[0] * a + c[1] * b;
                a = b;
                b = next;
            }
            return a;
        }
        double a = start[0];
        double b = start[1];
        double d = start[2];
        for (long m = 0; m < n; m++) {
            double next = c[0] * a + c[1] * b + c[2] * d;
            a = b;
            b = d;
            d = next;
        }
        return a;
    }

    /** Generated Java for one problem, compiled and loaded in this JVM. */
    private record Generated(Class<?> type) {
        static Generated of(String input, String className) throws Exception {
            Result result = Rootform.solve(SolveRequest.of(input).with(Options.builder().code(true).build()));
            Report report = result.answer().orElseThrow(() -> new IllegalStateException(input + ": " + result));
            CodeNames names = new CodeNames(Optional.empty(), className, CodeNames.DEFAULT_FUNCTION, Optional.empty());
            String source = Exporters.byName("java").orElseThrow().render(report, names).text();
            Path dir = Files.createTempDirectory("rootform-bench");
            Path file = dir.resolve(className + ".java");
            Files.writeString(file, source);
            Path adapter = dir.resolve(className + "Adapter.java");
            Files.writeString(adapter, "public final class " + className + "Adapter implements java.util.function.LongToDoubleFunction {\n"
                    + "    public double applyAsDouble(long n) {\n        return " + className + ".value(n);\n    }\n}\n");
            if (ToolProvider.getSystemJavaCompiler().run(null, null, null, "-d", dir.toString(), file.toString(), adapter.toString()) != 0) {
                throw new IllegalStateException("javac failed on the generated " + className);
            }
            URLClassLoader loader = new URLClassLoader(new java.net.URL[] {dir.toUri().toURL()});
            return new Generated(loader.loadClass(className));
        }

        MethodHandle handle(String name, MethodType type) throws ReflectiveOperationException {
            return MethodHandles.publicLookup().findStatic(type(), name, type);
        }

        /** value(long) behind an interface, through a compiled adapter: the JIT inlines it as it would a direct call. */
        LongToDoubleFunction evaluator() throws ReflectiveOperationException {
            return (LongToDoubleFunction) type().getClassLoader().loadClass(type().getName() + "Adapter").getConstructor().newInstance();
        }
    }
}
