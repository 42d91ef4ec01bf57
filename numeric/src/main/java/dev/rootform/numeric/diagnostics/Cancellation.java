package dev.rootform.numeric.diagnostics;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;

/**
 * Estimates how many digits a double-precision evaluation of the closed form loses to cancellation
 * at sample points: log10 of (largest term magnitude / |value|), where the terms are
 * c_i(α)·u^i·e^{αu} (continuous, u = t − t0) or c_i(α)·n^i·α^n (discrete) over all roots α. This
 * is the usual a-priori bound for a floating-point sum (common practice): the rounding error of a
 * sum is about the unit roundoff times the largest term. Terms are sized in logarithms, so no
 * overflow at large n.
 */
final class Cancellation {
    /** Warn when more than this many decimal digits would be lost (a ratio above 10^8). */
    static final double WARN_DIGITS = 8;
    /** Decimal digits carried by an IEEE double. */
    static final int DOUBLE_DIGITS = 16;

    private Cancellation() {
    }

    /** A warning for the worst sample point, when it loses more than {@link #WARN_DIGITS} digits. */
    static Optional<String> warning(ExactSolution s, List<FactorRoot> roots, List<SampleValue> samples) {
        double worst = 0;
        SampleValue where = null;
        for (SampleValue p : samples) {
            if (p.value().signum() == 0) {
                continue;
            }
            double lost = largestTerm(s, roots, p.at()) - FactorRoot.log10(p.value());
            if (lost > worst) {
                worst = lost;
                where = p;
            }
        }
        if (where == null || worst <= WARN_DIGITS) {
            return Optional.empty();
        }
        String variable = s.domain() == Domain.DIFFERENCE ? "n" : "t";
        return Optional.of(String.format("severe cancellation: at %s = %s the largest term is about 10^%.0f times the value, "
                + "so evaluating the formula in double precision loses about %d of its %d digits; evaluate it in higher "
                + "precision or use --values-at", variable, where.at(), worst, Math.min(DOUBLE_DIGITS, Math.round(worst)), DOUBLE_DIGITS));
    }

    /** log10 of the largest |term| at the point. */
    private static double largestTerm(ExactSolution s, List<FactorRoot> roots, Rational at) {
        boolean discrete = s.domain() == Domain.DIFFERENCE;
        double x = discrete ? at.doubleValue() : at.subtract(s.origin()).doubleValue();
        double logX = Math.log10(Math.abs(x));
        double largest = Double.NEGATIVE_INFINITY;
        for (Component c : s.components()) {
            for (FactorRoot r : roots) {
                if (!r.factor().equals(c.factor())) {
                    continue;
                }
                double growth = discrete ? x * r.log10Modulus() : r.re() * x / Math.log(10);
                for (int i = 0; i < c.coefficients().size(); i++) {
                    double size = log10Modulus(c.coefficients().get(i), r.re(), r.im());
                    double power = i == 0 ? 0 : i * logX;
                    largest = Math.max(largest, size + power + growth);
                }
            }
        }
        return largest;
    }

    /** log10 |p(re + i·im)| by Horner's rule in double complex arithmetic. */
    private static double log10Modulus(RationalPolynomial p, double re, double im) {
        double a = 0;
        double b = 0;
        for (int j = p.degree(); j >= 0; j--) {
            double na = a * re - b * im + p.coefficient(j).doubleValue();
            b = a * im + b * re;
            a = na;
        }
        return Math.log10(Math.hypot(a, b));
    }
}
