package dev.rootform.numeric.plot;

import java.util.Objects;
import java.util.Optional;

/**
 * The data of a report's plots, computed by the numeric layer from the exact solution (renderers
 * only draw it). The roots in the complex plane need no extra data: they are the analysis' roots.
 *
 * @param time the solution against t or n; empty for a general solution (free constants)
 * @param frequency magnitude and phase against frequency; present for an asymptotically stable
 *     equation driven by a sinusoidal input
 * @since 0.3
 */
public record Plots(Optional<TimePlot> time, Optional<FrequencyPlot> frequency) {
    public Plots {
        Objects.requireNonNull(time, "time");
        Objects.requireNonNull(frequency, "frequency");
    }
}
