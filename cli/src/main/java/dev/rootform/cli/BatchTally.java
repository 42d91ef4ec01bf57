package dev.rootform.cli;

import dev.rootform.api.batch.BatchAnswer;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicInteger;

/** Running counts of a batch: solved, refused, failed, and lines skipped as answered before. Thread-safe. */
final class BatchTally {
    private final AtomicInteger solved = new AtomicInteger();
    private final AtomicInteger refused = new AtomicInteger();
    private final AtomicInteger failed = new AtomicInteger();
    private final AtomicInteger skipped = new AtomicInteger();
    private final long start = System.nanoTime();

    void add(BatchAnswer.Status status) {
        (status == BatchAnswer.Status.SOLVED ? solved : status == BatchAnswer.Status.REFUSED ? refused : failed).incrementAndGet();
    }

    void skip() {
        skipped.incrementAndGet();
    }

    /** Lines answered in this run. */
    int answered() {
        return solved.get() + refused.get() + failed.get();
    }

    /** Lines answered or skipped. */
    int done() {
        return answered() + skipped.get();
    }

    double seconds() {
        return (System.nanoTime() - start) / 1e9;
    }

    /** Answers per second of wall time so far. */
    double rate() {
        return answered() / Math.max(seconds(), 1e-3);
    }

    /** The counts in words, e.g. {@code 7 solved, 2 refused, 1 failed}. */
    String counts() {
        return String.format(Locale.ROOT, "%d solved, %d refused, %d failed", solved.get(), refused.get(), failed.get());
    }

    /** The closing line: lines, time, rate, counts and what was skipped. */
    String summary() {
        return String.format(Locale.ROOT, "batch: %d lines answered in %.1f s (%.1f per second): %s; %d skipped (answered before)",
                answered(), seconds(), rate(), counts(), skipped.get());
    }
}
