package dev.rootform.numeric.check;

import dev.rootform.symbolic.model.ForcingTerm;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * The right-hand side of a differential equation as a double-precision function of t:
 * Σ c·t^p·e^{rate·t}·(1, cos ωt or sin ωt), ω times π where the term says so. Approximate; used
 * only by the numeric cross-check.
 *
 * @since 0.1
 */
public final class ForcingFunction {
    private ForcingFunction() {
    }

    /** The terms' rationals are converted to doubles once; the integrator calls the function many times. */
    public static DoubleUnaryOperator of(List<ForcingTerm> terms) {
        int k = terms.size();
        double[] coefficient = new double[k];
        int[] power = new int[k];
        double[] rate = new double[k];
        double[] frequency = new double[k];
        ForcingTerm.Oscillation[] oscillation = new ForcingTerm.Oscillation[k];
        for (int i = 0; i < k; i++) {
            ForcingTerm term = terms.get(i);
            coefficient[i] = term.coefficient().doubleValue();
            power[i] = term.power();
            rate[i] = term.exponential().doubleValue();
            frequency[i] = term.frequency().doubleValue() * (term.frequencyTimesPi() ? Math.PI : 1);
            oscillation[i] = term.oscillation();
        }
        return t -> {
            double sum = 0;
            for (int i = 0; i < k; i++) {
                double wave = switch (oscillation[i]) {
                    case NONE -> 1;
                    case COS -> Math.cos(frequency[i] * t);
                    case SIN -> Math.sin(frequency[i] * t);
                };
                sum += coefficient[i] * Math.pow(t, power[i]) * Math.exp(rate[i] * t) * wave;
            }
            return sum;
        };
    }
}
