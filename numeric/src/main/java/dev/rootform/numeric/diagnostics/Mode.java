package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import java.util.List;
import java.util.Objects;

/**
 * One mode of the equation — a real root or a conjugate pair (given by its root with Im λ &gt; 0) —
 * with the time scales an engineer reads off it.
 *
 * @param root the root
 * @param multiplicity its multiplicity in χ
 * @param quantities the applicable quantities, e.g. time constant and damping ratio
 * @since 0.2
 */
public record Mode(RootApproximation root, int multiplicity, List<Quantity> quantities) {
    public Mode {
        Objects.requireNonNull(root, "root");
        quantities = List.copyOf(quantities);
    }

    /**
     * A named approximate quantity of a mode (double precision, from the certified root value).
     *
     * @param key machine name, e.g. {@code "dampingRatio"}
     * @param symbol name for people, e.g. {@code "ζ"}
     * @param value the value
     */
    public record Quantity(String key, String symbol, double value) {
        public Quantity {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(symbol, "symbol");
        }
    }
}
