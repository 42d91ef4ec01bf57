package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Objects;

/**
 * A rational function p/q over Q in lowest terms: gcd(p, q) = 1, q monic (q = 1 for zero).
 * Immutable.
 *
 * @since 0.3
 */
public final class RationalFunction {
    private final RationalPolynomial numerator;
    private final RationalPolynomial denominator;

    private RationalFunction(RationalPolynomial numerator, RationalPolynomial denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /** p/q brought to lowest terms. @throws ArithmeticException if q is zero */
    public static RationalFunction of(RationalPolynomial p, RationalPolynomial q) {
        if (q.isZero()) {
            throw new ArithmeticException("zero denominator");
        }
        if (p.isZero()) {
            return new RationalFunction(RationalPolynomial.ZERO, RationalPolynomial.ONE);
        }
        RationalPolynomial g = p.gcd(q);
        RationalPolynomial num = p.divide(g);
        RationalPolynomial den = q.divide(g);
        Rational lead = den.leadingCoefficient();
        return new RationalFunction(num.multiply(lead.inverse()), den.monic());
    }

    public RationalPolynomial numerator() {
        return numerator;
    }

    public RationalPolynomial denominator() {
        return denominator;
    }

    /** this + c for a constant c. */
    public RationalFunction add(Rational c) {
        return of(numerator.add(denominator.multiply(c)), denominator);
    }

    /** e.g. {@code (s + 3)/(s^2 + 2s + 5)}, {@code 1/(s + 1)}, {@code 2}. */
    public String toString(String variable) {
        String num = numerator.toString(variable);
        if (denominator.degree() == 0) {
            return num;
        }
        boolean simpleNum = numerator.degree() == 0 && numerator.coefficient(0).signum() >= 0 && numerator.coefficient(0).isInteger();
        return (simpleNum ? num : "(" + num + ")") + "/(" + denominator.toString(variable) + ")";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalFunction r && numerator.equals(r.numerator) && denominator.equals(r.denominator);
    }

    @Override
    public int hashCode() {
        return Objects.hash(numerator, denominator);
    }

    @Override
    public String toString() {
        return toString("s");
    }
}
