package dev.rootform.reference.bench;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** Durations of repeated runs, in nanoseconds, with order statistics. Not thread-safe. */
final class Timings {
    private final List<Long> nanos = new ArrayList<>();

    void add(long duration) {
        nanos.add(duration);
    }

    int count() {
        return nanos.size();
    }

    /** The q-quantile (nearest rank), in milliseconds. */
    double quantileMillis(double q) {
        List<Long> sorted = new ArrayList<>(nanos);
        Collections.sort(sorted);
        int rank = (int) Math.ceil(q * sorted.size());
        return sorted.get(Math.max(0, rank - 1)) / 1e6;
    }

    double medianMillis() {
        return quantileMillis(0.5);
    }
}
