package dev.rootform.symbolic.testing;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Problem;
import java.util.Objects;
import java.util.Set;

/**
 * One random problem, both as the model the solver takes and as the text a user would type.
 *
 * @param problem the equation and its conditions
 * @param text the same problem in ordinary notation, e.g. {@code 2y'' - 3y' + y = 0; y(0) = 1; y'(0) = 0}
 * @param characteristic the product of the chosen monic factors; the equation's coefficients are this times a random rational scale
 * @param cases the root kinds that went into χ
 * @param label a short description that names the seed and the case number, for failure messages
 */
public record GeneratedProblem(Problem problem, String text, RationalPolynomial characteristic, Set<RootCase> cases,
        String label) {
    public GeneratedProblem {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(characteristic, "characteristic");
        cases = Set.copyOf(cases);
        Objects.requireNonNull(label, "label");
    }

    /** The order k of the equation. */
    public int order() {
        return problem.equation().order();
    }
}
