package dev.rootform.numeric.roots;

import java.math.BigDecimal;
import java.util.Objects;

/**
 * The closed disk {z : |z − (re + i·im)| ≤ radius} of the complex plane, claimed to contain exactly
 * one root of a polynomial. All three numbers are exact decimals; the claim itself is what
 * {@link RootFinder} certifies.
 *
 * @param re real part of the centre
 * @param im imaginary part of the centre; exactly zero when the enclosed root is proven real
 * @param radius radius of the disk, non-negative (zero only when the centre is the root)
 * @since 0.1
 */
public record Enclosure(BigDecimal re, BigDecimal im, BigDecimal radius) {

    /** @throws IllegalArgumentException if {@code radius} is negative */
    public Enclosure {
        Objects.requireNonNull(re, "re");
        Objects.requireNonNull(im, "im");
        Objects.requireNonNull(radius, "radius");
        if (radius.signum() < 0) {
            throw new IllegalArgumentException("negative radius " + radius);
        }
    }

    /** Whether the centre lies on the real axis, which {@link RootFinder} uses to mark proven real roots. */
    public boolean isReal() {
        return im.signum() == 0;
    }

    /** Whether x + i·y lies in the closed disk; decided exactly. */
    public boolean contains(BigDecimal x, BigDecimal y) {
        BigDecimal dx = x.subtract(re);
        BigDecimal dy = y.subtract(im);
        return dx.multiply(dx).add(dy.multiply(dy)).compareTo(radius.multiply(radius)) <= 0;
    }
}
