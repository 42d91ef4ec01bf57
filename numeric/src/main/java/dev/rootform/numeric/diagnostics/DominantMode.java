package dev.rootform.numeric.diagnostics;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Finds the dominant mode and the {@link Growth} of a solution from the modes it contains: for a
 * fitted solution the roots whose coefficients are nonzero, each with its effective power (one more
 * than the highest power of t or n with a nonzero coefficient); for a general solution all roots
 * with their multiplicities. Roots whose Re λ (or |λ|) agree to within {@link #tieTolerance} of
 * the larger are treated as tied, and the higher power wins.
 */
final class DominantMode {
    private final Domain domain;
    private final String variable;
    private final double tolerance;

    /** @param digits significant digits of the root values, which bound how finely ties are told apart */
    DominantMode(Domain domain, String variable, int digits) {
        this.domain = domain;
        this.variable = variable;
        this.tolerance = tieTolerance(digits);
    }

    /** Relative tolerance for ties: two digits looser than the root values, at most double precision. */
    static double tieTolerance(int digits) {
        return Math.pow(10, -(Math.min(digits, 15) - 2));
    }

    /** @param powers effective multiplicity per factor; factors absent or 0 contribute nothing */
    Growth of(List<FactorRoot> roots, Map<RationalPolynomial, Integer> powers) {
        FactorRoot best = null;
        int bestPower = 0;
        for (FactorRoot r : roots) {
            int m = powers.getOrDefault(r.factor().polynomial(), 0);
            if (m == 0) {
                continue;
            }
            if (best == null || beats(rate(r), m, r.im(), rate(best), bestPower)) {
                best = r;
                bestPower = m;
            }
        }
        if (best == null) {
            return new Growth(Optional.empty(), 0, 0, "0 (the solution is identically zero)");
        }
        double rate = rate(best);
        return new Growth(Optional.of(best.approximation()), bestPower - 1, rate, theta(bestPower - 1, rate));
    }

    /**
     * {@code modes}, or the growth of a term of {@code terms} that outgrows every mode of the
     * characteristic roots, with no root named: a forcing that grows faster than the modes
     * (x[n+1] = x[n]/2 + 3^n grows as 3^n) or a stable system's constant input (y' + y = 1 tends to
     * 1, Θ(1), not Θ(e^(-t))). Conjugate sums are left to the modes (their factors are characteristic).
     */
    Growth withTerms(Growth modes, List<Term> terms) {
        if (modes.root().isEmpty()) {
            return modes;
        }
        double bestRate = modes.rate();
        int bestPower = modes.power() + 1;
        boolean outgrown = false;
        for (Term t : terms) {
            if (t.vanishes() || t instanceof Term.ConjugateSum) {
                continue;
            }
            double rate = t instanceof Term.Exponential e ? rate(e.rate()) : rate(((Term.Oscillating) t).growth());
            if (beats(rate, t.power() + 1, 0, bestRate, bestPower)) {
                bestRate = rate;
                bestPower = t.power() + 1;
                outgrown = true;
            }
        }
        return outgrown ? new Growth(Optional.empty(), bestPower - 1, bestRate, theta(bestPower - 1, bestRate)) : modes;
    }

    /** Re λ of a real exponential rate or of the growth of an oscillation (continuous), |λ| (discrete). */
    private double rate(Surd rateOrGrowth) {
        double v = rateOrGrowth.doubleValue();
        return domain == Domain.DIFFERENTIAL ? v : Math.abs(v);
    }

    private double rate(FactorRoot r) {
        return domain == Domain.DIFFERENTIAL ? r.re() : r.modulus();
    }

    private boolean beats(double rate, int power, double im, double bestRate, int bestPower) {
        double scale = Math.max(1, Math.max(Math.abs(rate), Math.abs(bestRate)));
        if (Math.abs(rate - bestRate) <= tolerance * scale) {
            return power > bestPower || (power == bestPower && im > 0);
        }
        return rate > bestRate;
    }

    private String theta(int power, double rate) {
        String polynomial = power == 0 ? "" : power == 1 ? variable : variable + "^" + power;
        String exponential;
        if (domain == Domain.DIFFERENTIAL) {
            String sigma = ShortDecimal.text(rate);
            exponential = Math.abs(rate) <= tolerance ? "" : "e^(" + (sigma.equals("1") ? "" : sigma.equals("-1") ? "-" : sigma) + variable + ")";
        } else {
            exponential = Math.abs(rate - 1) <= tolerance ? "" : ShortDecimal.text(rate) + "^" + variable;
        }
        String body = polynomial.isEmpty() ? exponential : exponential.isEmpty() ? polynomial : polynomial + "·" + exponential;
        return "Θ(" + (body.isEmpty() ? "1" : body) + ")";
    }
}
