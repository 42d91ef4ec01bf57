package dev.rootform.numeric.plot;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Samples a frequency response H for a magnitude and phase plot: {@value #SAMPLES} frequencies,
 * logarithmically spaced from the smallest to the largest of its frequency scales times
 * 1/{@value #DECADES} .. {@value #DECADES} (continuous time, ω in rad per unit of t), or
 * θ_k = kπ/{@value #SAMPLES}, k = 1..{@value #SAMPLES} (discrete time, rad per sample); the phase
 * unwrapped along the sweep.
 * Frequencies where H is 0 or infinite (a zero or pole on the axis or circle) are left out.
 * Approximate (double precision), for drawing only.
 *
 * @since 0.3
 */
public final class FrequencySampling {
    /** Points of a sweep. */
    public static final int SAMPLES = 300;
    /** A continuous sweep spans this factor below and above its frequency scales. */
    private static final double DECADES = 20;

    private FrequencySampling() {
    }

    /** H at one frequency of the sweep. */
    @FunctionalInterface
    public interface Response {
        /**
         * @param w the frequency
         * @param multipleOfPi w/π exactly, for the discrete sweep's θ_k = kπ/{@value #SAMPLES}; empty
         *     in continuous time
         * @return H as {re, im}; a non-finite or zero value leaves the frequency out
         */
        double[] at(double w, Optional<Rational> multipleOfPi);
    }

    /**
     * @param discrete true for θ in rad per sample over (0, π], false for ω on a log axis
     * @param scales the frequencies that matter (natural frequencies |λ|, input frequencies); zeros
     *     and an empty list give a sweep around 1
     * @param inputs the input frequencies to mark
     * @param response H at a frequency
     */
    public static FrequencyPlot sample(boolean discrete, List<Double> scales, List<Double> inputs, Response response) {
        double smallest = scales.stream().filter(w -> w > 1e-12).mapToDouble(Double::doubleValue).min().orElse(1);
        double largest = scales.stream().mapToDouble(Double::doubleValue).max().orElse(1);
        double low = smallest / DECADES;
        double high = Math.max(largest, smallest) * DECADES;
        List<Sample> magnitude = new ArrayList<>();
        List<Sample> phase = new ArrayList<>();
        double previous = Double.NaN;
        double turns = 0;
        for (int i = 0; i < SAMPLES; i++) {
            Optional<Rational> q = discrete ? Optional.of(Rational.of(i + 1, SAMPLES)) : Optional.empty();
            double w = discrete ? Math.PI * (i + 1) / SAMPLES : low * Math.pow(high / low, i / (double) (SAMPLES - 1));
            double[] h = response.at(w, q);
            double size = Math.hypot(h[0], h[1]);
            if (!(size > 0) || Double.isInfinite(size)) {
                continue;
            }
            magnitude.add(new Sample(w, 20 * Math.log10(size)));
            double degrees = Math.toDegrees(Math.atan2(h[1], h[0]));
            if (!Double.isNaN(previous)) {
                double jump = degrees + turns - previous;
                turns -= 360 * Math.round(jump / 360);
            }
            previous = degrees + turns;
            phase.add(new Sample(w, previous));
        }
        return new FrequencyPlot(discrete, magnitude, phase, inputs);
    }
}
