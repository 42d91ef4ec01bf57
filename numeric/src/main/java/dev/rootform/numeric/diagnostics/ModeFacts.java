package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.diagnostics.Mode.Quantity;
import dev.rootform.symbolic.model.Domain;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * The time scales of each mode, approximate, by common engineering practice. Continuous, λ = σ + iω:
 * time constant τ = −1/σ (σ &lt; 0); natural frequency ω_n = |λ| and damping ratio ζ = −σ/|λ| for a
 * complex pair or a repeated real root (a critically damped section has ζ = 1); damped frequency
 * |ω| and period 2π/|ω| for a complex pair. Discrete: modulus |λ|, change per step
 * 20·log10|λ| dB, period 2π/|arg λ| samples when arg λ ≠ 0, and the steps to halve (|λ| &lt; 1)
 * or double (|λ| &gt; 1), ln 2/|ln |λ||. The root λ = 0 of a recurrence is not a mode.
 */
final class ModeFacts {
    private static final MathContext MC = FactorRoot.PRECISION;
    private static final BigDecimal TWO_PI = new BigDecimal("6.283185307179586476925286766559");
    private static final double LN2 = Math.log(2);
    private static final double LN10 = Math.log(10);
    private static final double DECIBELS_PER_DECADE = 20;

    private ModeFacts() {
    }

    /** One mode per real root and per conjugate pair, in root order. */
    static List<Mode> of(Domain domain, List<FactorRoot> roots) {
        List<Mode> modes = new ArrayList<>();
        for (FactorRoot r : roots) {
            if (r.approximation().im().signum() < 0 || (domain == Domain.DIFFERENCE && r.exactModulus().signum() == 0)) {
                continue;
            }
            List<Quantity> q = domain == Domain.DIFFERENTIAL ? continuous(r) : discrete(r);
            modes.add(new Mode(r.approximation(), r.multiplicity(), q));
        }
        return modes;
    }

    /** Computed in decimals, so that roots of any size (|λ| beyond the double range) give finite quantities. */
    private static List<Quantity> continuous(FactorRoot r) {
        List<Quantity> q = new ArrayList<>();
        BigDecimal sigma = r.approximation().re();
        BigDecimal omega = r.approximation().im().abs();
        BigDecimal natural = r.exactModulus();
        if (sigma.signum() < 0) {
            q.add(quantity("timeConstant", "τ", BigDecimal.ONE.divide(sigma.negate(), MC)));
        }
        if (natural.signum() > 0 && (omega.signum() > 0 || r.multiplicity() > 1)) {
            q.add(quantity("naturalFrequency", "ω_n", natural));
            q.add(quantity("dampingRatio", "ζ", sigma.negate().divide(natural, MC)));
        }
        if (omega.signum() > 0) {
            q.add(quantity("dampedFrequency", "ω_d", omega));
            q.add(quantity("period", "period", TWO_PI.divide(omega, MC)));
        }
        return q;
    }

    private static List<Quantity> discrete(FactorRoot r) {
        List<Quantity> q = new ArrayList<>();
        BigDecimal rho = r.exactModulus();
        double log10Rho = r.log10Modulus();
        double angle = angle(r);
        q.add(quantity("modulus", "|λ|", rho));
        q.add(quantity("decibelsPerStep", "dB/step", DECIBELS_PER_DECADE * log10Rho));
        if (angle > 0) {
            q.add(quantity("periodSamples", "period (samples)", TWO_PI.doubleValue() / angle));
        }
        if (rho.compareTo(BigDecimal.ONE) < 0) {
            q.add(quantity("halvingSteps", "steps to halve", LN2 / -(log10Rho * LN10)));
        } else if (rho.compareTo(BigDecimal.ONE) > 0) {
            q.add(quantity("doublingSteps", "steps to double", LN2 / (log10Rho * LN10)));
        }
        return q;
    }

    /** |arg λ|, from re and im scaled together into the double range. */
    private static double angle(FactorRoot r) {
        BigDecimal re = r.approximation().re();
        BigDecimal im = r.approximation().im();
        BigDecimal largest = re.abs().max(im.abs());
        if (largest.signum() == 0) {
            return 0;
        }
        int shift = largest.precision() - largest.scale();
        return Math.abs(Math.atan2(im.movePointLeft(shift).doubleValue(), re.movePointLeft(shift).doubleValue()));
    }

    private static Quantity quantity(String key, String symbol, BigDecimal value) {
        return new Quantity(key, symbol, value.round(MC));
    }

    private static Quantity quantity(String key, String symbol, double value) {
        return new Quantity(key, symbol, new BigDecimal(value, MC));
    }
}
