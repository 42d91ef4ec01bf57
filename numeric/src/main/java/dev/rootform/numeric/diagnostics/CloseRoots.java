package dev.rootform.numeric.diagnostics;

import java.util.List;
import java.util.Optional;

/**
 * Warns about nearly repeated roots: two distinct roots closer than {@link #RELATIVE_DISTANCE}
 * times the larger modulus. The fitted constants then grow like the inverse of the distance and
 * cancel in the sum (common practice), so the formula is sensitive even though it is exact.
 */
final class CloseRoots {
    /** Relative distance below which two distinct roots count as nearly repeated. */
    static final double RELATIVE_DISTANCE = 1e-6;

    private CloseRoots() {
    }

    static Optional<String> warning(List<FactorRoot> roots) {
        int pairs = 0;
        double closest = Double.POSITIVE_INFINITY;
        FactorRoot first = null;
        for (int i = 0; i < roots.size(); i++) {
            for (int j = i + 1; j < roots.size(); j++) {
                FactorRoot a = roots.get(i);
                FactorRoot b = roots.get(j);
                double scale = Math.max(a.modulus(), b.modulus());
                double distance = Math.hypot(a.re() - b.re(), a.im() - b.im()) / scale;
                if (scale > 0 && distance < RELATIVE_DISTANCE) {
                    pairs++;
                    if (distance < closest) {
                        closest = distance;
                        first = a;
                    }
                }
            }
        }
        if (first == null) {
            return Optional.empty();
        }
        return Optional.of(String.format("nearly repeated roots: %d pair%s of distinct roots closer than %.0e relative "
                + "(closest %.1e, near λ ≈ %s%s); the fitted constants are then large and cancel",
                pairs, pairs == 1 ? "" : "s", RELATIVE_DISTANCE, closest, ShortDecimal.text(first.re()),
                first.im() == 0 ? "" : (first.im() < 0 ? " - " : " + ") + ShortDecimal.text(Math.abs(first.im())) + "i"));
    }
}
