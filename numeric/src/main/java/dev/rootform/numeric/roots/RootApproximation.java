package dev.rootform.numeric.roots;

import dev.rootform.symbolic.closedform.ExactRoot;
import java.math.BigDecimal;
import java.util.Objects;

/**
 * A root's exact description with its numeric value: the true root lies within {@code radius} of
 * re + i·im (radius 0 when the decimals are the exact root rounded to the requested digits from
 * an exact form, in which case the rounding error is below one unit in the last digit).
 *
 * @since 0.1
 */
public record RootApproximation(ExactRoot root, BigDecimal re, BigDecimal im, BigDecimal radius) {
    public RootApproximation {
        Objects.requireNonNull(root, "root");
        Objects.requireNonNull(re, "re");
        Objects.requireNonNull(im, "im");
        Objects.requireNonNull(radius, "radius");
    }
}
