package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.transfer.RationalFunction;
import java.util.List;

/**
 * An exact check that the solved initial-value problem is the inverse transform of Y = H·U: its
 * first {@link #EXTRA} values beyond the initial ones (derivatives at 0+ in s, samples in z)
 * equal the coefficients of Y's expansion (at infinity in s, in powers of z^-1 in z), computed
 * from Y alone.
 *
 * @since 0.3
 */
public final class TransformCheck {
    /** Values compared beyond those the initial conditions fix. */
    static final int EXTRA = 12;
    private static final String NAME = "inverse transform of Y = H·U";

    private TransformCheck() {
    }

    /** The check of {@code solution}, the exact solution of {@code plan.problem()}. */
    public static Check of(ResponsePlan plan, ExactSolution solution) {
        boolean continuous = plan.transfer().domain() == Domain.DIFFERENTIAL;
        int count = plan.problem().equation().order() + EXTRA;
        RationalFunction y = plan.output();
        List<Rational> expected = continuous ? y.strictlyProperPart().seriesAtInfinity(count)
                : y.reciprocalArgument().seriesAtZero(count);
        for (int i = 0; i < count; i++) {
            Rational actual = continuous ? solution.derivativeAtOrigin(i) : solution.valueAt(i);
            if (!actual.equals(expected.get(i))) {
                String at = continuous ? "y^(" + i + ")(0+)" : "y[" + i + "]";
                return new Check(NAME, false, at + " is " + actual + " but Y's expansion gives " + expected.get(i));
            }
        }
        return new Check(NAME, true, (continuous ? "y^(i)(0+) for i < " + count + " equal the coefficients of Y at infinity"
                : "y[n] for n < " + count + " equal the coefficients of Y in powers of z^-1") + ", exactly");
    }
}
