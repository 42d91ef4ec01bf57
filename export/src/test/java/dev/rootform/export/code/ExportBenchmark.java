package dev.rootform.export.code;

import dev.rootform.export.Corpus;
import dev.rootform.export.Report;
import java.lang.reflect.Method;
import java.math.BigInteger;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.tools.ToolProvider;

/**
 * Benchmark (a plain main, not a test): the generated Fibonacci evaluator value(10^6) against naive
 * double iteration to 10^6, and the exact term(10^6). Command in README "Performance".
 */
public final class ExportBenchmark {
    private static final long N = 1_000_000;

    private ExportBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("rootform-bench");
        Report r = Corpus.codeReport(Corpus.SEQUENCES.get(0));
        Files.writeString(dir.resolve("Fib.java"), JavaRenderer.render(r, "", "Fib"));
        if (ToolProvider.getSystemJavaCompiler().run(null, null, null, "-d", dir.toString(), dir.resolve("Fib.java").toString()) != 0) {
            throw new IllegalStateException("javac failed");
        }
        try (URLClassLoader loader = new URLClassLoader(new java.net.URL[] {dir.toUri().toURL()})) {
            Class<?> fib = loader.loadClass("Fib");
            Method value = fib.getMethod("value", long.class);
            Method term = fib.getMethod("term", long.class);
            double sink = 0;
            for (int i = 0; i < 20_000; i++) {
                sink += (double) value.invoke(null, N - (i & 7)) + naive(1000 + (i & 7));
            }
            int reps = 200_000;
            long t0 = System.nanoTime();
            for (int i = 0; i < reps; i++) {
                sink += (double) value.invoke(null, N - (i & 7));
            }
            double closedNs = (System.nanoTime() - t0) / (double) reps;
            int naiveReps = 200;
            t0 = System.nanoTime();
            for (int i = 0; i < naiveReps; i++) {
                sink += naive(N - (i & 7));
            }
            double naiveNs = (System.nanoTime() - t0) / (double) naiveReps;
            System.out.printf("value(10^6): %.1f ns; naive double iteration to 10^6: %.0f ns; ratio %.0fx%n", closedNs, naiveNs, naiveNs / closedNs);
            term.invoke(null, 100_000L);
            t0 = System.nanoTime();
            BigInteger big = (BigInteger) term.invoke(null, N);
            System.out.printf("term(10^6): %.1f ms (%d decimal digits)%n", (System.nanoTime() - t0) / 1e6, big.toString().length());
            System.out.println(sink == 42 ? "" : "(checksum kept)");
        }
    }

    /** x[n] by iterating x[k+2] = x[k+1] + x[k] in doubles from x[0] = 0, x[1] = 1. */
    private static double naive(long n) {
        double a = 0;
        double b = 1;
        for (long k = 0; k < n; k++) {
            double c = a + b;
            a = b;
            b = c;
        }
        return a;
    }
}
