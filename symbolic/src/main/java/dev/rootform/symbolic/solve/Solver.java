package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The exact pipeline: χ → irreducible factors → exact constants from the conditions → verified
 * closed form. Stateless.
 *
 * @since 0.1
 */
public final class Solver {
    private Solver() {
    }

    /**
     * Solves a homogeneous problem exactly: the fitted solution when conditions are given, else the
     * general solution with free constants C1..Ck.
     *
     * @throws InputException if the equation is forced (not supported yet) or the conditions are
     *     wrong in number, inconsistent or do not determine the solution
     */
    public static Solution solve(Problem problem) {
        LinearEquation eq = problem.equation();
        if (!eq.isHomogeneous()) {
            throw new InputException("equations with a forcing term (right-hand side) are not supported yet", "", -1);
        }
        RationalPolynomial chi = eq.characteristicPolynomial();
        List<Factor> factors = JasFactorizer.factor(chi);
        ClosedForm general = Presenter.general(eq, factors);
        if (problem.conditions().isEmpty()) {
            return new Solution(problem, chi, factors, Presenter.roots(factors), general, general,
                    Optional.empty(), List.of(basisCheck(eq, factors)));
        }
        InitialState state = ConditionFitter.fit(eq, problem.conditions());
        ExactSolution exact = ExactSolver.solve(eq, factors, state);
        List<Check> checks = ExactVerifier.verify(exact, state, problem.conditions());
        return new Solution(problem, chi, factors, Presenter.roots(factors), Presenter.fitted(exact), general,
                Optional.of(exact), checks);
    }

    /** Every basis function v^i·α^j·(e^{αv} or α^v) of every factor is annihilated, in Q(α). */
    private static Check basisCheck(LinearEquation eq, List<Factor> factors) {
        for (Factor f : factors) {
            if (eq.domain() == Domain.DIFFERENCE && f.polynomial().equals(RationalPolynomial.X)) {
                continue;
            }
            NumberField k = new NumberField(f.polynomial());
            for (int i = 0; i < f.multiplicity(); i++) {
                for (int j = 0; j < f.degree(); j++) {
                    List<RationalPolynomial> c = new ArrayList<>();
                    for (int l = 0; l < f.multiplicity(); l++) {
                        c.add(l == i ? k.pow(k.generator(), j) : RationalPolynomial.ZERO);
                    }
                    if (!ExactVerifier.annihilates(eq, new Component(f, c))) {
                        return new Check("satisfies the equation", false, "basis function of " + f.polynomial() + " fails");
                    }
                }
            }
        }
        return new Check("satisfies the equation", true, "every basis function, by exact substitution in Q(α)");
    }
}
