package dev.rootform.numeric.plot;

import java.util.List;
import java.util.Objects;

/**
 * The solution sampled over a range chosen from its own time scales, ready to draw.
 *
 * @param stems true for a sequence (one stem per index), false for a function of t
 * @param logScale true when the solution grows: the samples are then |value| (zeros left out)
 *     and the value axis is logarithmic
 * @param solution the whole solution
 * @param transientPart the homogeneous part of a forced solution, empty when not split
 * @param steadyPart the particular part of a forced solution, empty when not split
 * @param marks the solution at the requested points (--values-at) that lie in the range
 * @param range why this range: e.g. {@code "5 slowest time constants (τ = 2)"}
 * @since 0.3
 */
public record TimePlot(boolean stems, boolean logScale, List<Sample> solution, List<Sample> transientPart,
        List<Sample> steadyPart, List<Sample> marks, String range) {
    public TimePlot {
        solution = List.copyOf(solution);
        transientPart = List.copyOf(transientPart);
        steadyPart = List.copyOf(steadyPart);
        marks = List.copyOf(marks);
        Objects.requireNonNull(range, "range");
    }

    /** True when the transient and steady parts are given separately. */
    public boolean split() {
        return !transientPart.isEmpty() && !steadyPart.isEmpty();
    }
}
