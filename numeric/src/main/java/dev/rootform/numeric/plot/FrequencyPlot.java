package dev.rootform.numeric.plot;

import java.util.List;

/**
 * The frequency response H of the equation, sampled for a magnitude and phase plot: H(iω) =
 * 1/χ(iω) for a differential equation (ω in rad per unit of t, logarithmically spaced), and
 * H(e^{iθ}) = e^{-iθs}/χ(e^{iθ}) for a difference equation (θ in rad per sample, 0 &lt; θ &le; π).
 *
 * @param discrete true for a difference equation
 * @param magnitudeDb 20·log10|H| against frequency
 * @param phaseDegrees arg H in degrees, unwrapped (continuous along the sweep)
 * @param inputs the frequencies of the sinusoidal inputs, to mark
 * @since 0.3
 */
public record FrequencyPlot(boolean discrete, List<Sample> magnitudeDb, List<Sample> phaseDegrees, List<Double> inputs) {
    public FrequencyPlot {
        magnitudeDb = List.copyOf(magnitudeDb);
        phaseDegrees = List.copyOf(phaseDegrees);
        inputs = List.copyOf(inputs);
    }
}
