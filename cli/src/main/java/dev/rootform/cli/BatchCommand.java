package dev.rootform.cli;

import dev.rootform.api.batch.BatchAnswer;
import dev.rootform.api.batch.BatchRequest;
import dev.rootform.symbolic.model.InputException;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rootform batch}: one JSON request per line in, one JSON answer per line out, in the order
 * the answers complete. This class only wires files and threads; each line is read and answered by
 * {@link BatchRequest}.
 */
@Command(name = "batch", description = "Answer one JSON request per line of IN (see README \"Batch\"), one JSON answer per line.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class BatchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "IN", description = "JSON Lines file of requests.")
    Path input;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT",
            description = "Append the answers to OUT, flushed line by line (default: standard output).")
    Path output;

    @Option(names = "--jobs", paramLabel = "N", description = "Worker threads (default: available processors).")
    int jobs = Runtime.getRuntime().availableProcessors();

    @Option(names = "--resume", description = "Keep OUT and skip the ids already answered in it.")
    boolean resume;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Time limit of a line that sets no timeLimit (default ${DEFAULT-VALUE}).")
    int timeLimit = (int) BatchRequest.DEFAULT_TIME_LIMIT.toSeconds();

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        String bad = badArguments();
        if (bad != null) {
            err.println("rootform: " + bad);
            return ExitCode.BAD_INPUT;
        }
        try (AnswerLog log = output == null ? AnswerLog.to(spec.commandLine().getOut()) : AnswerLog.open(output, resume)) {
            BatchTally tally = new BatchTally();
            try (BatchProgress progress = BatchProgress.on(err, requestLines(), tally)) {
                run(log, tally, progress);
            }
            err.println(tally.summary());
            return ExitCode.VERIFIED;
        } catch (IOException | UncheckedIOException e) {
            err.println("rootform: batch stopped: " + e.getMessage());
            return ExitCode.INTERNAL;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            err.println("rootform: batch interrupted");
            return ExitCode.INTERNAL;
        }
    }

    /** One line naming what is wrong with the command line, or null. */
    private String badArguments() {
        if (!Files.isRegularFile(input) || !Files.isReadable(input)) {
            return "cannot read " + input;
        }
        if (jobs < 1) {
            return "--jobs " + jobs + " must be at least 1";
        }
        if (timeLimit < 1) {
            return "--time-limit " + timeLimit + " must be at least 1 second";
        }
        if (resume && output == null) {
            return "--resume needs -o OUT";
        }
        if (output != null && output.toAbsolutePath().normalize().equals(input.toAbsolutePath().normalize())) {
            return "OUT must not be IN";
        }
        if (output != null) {
            try {
                // the log is appended line by line, not replaced; the target is checked as every output file is
                OutputFiles.check(List.of(new OutputFiles.Target("-o", output)));
            } catch (InputException e) {
                return e.getMessage();
            }
        }
        return null;
    }

    /** Reads IN and answers each line not answered before on {@code jobs} threads, at most 2·jobs lines read ahead. */
    private void run(AnswerLog log, BatchTally tally, BatchProgress progress) throws IOException, InterruptedException {
        Duration limit = Duration.ofSeconds(timeLimit);
        ExecutorService workers = Executors.newFixedThreadPool(jobs);
        Semaphore room = new Semaphore(2 * jobs);
        AtomicReference<IOException> failure = new AtomicReference<>();
        try (BufferedReader reader = lines()) {
            long number = 0;
            for (String line = reader.readLine(); line != null && failure.get() == null; line = reader.readLine()) {
                number++;
                if (line.isBlank()) {
                    continue;
                }
                BatchRequest request = BatchRequest.parse(line, number);
                if (log.answered().contains(request.id())) {
                    tally.skip();
                    progress.step();
                    continue;
                }
                room.acquire();
                workers.execute(() -> {
                    try {
                        if (failure.get() == null) {
                            BatchAnswer answer = request.answer(limit);
                            log.write(answer.json());
                            tally.add(answer.status());
                            progress.step();
                        }
                    } catch (IOException e) {
                        failure.compareAndSet(null, e);
                    } finally {
                        room.release();
                    }
                });
            }
        } finally {
            workers.shutdown();
            workers.awaitTermination(Long.MAX_VALUE, TimeUnit.DAYS);
        }
        if (failure.get() != null) {
            throw failure.get();
        }
    }

    /** The number of non-blank lines of IN. */
    private long requestLines() throws IOException {
        try (BufferedReader reader = lines()) {
            return reader.lines().filter(l -> !l.isBlank()).count();
        }
    }

    /** IN as UTF-8 text; bytes that are not UTF-8 become U+FFFD, so such a line is refused, not the batch. */
    private BufferedReader lines() throws IOException {
        return new BufferedReader(new InputStreamReader(Files.newInputStream(input), StandardCharsets.UTF_8));
    }
}
