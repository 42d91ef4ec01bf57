package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.LongFunction;

/**
 * Certified roots per factor, and the mode sums built from them per solution and working
 * precision, for the duration of one analysis: a root request at some precision reuses enclosures
 * already certified at that precision or a higher one (a tighter disk is still a valid enclosure);
 * a mode sum is built once per solution and precision (values, samples and the integrator check
 * evaluate the same sums). Not thread-safe; one instance per analysis.
 */
final class RootCache {
    private final Map<RationalPolynomial, List<Enclosure>> roots = new HashMap<>();
    private final Map<RationalPolynomial, Integer> precision = new HashMap<>();
    private final Map<Object, Map<Long, ModeSum>> sums = new IdentityHashMap<>();

    /** Enclosures of the roots of the squarefree f, each to at least {@code digits} significant digits. */
    List<Enclosure> roots(RationalPolynomial f, int digits) {
        if (precision.getOrDefault(f, 0) < digits) {
            roots.put(f, new RootFinder(digits).roots(f));
            precision.put(f, digits);
        }
        return roots.get(f);
    }

    /** The mode sum of {@code solution} (compared by identity) at {@code working} digits, built once. */
    ModeSum modeSum(Object solution, long working, LongFunction<ModeSum> build) {
        Map<Long, ModeSum> bySolution = sums.computeIfAbsent(solution, s -> new HashMap<>());
        ModeSum sum = bySolution.get(working);
        if (sum == null) {
            sum = build.apply(working);
            bySolution.put(working, sum);
        }
        return sum;
    }
}
