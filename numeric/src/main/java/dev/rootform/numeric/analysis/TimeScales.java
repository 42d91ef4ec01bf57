package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.List;
import java.util.TreeSet;

/**
 * The time scales of a differential equation's solution, approximate (double precision): 1/|Re λ|
 * and 1/|Im λ| of every root λ of χ, and 1/|rate| and 1/ω of every forcing term, ascending and
 * distinct; and the fastest rate R = the largest |λ|, |rate + iω|, which bounds the step of an
 * explicit integrator. A problem without any (polynomial solutions) has the one scale 1 and R = 0.
 *
 * @param scales ascending, at least one
 * @param fastest R
 */
record TimeScales(List<Double> scales, double fastest) {
    TimeScales {
        scales = List.copyOf(scales);
    }

    static TimeScales of(LinearEquation eq, List<RootApproximation> roots) {
        return ofRoots(eq, roots.stream().map(r -> new double[] {r.re().doubleValue(), r.im().doubleValue()}).toList());
    }

    /** From the roots given as {re, im} pairs, and the forcing. */
    static TimeScales ofRoots(LinearEquation eq, List<double[]> roots) {
        TreeSet<Double> scales = new TreeSet<>();
        double fastest = 0;
        for (double[] r : roots) {
            double re = r[0];
            double im = r[1];
            add(scales, re);
            add(scales, im);
            fastest = Math.max(fastest, Math.hypot(re, im));
        }
        for (ForcingTerm t : eq.forcing()) {
            double rate = t.exponential().doubleValue();
            double omega = t.frequency().doubleValue() * (t.frequencyTimesPi() ? Math.PI : 1);
            add(scales, rate);
            add(scales, omega);
            fastest = Math.max(fastest, Math.hypot(rate, omega));
        }
        return new TimeScales(scales.isEmpty() ? List.of(1.0) : List.copyOf(scales), fastest);
    }

    /** The shortest, the longest and (when they are more than 100 apart) their geometric mean. */
    List<Double> representative() {
        double shortest = scales.get(0);
        double longest = scales.get(scales.size() - 1);
        if (longest > 100 * shortest) {
            return List.of(shortest, Math.sqrt(shortest * longest), longest);
        }
        return longest > shortest ? List.of(shortest, longest) : List.of(shortest);
    }

    private static void add(TreeSet<Double> scales, double rate) {
        double scale = 1 / Math.abs(rate);
        if (rate != 0 && Double.isFinite(rate) && Double.isFinite(scale) && scale > 0) {
            scales.add(scale);
        }
    }
}
