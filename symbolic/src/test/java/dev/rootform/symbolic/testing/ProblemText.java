package dev.rootform.symbolic.testing;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.List;

/**
 * Writes a homogeneous problem in the ordinary notation a user types:
 * {@code a_k y^(k) + ... + a_1 y' + a_0 y = 0; y(t0) = v0; y'(t0) = v1} for differential equations
 * and {@code a_k x[n+k] + ... + a_0 x[n] = 0; x[i] = v} for difference equations. Coefficients and
 * values are fractions, or terminating decimals when {@code decimals} is set and they have one.
 */
public final class ProblemText {
    private static final BigInteger TWO = BigInteger.valueOf(2);
    private static final BigInteger FIVE = BigInteger.valueOf(5);

    private ProblemText() {
    }

    /** The problem as text; the equation must be homogeneous with shift 0. */
    public static String of(Problem problem, boolean decimals) {
        return of(problem, decimals, "0");
    }

    /** The homogeneous problem's text with {@code rightSide} in place of 0 (a forced equation). */
    public static String of(Problem problem, boolean decimals, String rightSide) {
        LinearEquation eq = problem.equation();
        if (!eq.isHomogeneous() || eq.shift() != 0) {
            throw new IllegalArgumentException("only homogeneous equations with shift 0 are written");
        }
        StringBuilder text = new StringBuilder();
        List<Rational> a = eq.coefficients();
        for (int j = eq.order(); j >= 0; j--) {
            if (!a.get(j).isZero()) {
                appendTerm(text, a.get(j), unknown(eq, j), decimals);
            }
        }
        text.append(" = ").append(rightSide);
        for (Condition c : problem.conditions()) {
            text.append("; ").append(condition(eq, c, decimals));
        }
        return text.toString();
    }

    private static void appendTerm(StringBuilder text, Rational c, String unknown, boolean decimals) {
        boolean first = text.length() == 0;
        if (c.signum() < 0) {
            text.append(first ? "-" : " - ");
        } else if (!first) {
            text.append(" + ");
        }
        Rational size = c.abs();
        if (!size.isOne()) {
            String number = number(size, decimals);
            text.append(size.isInteger() || number.indexOf('/') < 0 ? number : "(" + number + ")").append(' ');
        }
        text.append(unknown);
    }

    private static String unknown(LinearEquation eq, int j) {
        if (eq.domain() == Domain.DIFFERENCE) {
            return eq.function() + "[" + eq.variable() + (j == 0 ? "" : "+" + j) + "]";
        }
        return eq.function() + derivative(j);
    }

    private static String derivative(int j) {
        return j <= 2 ? "'".repeat(j) : "^(" + j + ")";
    }

    private static String condition(LinearEquation eq, Condition c, boolean decimals) {
        String value = number(c.value(), decimals);
        if (eq.domain() == Domain.DIFFERENCE) {
            return eq.function() + "[" + c.at() + "] = " + value;
        }
        return eq.function() + derivative(c.derivative()) + "(" + number(c.at(), decimals) + ") = " + value;
    }

    /** A fraction, or its terminating decimal expansion when asked for and there is one. */
    static String number(Rational r, boolean decimals) {
        if (decimals && !r.isInteger() && onlyTwosAndFives(r.denominator())) {
            return new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator())).toPlainString();
        }
        return r.toString();
    }

    private static boolean onlyTwosAndFives(BigInteger d) {
        BigInteger rest = d;
        for (BigInteger p : new BigInteger[] {TWO, FIVE}) {
            while (rest.mod(p).signum() == 0) {
                rest = rest.divide(p);
            }
        }
        return rest.equals(BigInteger.ONE);
    }
}
