package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.closedform.ExactRoot;
import java.util.List;

/**
 * The exact roots of monic irreducible factors as solve presents them: rational and quadratic
 * roots as a + b√r (± i·ω), roots of unity by their angle, roots of other factors implicitly by
 * index.
 *
 * @since 0.3
 */
public final class ExactRoots {
    private ExactRoots() {
    }

    /** The roots of each factor, in factor order, each with its factor's multiplicity. */
    public static List<ExactRoot> of(List<Factor> factors) {
        return ClosedFormBuilder.roots(factors);
    }
}
