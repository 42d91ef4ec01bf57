package dev.rootform.symbolic.statespace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.matrix.MatrixText;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.matrix.Resolvent;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The entries assembled from fundamental solutions against the solver's own answer for each entry. */
class TransitionMatrixTest {
    private static TransitionMatrix of(RationalMatrix a, Domain domain) {
        RationalPolynomial mu = Resolvent.of(a).minimalPolynomial();
        List<Solution> f = new StateEquations(StateModel.of(domain, a, null, null, null), mu).fundamentals().stream()
                .map(Solver::solve).toList();
        return TransitionMatrix.of(a, mu, f);
    }

    @Test
    void entriesEqualTheSolversAnswerForEachEntryProblem() {
        long seed = 5;
        Random random = new Random(seed);
        for (int trial = 0; trial < 12; trial++) {
            Domain domain = trial % 2 == 0 ? Domain.DIFFERENTIAL : Domain.DIFFERENCE;
            int n = 2 + random.nextInt(3);
            long[][] e = new long[n][n];
            for (long[] row : e) {
                for (int j = 0; j < n; j++) {
                    row[j] = random.nextInt(5) - 2;
                }
            }
            RationalMatrix a = RationalMatrix.ofIntegers(e);
            RationalPolynomial mu = Resolvent.of(a).minimalPolynomial();
            TransitionMatrix t = of(a, domain);
            assertTrue(t.checks().stream().allMatch(Check::passed), "seed " + seed + " trial " + trial + ": " + t.checks());
            StateEquations eq = new StateEquations(StateModel.of(domain, a, null, null, null), mu);
            Problem template = eq.fundamentals().get(0);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    List<Condition> conditions = new ArrayList<>();
                    for (int k = 0; k < mu.degree(); k++) {
                        Condition c = template.conditions().get(k);
                        conditions.add(new Condition(c.derivative(), c.at(), a.power(k).get(i, j)));
                    }
                    Solution direct = Solver.solve(new Problem(template.equation(), conditions));
                    assertEquals(direct.closedForm(), t.entries().get(i).get(j), "seed " + seed + " trial " + trial + " entry " + i + "," + j);
                }
            }
        }
    }

    @Test
    void basisSolutionsGiveTheSameMatrixWithOnlyTheSubstitutionCheck() {
        for (Domain domain : Domain.values()) {
            // a Jordan block beside a rotation: a defective A with complex eigenvalues
            RationalMatrix a = MatrixText.matrix("A", "[[2,1,0,0],[0,2,0,0],[0,0,0,-3],[0,0,3,0]]");
            RationalPolynomial mu = Resolvent.of(a).minimalPolynomial();
            List<Problem> problems = new StateEquations(StateModel.of(domain, a, null, null, null), mu).fundamentals();
            List<Solution> basis = problems.stream().map(Solver::solveBasis).toList();
            for (Solution s : basis) {
                assertEquals(List.of("satisfies the equation"), s.checks().stream().map(Check::name).toList(), domain.toString());
                assertTrue(s.verified(), s.checks().toString());
            }
            TransitionMatrix fast = TransitionMatrix.of(a, mu, basis);
            assertTrue(fast.checks().stream().allMatch(Check::passed), fast.checks().toString());
            assertEquals(of(a, domain).entries(), fast.entries(), domain.toString());
        }
    }

    @Test
    void theMatrixCheckCatchesABasisSolutionWithWrongInitialValues() {
        // the proof of e^(At) and A^n rests on X(0) = I and the step X -> AX, not on the basis' own
        // conditions: a basis solution fitted to a wrong condition must make it fail
        for (Domain domain : Domain.values()) {
            RationalMatrix a = MatrixText.matrix("A", "[[0,1,0],[0,0,1],[-6,-11,-6]]");
            RationalPolynomial mu = Resolvent.of(a).minimalPolynomial();
            List<Problem> problems = new StateEquations(StateModel.of(domain, a, null, null, null), mu).fundamentals();
            List<Solution> basis = new ArrayList<>(problems.stream().map(Solver::solveBasis).toList());
            Problem p = problems.get(1);
            List<Condition> wrong = new ArrayList<>(p.conditions());
            Condition last = wrong.get(wrong.size() - 1);
            wrong.set(wrong.size() - 1, new Condition(last.derivative(), last.at(), last.value().add(dev.rootform.symbolic.algebra.Rational.ONE)));
            basis.set(1, Solver.solveBasis(new Problem(p.equation(), wrong)));
            TransitionMatrix t = TransitionMatrix.of(a, mu, basis);
            assertTrue(t.checks().stream().anyMatch(c -> !c.passed()), domain + ": " + t.checks());
        }
    }

    @Test
    void fibonacciMatrixPowersAreFibonacciNumbers() {
        // [[1,1],[1,0]]^n = [[F(n+1), F(n)], [F(n), F(n−1)]] (OEIS A000045)
        TransitionMatrix t = of(MatrixText.matrix("A", "[[1,1],[1,0]]"), Domain.DIFFERENCE);
        long[] fib = {0, 1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144, 233, 377, 610, 987};
        for (int n = 1; n < 15; n++) {
            assertEquals(dev.rootform.symbolic.algebra.Rational.of(fib[n + 1]), t.exact().get(0).get(0).valueAt(n));
            assertEquals(dev.rootform.symbolic.algebra.Rational.of(fib[n]), t.exact().get(0).get(1).valueAt(n));
            assertEquals(dev.rootform.symbolic.algebra.Rational.of(fib[n - 1]), t.exact().get(1).get(1).valueAt(n));
        }
    }
}
