package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.diagnostics.Mode.Quantity;
import dev.rootform.symbolic.model.Domain;
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
    private static final double TWO_PI = 2 * Math.PI;
    private static final double LN2 = Math.log(2);
    private static final double DECIBELS_PER_DECADE = 20;

    private ModeFacts() {
    }

    /** One mode per real root and per conjugate pair, in root order. */
    static List<Mode> of(Domain domain, List<FactorRoot> roots) {
        List<Mode> modes = new ArrayList<>();
        for (FactorRoot r : roots) {
            if (r.im() < 0 || (domain == Domain.DIFFERENCE && r.modulus() == 0)) {
                continue;
            }
            List<Quantity> q = domain == Domain.DIFFERENTIAL ? continuous(r) : discrete(r);
            modes.add(new Mode(r.approximation(), r.multiplicity(), q));
        }
        return modes;
    }

    private static List<Quantity> continuous(FactorRoot r) {
        List<Quantity> q = new ArrayList<>();
        double sigma = r.re();
        double omega = Math.abs(r.im());
        double natural = r.modulus();
        if (sigma < 0) {
            q.add(new Quantity("timeConstant", "τ", -1 / sigma));
        }
        if (natural > 0 && (omega > 0 || r.multiplicity() > 1)) {
            q.add(new Quantity("naturalFrequency", "ω_n", natural));
            q.add(new Quantity("dampingRatio", "ζ", -sigma / natural));
        }
        if (omega > 0) {
            q.add(new Quantity("dampedFrequency", "ω_d", omega));
            q.add(new Quantity("period", "period", TWO_PI / omega));
        }
        return q;
    }

    private static List<Quantity> discrete(FactorRoot r) {
        List<Quantity> q = new ArrayList<>();
        double rho = r.modulus();
        double angle = Math.abs(Math.atan2(r.im(), r.re()));
        q.add(new Quantity("modulus", "|λ|", rho));
        q.add(new Quantity("decibelsPerStep", "dB/step", DECIBELS_PER_DECADE * Math.log10(rho)));
        if (angle > 0) {
            q.add(new Quantity("periodSamples", "period (samples)", TWO_PI / angle));
        }
        if (rho < 1) {
            q.add(new Quantity("halvingSteps", "steps to halve", LN2 / -Math.log(rho)));
        } else if (rho > 1) {
            q.add(new Quantity("doublingSteps", "steps to double", LN2 / Math.log(rho)));
        }
        return q;
    }
}
