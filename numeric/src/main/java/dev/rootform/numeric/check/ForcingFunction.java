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

    public static DoubleUnaryOperator of(List<ForcingTerm> terms) {
        return t -> {
            double sum = 0;
            for (ForcingTerm term : terms) {
                double w = term.frequency().doubleValue() * (term.frequencyTimesPi() ? Math.PI : 1);
                double oscillation = switch (term.oscillation()) {
                    case NONE -> 1;
                    case COS -> Math.cos(w * t);
                    case SIN -> Math.sin(w * t);
                };
                sum += term.coefficient().doubleValue() * Math.pow(t, term.power())
                        * Math.exp(term.exponential().doubleValue() * t) * oscillation;
            }
            return sum;
        };
    }
}
