package dev.rootform.numeric.analysis;

import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.diagnostics.Mode;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Solution;
import java.util.ArrayList;
import java.util.List;

/**
 * The range over which a solution is plotted, chosen from its own time scales (common practice):
 * a growing solution over {@value #GROWTH_TIMES} growth times (1/σ, or the doubling steps of a
 * sequence), drawn on a log axis; otherwise the longer of {@value #TIME_CONSTANTS} slowest time
 * constants (a decay to below 1 %; for sequences {@value #HALVINGS} halvings) and
 * {@value #PERIODS} periods of the slowest oscillation (mode or input). The range starts at the
 * first condition or the origin, and covers the conditions and requested points that are not far
 * beyond it.
 *
 * @param from first t or n
 * @param to last t or n
 * @param log true when the solution grows exponentially
 * @param reason the rule that chose the length, in words
 */
record TimeRange(double from, double to, boolean log, String reason) {
    static final int GROWTH_TIMES = 6;
    static final int TIME_CONSTANTS = 5;
    static final int HALVINGS = 7;
    static final int PERIODS = 3;
    /** A requested point further than this many lengths beyond the range is not pulled in. */
    private static final int REACH = 4;
    private static final int MIN_STEPS = 12;
    private static final int MAX_STEPS = 120;

    static TimeRange of(Solution s, Diagnostics d, List<Rational> points) {
        LinearEquation eq = s.problem().equation();
        boolean differential = eq.domain() == Domain.DIFFERENTIAL;
        double rate = d.growth().rate();
        boolean grows = differential ? rate > 1e-9 : rate > 1 + 1e-9;
        double length;
        String reason;
        if (grows) {
            double time = differential ? 1 / rate : Math.log(2) / Math.log(rate);
            length = GROWTH_TIMES * time;
            reason = GROWTH_TIMES + (differential ? " growth times (1/σ = " : " doubling times (")
                    + text(time) + (differential ? ")" : " steps)");
        } else {
            double slowestDecay = 0;
            double slowestPeriod = 0;
            for (Mode m : d.modes()) {
                double re = m.root().re().doubleValue();
                double im = Math.abs(m.root().im().doubleValue());
                double decay = differential ? (re < 0 ? -1 / re : 0) : halving(Math.hypot(re, im));
                slowestDecay = Math.max(slowestDecay, decay);
                double angle = differential ? im : Math.atan2(im, re);
                slowestPeriod = Math.max(slowestPeriod, angle > 1e-12 ? 2 * Math.PI / angle : 0);
            }
            for (ForcingTerm t : eq.forcing()) {
                if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                    double w = FrequencyResponse.angularFrequency(t, 20).doubleValue();
                    slowestPeriod = Math.max(slowestPeriod, w > 1e-12 ? 2 * Math.PI / w : 0);
                }
            }
            int decays = differential ? TIME_CONSTANTS : HALVINGS;
            if (slowestDecay == 0 && slowestPeriod == 0) {
                length = differential ? 10 : 20;
                reason = "no decay or oscillation to scale by";
            } else if (decays * slowestDecay >= PERIODS * slowestPeriod) {
                length = decays * slowestDecay;
                reason = differential ? decays + " slowest time constants (τ = " + text(slowestDecay) + ")"
                        : decays + " halvings of the slowest mode (" + text(slowestDecay) + " steps each)";
            } else {
                length = PERIODS * slowestPeriod;
                reason = PERIODS + " periods of the slowest oscillation (period " + text(slowestPeriod)
                        + (differential ? ")" : " samples)");
            }
        }
        if (!differential) {
            length = Math.max(MIN_STEPS, Math.min(MAX_STEPS, Math.ceil(length)));
        }
        List<Double> anchors = new ArrayList<>();
        anchors.add(s.closedForm().origin().doubleValue());
        for (Condition c : s.problem().conditions()) {
            anchors.add(BoundaryValues.point(c, 20).doubleValue());
        }
        double from = anchors.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
        double to = Math.max(from + length, anchors.stream().mapToDouble(Double::doubleValue).max().orElseThrow());
        double reach = to + REACH * length;
        for (Rational p : points) {
            double x = p.doubleValue();
            if (x <= reach && x >= from - REACH * length) {
                from = Math.min(from, x);
                to = Math.max(to, x);
            }
        }
        return new TimeRange(from, to, grows, reason);
    }

    /** x to 4 significant digits, e.g. {@code 2.5}. */
    private static String text(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /** Steps for a sequence mode of modulus rho to halve; 0 when it does not decay. */
    private static double halving(double rho) {
        return rho > 0 && rho < 1 ? Math.log(2) / -Math.log(rho) : 0;
    }
}
