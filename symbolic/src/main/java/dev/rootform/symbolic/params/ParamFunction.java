package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.backend.JasMultivariate;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * An element of Q(params): a quotient of polynomials in the parameters, in lowest terms with a
 * denominator whose leading coefficient (in {@link ParamPolynomial}'s order) is 1. Immutable and
 * canonical, so {@link #equals} is equality of rational functions. Exact throughout.
 *
 * @since 0.3
 */
public final class ParamFunction {
    private final ParamPolynomial numerator;
    private final ParamPolynomial denominator;

    private ParamFunction(ParamPolynomial numerator, ParamPolynomial denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /** p/q in lowest terms. @throws ArithmeticException if q is zero */
    public static ParamFunction of(ParamPolynomial p, ParamPolynomial q) {
        if (q.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        if (p.isZero()) {
            return zero(p.names());
        }
        ParamPolynomial g = q.isConstant() ? q : JasMultivariate.gcd(p, q);
        ParamPolynomial top = JasMultivariate.divide(p, g);
        ParamPolynomial bottom = JasMultivariate.divide(q, g);
        Rational lead = bottom.leadingCoefficient();
        return new ParamFunction(top.scale(lead.inverse()), bottom.scale(lead.inverse()));
    }

    public static ParamFunction of(ParamPolynomial p) {
        return new ParamFunction(p, ParamPolynomial.constant(p.names(), Rational.ONE));
    }

    public static ParamFunction constant(List<String> names, Rational c) {
        return of(ParamPolynomial.constant(names, c));
    }

    public static ParamFunction zero(List<String> names) {
        return constant(names, Rational.ZERO);
    }

    public static ParamFunction one(List<String> names) {
        return constant(names, Rational.ONE);
    }

    public ParamPolynomial numerator() {
        return numerator;
    }

    public ParamPolynomial denominator() {
        return denominator;
    }

    public List<String> names() {
        return numerator.names();
    }

    public boolean isZero() {
        return numerator.isZero();
    }

    /** True when no parameter occurs: the function is a rational number. */
    public boolean isConstant() {
        return numerator.isConstant() && denominator.isConstant();
    }

    /** The rational value of a constant function. @throws IllegalStateException if a parameter occurs */
    public Rational constantValue() {
        return numerator.constantValue().divide(denominator.constantValue());
    }

    public ParamFunction add(ParamFunction other) {
        if (other.isZero()) {
            return this;
        }
        if (isZero()) {
            return other;
        }
        if (denominator.equals(other.denominator)) {
            return of(numerator.add(other.numerator), denominator);
        }
        return of(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                denominator.multiply(other.denominator));
    }

    public ParamFunction negate() {
        return new ParamFunction(numerator.negate(), denominator);
    }

    public ParamFunction subtract(ParamFunction other) {
        return add(other.negate());
    }

    public ParamFunction multiply(ParamFunction other) {
        if (isZero() || other.isZero()) {
            return zero(names());
        }
        if (denominator.isConstant() && other.denominator.isConstant()) {
            return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
        }
        return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
    }

    public ParamFunction scale(Rational factor) {
        return new ParamFunction(numerator.scale(factor), denominator).normalisedIfZero();
    }

    /** @throws ArithmeticException if {@code other} is zero */
    public ParamFunction divide(ParamFunction other) {
        if (other.isZero()) {
            throw new ArithmeticException("division by zero: " + other);
        }
        return of(numerator.multiply(other.denominator), denominator.multiply(other.numerator));
    }

    /** this^exponent for any integer exponent. @throws ArithmeticException for 0 to a negative power */
    public ParamFunction pow(int exponent) {
        if (exponent < 0) {
            return one(names()).divide(this).pow(-exponent);
        }
        return new ParamFunction(numerator.pow(exponent), denominator.pow(exponent));
    }

    /** The value at rational parameter values. @throws ArithmeticException if the denominator vanishes there */
    public Rational evaluate(Map<String, Rational> values) {
        return numerator.evaluate(values).divide(denominator.evaluate(values));
    }

    /** This function with parameter {@code index} replaced by {@code value}. */
    public ParamFunction substitute(int index, ParamFunction value) {
        return substitute(numerator, index, value).divide(substitute(denominator, index, value));
    }

    /** p with variable {@code index} replaced by {@code value} (Horner). */
    public static ParamFunction substitute(ParamPolynomial p, int index, ParamFunction value) {
        ParamFunction result = zero(p.names());
        for (int power = p.degreeIn(index); power >= 0; power--) {
            result = result.multiply(value).add(of(p.coefficientOf(index, power)));
        }
        return result;
    }

    private ParamFunction normalisedIfZero() {
        return numerator.isZero() ? zero(names()) : this;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ParamFunction f && numerator.equals(f.numerator) && denominator.equals(f.denominator);
    }

    @Override
    public int hashCode() {
        return Objects.hash(numerator, denominator);
    }

    /** Plain text: {@code -c/(2·m)}, {@code (k - m·w^2)/m}; numerator and denominator with integer coefficients. */
    @Override
    public String toString() {
        java.math.BigInteger lcm = java.math.BigInteger.ONE;
        java.math.BigInteger gcd = java.math.BigInteger.ZERO;
        for (ParamPolynomial p : List.of(numerator, denominator)) {
            for (Map.Entry<int[], Rational> t : p.exponentVectors()) {
                java.math.BigInteger d = t.getValue().denominator();
                lcm = lcm.divide(lcm.gcd(d)).multiply(d);
                gcd = gcd.gcd(t.getValue().numerator());
            }
        }
        Rational scale = Rational.of(lcm, gcd);
        String top = numerator.scale(scale).toString();
        boolean single = numerator.exponentVectors().size() == 1;
        if (numerator.isZero() || denominator.isConstant() && denominator.scale(scale).constantValue().isOne()) {
            return numerator.isZero() ? "0" : top;
        }
        if (denominator.isConstant()) {
            return (single ? top : "(" + top + ")") + "/" + denominator.scale(scale);
        }
        String bottom = denominator.scale(scale).toString();
        boolean simpleBottom = denominator.exponentVectors().size() == 1 && !bottom.contains("·") && !bottom.contains("/");
        return (single ? top : "(" + top + ")") + "/" + (simpleBottom ? bottom : "(" + bottom + ")");
    }
}
