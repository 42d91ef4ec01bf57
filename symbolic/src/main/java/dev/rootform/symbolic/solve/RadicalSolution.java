package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.algebra.Rational;
import java.util.Objects;

/**
 * The solution x = rational + √r·radical of an equation whose forcing takes values in the real
 * quadratic field Q(√r) (e.g. cos(πn/4)): both parts are exact rational-valued solutions, the
 * first with the given conditions and the rational part of the forcing, the second with zero
 * conditions and the √r part.
 *
 * @since 0.1
 */
public record RadicalSolution(int radicand, ExactSolution rational, ExactSolution radical) {
    public RadicalSolution {
        Objects.requireNonNull(rational, "rational");
        Objects.requireNonNull(radical, "radical");
        if (radicand < 2) {
            throw new IllegalArgumentException("radicand (" + radicand + ") must be >= 2");
        }
    }

    /** The exact value x[n] = a + b·√r. */
    public Surd valueAt(long n) {
        return Surd.of(rational.valueAt(n), radical.valueAt(n), Rational.of(radicand));
    }
}
