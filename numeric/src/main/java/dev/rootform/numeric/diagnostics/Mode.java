package dev.rootform.numeric.diagnostics;

import dev.rootform.numeric.roots.RootApproximation;
import java.math.BigDecimal;
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
     * A named approximate quantity of a mode (16 significant digits, the precision of a double,
     * from the certified root value; any size, also beyond the double range).
     *
     * @param key machine name, e.g. {@code "dampingRatio"}
     * @param symbol name for people, e.g. {@code "ζ"}
     * @param value the value
     */
    public record Quantity(String key, String symbol, BigDecimal value) {
        public Quantity {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(symbol, "symbol");
            Objects.requireNonNull(value, "value");
        }
    }
}
