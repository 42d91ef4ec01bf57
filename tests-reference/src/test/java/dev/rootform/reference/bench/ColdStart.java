package dev.rootform.reference.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Wall time of whole {@code ./rootform solve} processes, as a user starts them. */
final class ColdStart {
    private final Path launcher;

    ColdStart(Path launcher) {
        this.launcher = launcher;
    }

    /** Runs the command once untimed (it may build and make its class-data archive), then {@code runs} timed times. */
    Timings measure(int runs, String... args) throws IOException, InterruptedException {
        run(args);
        Timings timings = new Timings();
        for (int i = 0; i < runs; i++) {
            timings.add(time(args));
        }
        return timings;
    }

    /** Wall time of one process, in nanoseconds. */
    long time(String... args) throws IOException, InterruptedException {
        long start = System.nanoTime();
        run(args);
        return System.nanoTime() - start;
    }

    private void run(String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(launcher.toString()));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(10, TimeUnit.MINUTES) || p.exitValue() != 0) {
            p.destroyForcibly();
            throw new IllegalStateException("rootform did not answer with exit code 0: " + command);
        }
    }
}
