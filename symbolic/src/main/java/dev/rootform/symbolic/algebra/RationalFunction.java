package dev.rootform.symbolic.algebra;

import java.util.Objects;

/**
 * An element of Q(x), the field of univariate rational functions over the rationals: numerator /
 * denominator in lowest terms, the denominator monic. Immutable; equal values have equal
 * representations.
 *
 * @param numerator the numerator, coprime to the denominator
 * @param denominator the monic, nonzero denominator (1 when the numerator is zero)
 * @since 0.1
 */
public record RationalFunction(RationalPolynomial numerator, RationalPolynomial denominator) {
    public static final RationalFunction ZERO = of(RationalPolynomial.ZERO);
    public static final RationalFunction ONE = of(RationalPolynomial.ONE);
    public static final RationalFunction X = of(RationalPolynomial.X);

    public RationalFunction {
        Objects.requireNonNull(numerator, "numerator");
        Objects.requireNonNull(denominator, "denominator");
        if (denominator.isZero()) {
            throw new ArithmeticException("zero denominator");
        }
        if (numerator.isZero()) {
            denominator = RationalPolynomial.ONE;
        } else {
            RationalPolynomial g = numerator.gcd(denominator);
            Rational lead = denominator.divide(g).leadingCoefficient();
            numerator = numerator.divide(g).multiply(lead.inverse());
            denominator = denominator.divide(g).multiply(lead.inverse());
        }
    }

    /** The polynomial p as p/1. */
    public static RationalFunction of(RationalPolynomial p) {
        return new RationalFunction(p, RationalPolynomial.ONE);
    }

    /** The constant q. */
    public static RationalFunction of(Rational q) {
        return of(RationalPolynomial.constant(q));
    }

    public boolean isZero() {
        return numerator.isZero();
    }

    public RationalFunction add(RationalFunction other) {
        return new RationalFunction(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                denominator.multiply(other.denominator));
    }

    public RationalFunction subtract(RationalFunction other) {
        return add(other.negate());
    }

    public RationalFunction negate() {
        return new RationalFunction(numerator.negate(), denominator);
    }

    public RationalFunction multiply(RationalFunction other) {
        return new RationalFunction(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
    }

    /** this / other. @throws ArithmeticException if other is zero */
    public RationalFunction divide(RationalFunction other) {
        if (other.isZero()) {
            throw new ArithmeticException("division by the zero rational function");
        }
        return new RationalFunction(numerator.multiply(other.denominator), denominator.multiply(other.numerator));
    }

    /** The value at x. @throws ArithmeticException if the denominator vanishes at x */
    public Rational evaluate(Rational x) {
        return numerator.evaluate(x).divide(denominator.evaluate(x));
    }

    /** The function written in {@code variable}, e.g. {@code (2x)/(x^2 + 1)}. */
    public String toString(String variable) {
        String top = numerator.toString(variable);
        return denominator.equals(RationalPolynomial.ONE) ? top
                : "(" + top + ")/(" + denominator.toString(variable) + ")";
    }

    @Override
    public String toString() {
        return toString("x");
    }
}
