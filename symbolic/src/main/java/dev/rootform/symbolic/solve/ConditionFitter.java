package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Reduces k conditions given at any points to the {@link InitialState} at one origin, exactly.
 *
 * <p>The solution lies in the kernel of an operator M with characteristic polynomial μ (μ = χ for
 * a homogeneous equation; μ = χ·A with A the forcing's annihilator otherwise), where L^a acts as
 * (λ^a mod μ)(L). So a condition x[origin + a] = v (difference) or y^(d)(t0) = v (differential)
 * is the rational linear equation Σ_j [λ^a mod μ]_j·w_j = v in the K = deg μ initial values w. A
 * forced equation adds deg A equations (L y)^(j) = g^(j) at the origin: L y - g lies in the kernel
 * of A, so agreeing there makes L y = g everywhere. The K×K system is solved by exact elimination;
 * λ^a mod μ is computed by binary powering, O(K² log a).
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
     * @param operator μ, a multiple of the characteristic polynomial that annihilates the forcing
     * @param part which part of a forcing with values in Q(√r) the solution answers
     * @throws InputException if the number of conditions is not the order, the conditions are at
     *     several points of a differential equation, or they are inconsistent or do not determine
     *     the solution
     */
    static InitialState fit(LinearEquation equation, RationalPolynomial operator, List<Condition> conditions,
            ForcingPart part) {
        int k = equation.order();
        validate(equation, conditions);
        Rational origin = origin(equation.domain(), conditions);
        List<List<Rational>> rows = new ArrayList<>(rows(equation, conditions, origin, operator));
        List<Rational> rhs = new ArrayList<>(conditions.stream().map(Condition::value).toList());
        for (int j = 0; j < operator.degree() - k; j++) {
            Deadline.checkCurrent();
            RationalPolynomial applied = RationalPolynomial.ZERO;
            for (int i = 0; i <= k; i++) {
                applied = applied.add(powerModulo(i + j, operator).multiply(equation.coefficients().get(i)));
            }
            rows.add(row(applied, operator.degree()));
            rhs.add(equation.domain() == Domain.DIFFERENCE
                    ? ForcingValues.at(equation, origin.toBigInteger().longValueExact() + j, part)
                    : ForcingValues.derivative(equation, origin, j));
        }
        LinearSystem.Result result = LinearSystem.solve(rows, rhs);
        if (result.certificate() != null) {
            throw ConditionsException.contradictory(inconsistency(equation, conditions, rhs, result.certificate()));
        }
        if (result.kernel() != null) {
            throw new UnderdeterminedConditions("the conditions do not determine the solution: only "
                    + (result.rank() - operator.degree() + k) + " of the " + k + " are independent",
                    new InitialState(origin, result.kernel()));
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
    static List<List<Rational>> matrix(LinearEquation equation, List<Condition> conditions) {
        return rows(equation, conditions, origin(equation.domain(), conditions), equation.characteristicPolynomial());
    }

    /**
     * The condition number κ_∞(A) = ‖A‖_∞·‖A⁻¹‖_∞ of the fitting {@link #matrix}, exactly: relative
     * errors in the condition values (measured in the max norm) can be amplified by up to this factor
     * in the initial state, and so in the fitted constants. 1 when the conditions are the initial
     * values themselves; empty when the conditions do not determine the solution, and for a
     * differential equation's conditions at several points or at a multiple of π (a boundary-value
     * problem, whose system is not this one).
     */
    public static Optional<Rational> conditionNumber(LinearEquation equation, List<Condition> conditions) {
        if (equation.domain() == Domain.DIFFERENTIAL
                && conditions.stream().anyMatch(c -> c.atTimesPi() || !c.samePoint(conditions.get(0)))) {
            return Optional.empty();
        }
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

    /** One row per condition: the coefficients of λ^a mod the operator polynomial. */
    private static List<List<Rational>> rows(LinearEquation equation, List<Condition> conditions, Rational origin,
            RationalPolynomial operator) {
        List<List<Rational>> rows = new ArrayList<>();
        for (Condition c : conditions) {
            Deadline.checkCurrent();
            long power = equation.domain() == Domain.DIFFERENCE
                    ? c.at().subtract(origin).toBigInteger().longValueExact()
                    : c.derivative();
            rows.add(row(powerModulo(power, operator), operator.degree()));
        }
        return rows;
    }

    /**
     * "every solution has x[2] + x[0] = 0, but the given values make it 1": the relation u·A = 0
     * restricted to the user's conditions, whose forced value comes from the forcing rows.
     */
    private static String inconsistency(LinearEquation eq, List<Condition> conditions, List<Rational> rhs,
            List<Rational> u) {
        int k = conditions.size();
        Rational scale = normaliser(u.subList(0, k));
        StringBuilder relation = new StringBuilder();
        Rational given = Rational.ZERO;
        for (int i = 0; i < k; i++) {
            Rational c = u.get(i).multiply(scale);
            if (c.isZero()) {
                continue;
            }
            String label = label(eq, conditions.get(i));
            String size = c.abs().isOne() ? "" : c.abs() + "·";
            relation.append(relation.length() == 0 ? (c.signum() < 0 ? "-" : "") : (c.signum() < 0 ? " - " : " + "))
                    .append(size).append(label);
            given = given.add(c.multiply(conditions.get(i).value()));
        }
        Rational forced = Rational.ZERO;
        for (int i = k; i < u.size(); i++) {
            forced = forced.subtract(u.get(i).multiply(scale).multiply(rhs.get(i)));
        }
        return "the conditions are inconsistent: every solution has " + relation + " = " + forced
                + ", but the given values make it " + given;
    }

    /** A factor that makes the entries integers with no common divisor and the first nonzero one positive. */
    private static Rational normaliser(List<Rational> u) {
        java.math.BigInteger lcm = java.math.BigInteger.ONE;
        java.math.BigInteger gcd = java.math.BigInteger.ZERO;
        for (Rational r : u) {
            lcm = lcm.divide(lcm.gcd(r.denominator())).multiply(r.denominator());
        }
        Rational first = Rational.ZERO;
        for (Rational r : u) {
            gcd = gcd.gcd(r.multiply(Rational.of(lcm)).toBigInteger());
            first = first.isZero() ? r : first;
        }
        Rational scale = gcd.signum() == 0 ? Rational.ONE : Rational.of(lcm, gcd);
        return first.signum() < 0 ? scale.negate() : scale;
    }

    /** The left side of a condition as written: {@code x[5]} or {@code y''(3/2)}. */
    private static String label(LinearEquation eq, Condition c) {
        return eq.domain() == Domain.DIFFERENCE ? eq.function() + "[" + c.point() + "]"
                : eq.function() + "'".repeat(c.derivative()) + "(" + c.point() + ")";
    }

    /**
     * Checks that there are exactly k conditions and none is given twice.
     *
     * @throws InputException otherwise
     */
    static void validate(LinearEquation equation, List<Condition> conditions) {
        int k = equation.order();
        if (conditions.size() != k) {
            throw new InputException(conditions.size() + " condition" + (conditions.size() == 1 ? "" : "s")
                    + " given, but an equation of order " + k + " needs exactly " + k, "", -1);
        }
        for (int i = 0; i < conditions.size(); i++) {
            Condition c = conditions.get(i);
            if (conditions.subList(0, i).stream().anyMatch(c::samePlace)) {
                throw new InputException("the condition on " + label(equation, c) + " is given twice", "", -1);
            }
        }
    }

    private static List<Rational> row(RationalPolynomial reduced, int size) {
        List<Rational> row = new ArrayList<>(size);
        for (int j = 0; j < size; j++) {
            row.add(reduced.coefficient(j));
        }
        return row;
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

    /** λ^power mod the modulus, by binary powering. */
    static RationalPolynomial powerModulo(long power, RationalPolynomial modulus) {
        RationalPolynomial result = RationalPolynomial.ONE.mod(modulus);
        RationalPolynomial base = RationalPolynomial.X.mod(modulus);
        long e = power;
        while (e > 0) {
            Deadline.checkCurrent();
            if ((e & 1) == 1) {
                result = result.multiply(base).mod(modulus);
            }
            e >>= 1;
            if (e > 0) {
                base = base.multiply(base).mod(modulus);
            }
        }
        return result;
    }
}
