package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Reduces k conditions given at any points to the {@link InitialState} at one origin, exactly.
 *
 * <p>On the solution space of an operator with characteristic polynomial χ, L^a acts as
 * (λ^a mod χ)(L), so a condition x[origin + a] = v (difference) or y^(d)(t0) = v (differential)
 * is the rational linear equation Σ_j [λ^a mod χ]_j·v_j = v in the initial values. The k×k system is
 * solved by exact elimination; λ^a mod χ is computed by binary powering, O(k² log a).
 *
 * <p>The origin is min(0, lowest condition index) for difference equations. A differential
 * equation's conditions must all be at one point t0, which becomes the origin.
 *
 * @since 0.1
 */
public final class ConditionFitter {
    private ConditionFitter() {
    }

    /**
     * @throws InputException if the number of conditions is not the order, the conditions are at
     *     several points of a differential equation, or they are inconsistent or do not determine
     *     the solution
     */
    public static InitialState fit(LinearEquation equation, List<Condition> conditions) {
        int k = equation.order();
        if (conditions.size() != k) {
            throw new InputException(conditions.size() + " condition" + (conditions.size() == 1 ? "" : "s")
                    + " given, but an equation of order " + k + " needs exactly " + k, "", -1);
        }
        Rational origin = origin(equation.domain(), conditions);
        List<List<Rational>> rows = rows(equation, conditions, origin);
        List<Rational> rhs = conditions.stream().map(Condition::value).toList();
        LinearSystem.Result result = LinearSystem.solve(rows, rhs);
        if (!result.consistent()) {
            throw new InputException("the conditions are inconsistent: no solution satisfies all of them", "", -1);
        }
        if (!result.unique()) {
            throw new InputException("the conditions do not determine the solution: only " + result.rank()
                    + " of the " + k + " are independent", "", -1);
        }
        return new InitialState(origin, result.solution());
    }

    /**
     * The k×k matrix A of the fitting system A·v = (condition values), which maps the initial state
     * v at the origin to the conditions: row i holds the coefficients of λ^{a_i} mod χ. Exact.
     *
     * @throws InputException if the conditions are at several points of a differential equation or
     *     at a non-integer index of a sequence
     */
    public static List<List<Rational>> matrix(LinearEquation equation, List<Condition> conditions) {
        return rows(equation, conditions, origin(equation.domain(), conditions));
    }

    /**
     * The condition number κ_∞(A) = ‖A‖_∞·‖A⁻¹‖_∞ of the fitting {@link #matrix}, exactly: relative
     * errors in the condition values (measured in the max norm) can be amplified by up to this factor
     * in the initial state, and so in the fitted constants. 1 when the conditions are the initial
     * values themselves; empty when the conditions do not determine the solution.
     */
    public static Optional<Rational> conditionNumber(LinearEquation equation, List<Condition> conditions) {
        List<List<Rational>> a = matrix(equation, conditions);
        return LinearSystem.inverse(a).map(inverse -> maxRowSum(a).multiply(maxRowSum(inverse)));
    }

    private static Rational maxRowSum(List<List<Rational>> m) {
        Rational max = Rational.ZERO;
        for (List<Rational> row : m) {
            Rational sum = row.stream().map(Rational::abs).reduce(Rational.ZERO, Rational::add);
            max = sum.compareTo(max) > 0 ? sum : max;
        }
        return max;
    }

    private static List<List<Rational>> rows(LinearEquation equation, List<Condition> conditions, Rational origin) {
        int k = equation.order();
        RationalPolynomial chi = equation.characteristicPolynomial();
        List<List<Rational>> rows = new ArrayList<>();
        for (Condition c : conditions) {
            long power = equation.domain() == Domain.DIFFERENCE
                    ? c.at().subtract(origin).toBigInteger().longValueExact()
                    : c.derivative();
            RationalPolynomial reduced = powerModulo(power, chi);
            List<Rational> row = new ArrayList<>(k);
            for (int j = 0; j < k; j++) {
                row.add(reduced.coefficient(j));
            }
            rows.add(row);
        }
        return rows;
    }

    private static Rational origin(Domain domain, List<Condition> conditions) {
        if (domain == Domain.DIFFERENCE) {
            Rational lowest = Rational.ZERO;
            for (Condition c : conditions) {
                if (!c.at().isInteger()) {
                    throw new InputException("condition index " + c.at() + " must be an integer", "", -1);
                }
                lowest = c.at().compareTo(lowest) < 0 ? c.at() : lowest;
            }
            return lowest;
        }
        Rational point = conditions.get(0).at();
        for (Condition c : conditions) {
            if (!c.at().equals(point)) {
                throw new InputException("conditions at several points (" + point + " and " + c.at()
                        + ") make a boundary-value problem, which is not supported yet; give all at one point", "", -1);
            }
        }
        return point;
    }

    /** λ^power mod χ by binary powering. */
    static RationalPolynomial powerModulo(long power, RationalPolynomial chi) {
        RationalPolynomial result = RationalPolynomial.ONE.mod(chi);
        RationalPolynomial base = RationalPolynomial.X.mod(chi);
        long e = power;
        while (e > 0) {
            if ((e & 1) == 1) {
                result = result.multiply(base).mod(chi);
            }
            e >>= 1;
            if (e > 0) {
                base = base.multiply(base).mod(chi);
            }
        }
        return result;
    }
}
