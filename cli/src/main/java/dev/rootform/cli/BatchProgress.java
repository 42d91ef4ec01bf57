package dev.rootform.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;

/**
 * Progress of a batch on standard error: a progress bar when standard error is a terminal, else a
 * plain line now and then. Thread-safe.
 */
sealed interface BatchProgress extends AutoCloseable permits BatchProgress.Bar, BatchProgress.Lines {
    /** How often the plain lines come. */
    Duration LINE_INTERVAL = Duration.ofSeconds(10);

    /** One more line done (answered or skipped). */
    void step();

    @Override
    void close();

    /** A bar on the terminal, or plain lines to {@code err} every {@link #LINE_INTERVAL}. */
    static BatchProgress on(PrintWriter err, long total, BatchTally tally) {
        return stderrIsTerminal() ? new Bar(total, tally) : new Lines(err, total, tally, LINE_INTERVAL);
    }

    /** Whether file descriptor 2 is a terminal (Linux: its link names a tty device); false when unknown. */
    private static boolean stderrIsTerminal() {
        try {
            String target = Files.readSymbolicLink(Path.of("/proc/self/fd/2")).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            return false;
        }
    }

    /** The progress bar of the progressbar library, with the counts as its message. */
    final class Bar implements BatchProgress {
        private final ProgressBar bar;
        private final BatchTally tally;

        Bar(long total, BatchTally tally) {
            this.tally = tally;
            this.bar = new ProgressBarBuilder().setTaskName("batch").setInitialMax(total).showSpeed()
                    .setConsumer(new ConsoleProgressBarConsumer(System.err)).build();
        }

        @Override
        public void step() {
            bar.step();
            bar.setExtraMessage(" " + tally.counts());
        }

        @Override
        public void close() {
            bar.close();
        }
    }

    /** A line such as {@code batch: 1200/5000 lines (24 %), 183.0 per second; 1190 solved, ...} every interval. */
    final class Lines implements BatchProgress {
        private final ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "rootform-batch-progress");
            t.setDaemon(true);
            return t;
        });

        Lines(PrintWriter err, long total, BatchTally tally, Duration interval) {
            timer.scheduleAtFixedRate(() -> {
                err.println(String.format(Locale.ROOT, "batch: %d/%d lines (%d %%), %.1f per second; %s", tally.done(), total,
                        total == 0 ? 100 : 100L * tally.done() / total, tally.rate(), tally.counts()));
                err.flush();
            }, interval.toMillis(), interval.toMillis(), TimeUnit.MILLISECONDS);
        }

        @Override
        public void step() {
            // the timer reads the tally
        }

        @Override
        public void close() {
            timer.shutdownNow();
        }
    }
}
