package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.HashMap;
import java.util.Map;
import java.util.List;

/**
 * Certified roots per factor for the duration of one analysis: a request at some precision reuses
 * enclosures already certified at that precision or a higher one (a tighter disk is still a valid
 * enclosure). Not thread-safe; one instance per analysis.
 */
final class RootCache {
    private final Map<RationalPolynomial, List<Enclosure>> roots = new HashMap<>();
    private final Map<RationalPolynomial, Integer> precision = new HashMap<>();

    /** Enclosures of the roots of the squarefree f, each to at least {@code digits} significant digits. */
    List<Enclosure> roots(RationalPolynomial f, int digits) {
        if (precision.getOrDefault(f, 0) < digits) {
            roots.put(f, new RootFinder(digits).roots(f));
            precision.put(f, digits);
        }
        return roots.get(f);
    }
}
