package dev.rootform.symbolic.algebra;

import java.util.Objects;

/**
 * An element of Q(x), the field of univariate rational functions over the rationals: numerator /
 * denominator in lowest terms, the denominator monic. Immutable; equal values have equal
 * representations. Besides the field operations: powers, the derivative, f(1/x), the split into
 * polynomial and strictly proper parts, and the expansions at infinity and at 0 (exact, no
 * factoring; poles, zeros and partial fractions are in {@code dev.rootform.symbolic.transfer}).
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

    /** this·c. */
    public RationalFunction multiply(Rational c) {
        return new RationalFunction(numerator.multiply(c), denominator);
    }

    /** this^exponent for any integer exponent. @throws ArithmeticException for a negative power of zero */
    public RationalFunction pow(int exponent) {
        if (exponent < 0) {
            return ONE.divide(this).pow(-exponent);
        }
        return new RationalFunction(numerator.pow(exponent), denominator.pow(exponent));
    }

    /** The derivative (N'D − ND')/D². */
    public RationalFunction derivative() {
        return new RationalFunction(numerator.derivative().multiply(denominator).subtract(numerator.multiply(denominator.derivative())),
                denominator.multiply(denominator));
    }

    /** f(1/x) = x^(deg D − deg N)·rev(N)/rev(D); e.g. turns a function of z into one of w = z^-1. */
    public RationalFunction reciprocalArgument() {
        int shift = numerator.degree() - denominator.degree();
        RationalPolynomial power = RationalPolynomial.monomial(Rational.ONE, Math.abs(shift));
        return shift >= 0 ? new RationalFunction(numerator.reversed(), denominator.reversed().multiply(power))
                : new RationalFunction(numerator.reversed().multiply(power), denominator.reversed());
    }

    /** True when the denominator is 1. */
    public boolean isPolynomial() {
        return denominator.degree() == 0;
    }

    /** deg D − deg N: positive for strictly proper, 0 for biproper, negative for improper; 0 for zero. */
    public int relativeDegree() {
        return isZero() ? 0 : denominator.degree() - numerator.degree();
    }

    /** deg N &le; deg D. */
    public boolean isProper() {
        return relativeDegree() >= 0;
    }

    /** The polynomial part P of N/D = P + R/D with deg R &lt; deg D. */
    public RationalPolynomial polynomialPart() {
        return numerator.divide(denominator);
    }

    /** R/D, the strictly proper remainder of {@link #polynomialPart()}. */
    public RationalFunction strictlyProperPart() {
        return new RationalFunction(numerator.mod(denominator), denominator);
    }

    /**
     * The first {@code count} coefficients c_1, c_2, … of the expansion of the strictly proper part
     * at infinity, Σ_{k&ge;1} c_k x^(−k) (long division in 1/x). Cost O(count·deg D).
     */
    public java.util.List<Rational> seriesAtInfinity(int count) {
        RationalPolynomial r = numerator.mod(denominator);
        int d = denominator.degree();
        java.util.List<Rational> c = new java.util.ArrayList<>(count);
        for (int m = 1; m <= count; m++) {
            Rational s = r.coefficient(d - m);
            for (int k = 1; k < m; k++) {
                s = s.subtract(denominator.coefficient(d - m + k).multiply(c.get(k - 1)));
            }
            c.add(s);
        }
        return c;
    }

    /**
     * The first {@code count} Taylor coefficients a_0, a_1, … at x = 0.
     *
     * @throws ArithmeticException if 0 is a pole
     */
    public java.util.List<Rational> seriesAtZero(int count) {
        Rational d0 = denominator.coefficient(0);
        if (d0.isZero()) {
            throw new ArithmeticException("x = 0 is a pole");
        }
        java.util.List<Rational> a = new java.util.ArrayList<>(count);
        for (int m = 0; m < count; m++) {
            Rational s = numerator.coefficient(m);
            for (int k = 1; k <= Math.min(m, denominator.degree()); k++) {
                s = s.subtract(denominator.coefficient(k).multiply(a.get(m - k)));
            }
            a.add(s.divide(d0));
        }
        return a;
    }

    /** The value at x. @throws ArithmeticException if the denominator vanishes at x */
    public Rational evaluate(Rational x) {
        return numerator.evaluate(x).divide(denominator.evaluate(x));
    }

    /**
     * The function written in {@code variable}: {@code (s + 3)/(s^2 + 2s + 5)}, {@code 1/(s + 1)},
     * {@code 2}; the numerator goes without parentheses when it is a non-negative integer.
     */
    public String toString(String variable) {
        String top = numerator.toString(variable);
        if (isPolynomial()) {
            return top;
        }
        boolean bare = numerator.degree() <= 0 && numerator.coefficient(0).signum() >= 0 && numerator.coefficient(0).isInteger();
        return (bare ? top : "(" + top + ")") + "/(" + denominator.toString(variable) + ")";
    }

    @Override
    public String toString() {
        return toString("x");
    }
}
