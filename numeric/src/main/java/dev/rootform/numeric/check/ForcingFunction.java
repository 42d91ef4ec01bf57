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

    /**
     * The forcing as a function of t; every exact number is rounded to double once, here, not at
     * each evaluation (the integrator calls the function a dozen times per step).
     */
    public static DoubleUnaryOperator of(List<ForcingTerm> terms) {
        int size = terms.size();
        double[] coefficient = new double[size];
        double[] rate = new double[size];
        double[] omega = new double[size];
        int[] power = new int[size];
        ForcingTerm.Oscillation[] oscillation = new ForcingTerm.Oscillation[size];
        for (int i = 0; i < size; i++) {
            ForcingTerm term = terms.get(i);
            coefficient[i] = term.coefficient().doubleValue();
            rate[i] = term.exponential().doubleValue();
            omega[i] = term.frequency().doubleValue() * (term.frequencyTimesPi() ? Math.PI : 1);
            power[i] = term.power();
            oscillation[i] = term.oscillation();
        }
        return t -> {
            double sum = 0;
            for (int i = 0; i < size; i++) {
                double wave = switch (oscillation[i]) {
                    case NONE -> 1;
                    case COS -> Math.cos(omega[i] * t);
                    case SIN -> Math.sin(omega[i] * t);
                };
                sum += coefficient[i] * Math.pow(t, power[i]) * Math.exp(rate[i] * t) * wave;
            }
            return sum;
        };
    }
}
