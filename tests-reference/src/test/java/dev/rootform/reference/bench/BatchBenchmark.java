package dev.rootform.reference.bench;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.batch.BatchAnswer;
import dev.rootform.api.batch.BatchRequest;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

/**
 * Batch throughput: problems per second on two worker threads for the random corpus
 * ({@link RandomProblems}, orders 1-12, forced and unforced; with and without values at two
 * points), answered through {@link BatchRequest} in this JVM after a warm-up, and by the whole
 * {@code ./rootform batch --jobs 2} process (JVM start and warm-up included). Besides the wall-clock
 * rate it reports the process's CPU time per problem, which does not depend on what else runs on a
 * shared machine. Not part of the test run; command in README "Batch".
 */
public final class BatchBenchmark {
    private static final long SEED = 1_500L;
    private static final int PROBLEMS = Integer.getInteger("bench.batch", 3000);
    private static final int WARM_UP = 400;
    private static final int JOBS = 2;
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();

    private BatchBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        System.out.printf("rootform batch benchmark — Java %s, %d CPUs, load average %.1f%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), OS.getSystemLoadAverage());
        answer(corpus(SEED - 1, WARM_UP, true));
        List<String> withValues = corpus(SEED, PROBLEMS, true);
        measure("problem and values at two points", withValues);
        measure("problem only", corpus(SEED, PROBLEMS, false));
        Path dir = Files.createTempDirectory("rootform-batch-bench");
        Path in = dir.resolve("corpus.jsonl");
        Files.write(in, withValues, StandardCharsets.UTF_8);
        command(Path.of(args.length > 0 ? args[0] : "../rootform"), in, dir.resolve("answers.jsonl"));
    }

    /**
     * Wall-clock rate, and the CPU time of this process per problem (all threads: workers, JIT, GC),
     * whose inverse times two is the rate two otherwise idle cores sustain.
     */
    private static void measure(String what, List<String> lines) throws Exception {
        long cpu = OS.getProcessCpuTime();
        long start = System.nanoTime();
        Map<BatchAnswer.Status, Integer> counts = answer(lines);
        double seconds = (System.nanoTime() - start) / 1e9;
        double cpuPerProblem = (OS.getProcessCpuTime() - cpu) / 1e9 / lines.size();
        System.out.printf("in process, %d threads, %s, %d problems (seed %d, after %d warm-up): %.1f s wall, %.0f problems/s; "
                + "CPU %.1f ms per problem, so %.0f problems/s on %d idle cores; load average %.1f; %s%n", JOBS, what, lines.size(),
                SEED, WARM_UP, seconds, lines.size() / seconds, cpuPerProblem * 1e3, JOBS / cpuPerProblem, JOBS,
                OS.getSystemLoadAverage(), counts);
    }

    /** One solve request per generated problem, with or without values at two indices or two times. */
    private static List<String> corpus(long seed, int size, boolean values) {
        RandomProblems problems = new RandomProblems(seed, Forcing.MIXED);
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            GeneratedProblem g = problems.next(12);
            ObjectNode request = MAPPER.createObjectNode().put("id", "p" + i).put("problem", g.text()).put("digits", 20);
            boolean sequence = g.problem().equation().domain() == Domain.DIFFERENCE;
            if (values) {
                request.putArray("valuesAt").add(sequence ? "16" : "1/2").add(sequence ? "30" : "3/2");
            }
            lines.add(request.toString());
        }
        return lines;
    }

    private static Map<BatchAnswer.Status, Integer> answer(List<String> lines) throws Exception {
        ExecutorService workers = Executors.newFixedThreadPool(JOBS);
        try {
            List<Future<BatchAnswer>> answers = new ArrayList<>();
            for (int i = 0; i < lines.size(); i++) {
                BatchRequest request = BatchRequest.parse(lines.get(i), i + 1);
                answers.add(workers.submit(() -> request.answer(BatchRequest.DEFAULT_TIME_LIMIT)));
            }
            Map<BatchAnswer.Status, Integer> counts = new EnumMap<>(BatchAnswer.Status.class);
            for (Future<BatchAnswer> a : answers) {
                counts.merge(a.get().status(), 1, Integer::sum);
            }
            return counts;
        } finally {
            workers.shutdown();
            workers.awaitTermination(1, TimeUnit.MINUTES);
        }
    }

    /** Wall time of {@code ./rootform batch IN -o OUT --jobs 2} as one process. */
    private static void command(Path launcher, Path in, Path out) throws IOException, InterruptedException {
        List<String> command = List.of(launcher.toString(), "batch", in.toString(), "-o", out.toString(), "--jobs", String.valueOf(JOBS));
        new ProcessBuilder(launcher.toString(), "--version").redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.DISCARD).start().waitFor();
        long start = System.nanoTime();
        Process p = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.PIPE).start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(30, TimeUnit.MINUTES) || p.exitValue() != 0) {
            throw new IllegalStateException("rootform batch failed: " + err);
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        long lines;
        try (var answers = Files.lines(out)) {
            lines = answers.count();
        }
        System.out.printf("whole command, ./rootform batch --jobs %d (JVM start and warm-up included): %d answers in %.1f s, %.0f problems/s%n",
                JOBS, lines, seconds, lines / seconds);
        err.lines().filter(l -> l.startsWith("batch: ") && l.contains("answered")).forEach(System.out::println);
    }
}
