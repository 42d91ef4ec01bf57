package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.util.List;

/**
 * An exact check that the solved initial-value problem is the inverse transform of Y = H·U: the
 * solution's first m values (derivatives at 0+ in s, samples in z) equal the coefficients of Y's
 * expansion (at infinity in s, in powers of z^-1 in z), computed from Y alone, where m is the degree
 * of the operator μ that annihilates the solution. Both the solution and the inverse transform of
 * Y's modes part satisfy μ(L) y = 0 (the poles of Y are among μ's roots), so m equal values prove
 * them equal (uniqueness for linear constant-coefficient equations, common practice); the check is
 * a proof, not a sample.
 *
 * @since 0.3
 */
public final class TransformCheck {
    private static final String NAME = "inverse transform of Y = H·U";

    private TransformCheck() {
    }

    /** The check of {@code solution}, the exact solution of {@code plan.problem()}. */
    public static Check of(ResponsePlan plan, ExactSolution solution) {
        boolean continuous = plan.transfer().domain() == Domain.DIFFERENTIAL;
        int count = Math.max(plan.problem().equation().order(), solution.operator().degree());
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
                : "y[n] for n < " + count + " equal the coefficients of Y in powers of z^-1")
                + ", exactly; as many as the degree of the operator that annihilates both, so they are equal");
    }
}
