package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A rational function N(x)/D(x) with exact rational coefficients, kept in lowest terms:
 * gcd(N, D) = 1 and D monic (the zero function is 0/1). Immutable and canonical, so
 * {@link #equals} is equality of functions.
 *
 * <p>Arithmetic reduces every result. To learn which common factors a written quotient had, use
 * {@link #lowestTerms(RationalPolynomial, RationalPolynomial)}.
 *
 * @since 0.3
 */
public final class RationalFunction {
    public static final RationalFunction ZERO = new RationalFunction(RationalPolynomial.ZERO, RationalPolynomial.ONE);
    public static final RationalFunction ONE = new RationalFunction(RationalPolynomial.ONE, RationalPolynomial.ONE);
    /** The function x. */
    public static final RationalFunction X = new RationalFunction(RationalPolynomial.X, RationalPolynomial.ONE);

    private final RationalPolynomial numerator;
    private final RationalPolynomial denominator;

    private RationalFunction(RationalPolynomial numerator, RationalPolynomial denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /**
     * The quotient num/den in lowest terms.
     *
     * @throws ArithmeticException if {@code den} is the zero polynomial
     */
    public static RationalFunction of(RationalPolynomial num, RationalPolynomial den) {
        Objects.requireNonNull(num, "num");
        Objects.requireNonNull(den, "den");
        if (den.isZero()) {
            throw new ArithmeticException("denominator is the zero polynomial");
        }
        if (num.isZero()) {
            return ZERO;
        }
        RationalPolynomial g = num.gcd(den);
        RationalPolynomial n = g.degree() > 0 ? num.divide(g) : num;
        RationalPolynomial d = g.degree() > 0 ? den.divide(g) : den;
        Rational lead = d.leadingCoefficient().inverse();
        return new RationalFunction(n.multiply(lead), d.multiply(lead));
    }

    /** The polynomial p as a rational function. */
    public static RationalFunction polynomial(RationalPolynomial p) {
        return new RationalFunction(p, RationalPolynomial.ONE);
    }

    /** The constant c. */
    public static RationalFunction constant(Rational c) {
        return polynomial(RationalPolynomial.constant(c));
    }

    /**
     * num/den in lowest terms together with the monic irreducible factors (with multiplicities)
     * that num and den had in common and that were cancelled.
     *
     * @throws ArithmeticException if {@code den} is the zero polynomial
     */
    public static LowestTerms lowestTerms(RationalPolynomial num, RationalPolynomial den) {
        RationalFunction value = of(num, den);
        if (num.isZero()) {
            return new LowestTerms(value, List.of());
        }
        RationalPolynomial g = num.gcd(den);
        return new LowestTerms(value, g.degree() < 1 ? List.of() : JasFactorizer.factor(g));
    }

    /** N, scaled so that D is monic. */
    public RationalPolynomial numerator() {
        return numerator;
    }

    /** D, monic. */
    public RationalPolynomial denominator() {
        return denominator;
    }

    public boolean isZero() {
        return numerator.isZero();
    }

    /** True when the denominator is 1. */
    public boolean isPolynomial() {
        return denominator.degree() == 0;
    }

    public RationalFunction add(RationalFunction other) {
        return of(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                denominator.multiply(other.denominator));
    }

    public RationalFunction subtract(RationalFunction other) {
        return add(other.negate());
    }

    public RationalFunction negate() {
        return new RationalFunction(numerator.negate(), denominator);
    }

    public RationalFunction multiply(Rational factor) {
        return factor.isZero() ? ZERO : new RationalFunction(numerator.multiply(factor), denominator);
    }

    public RationalFunction multiply(RationalFunction other) {
        return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator));
    }

    /** @throws ArithmeticException if {@code other} is zero */
    public RationalFunction divide(RationalFunction other) {
        if (other.isZero()) {
            throw new ArithmeticException("division by the zero function");
        }
        return of(numerator.multiply(other.denominator), denominator.multiply(other.numerator));
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
        return of(numerator.derivative().multiply(denominator).subtract(numerator.multiply(denominator.derivative())),
                denominator.multiply(denominator));
    }

    /** f(1/x), e.g. turns a function of z into one of w = z^-1. */
    public RationalFunction reciprocalArgument() {
        int shift = numerator.degree() - denominator.degree();
        RationalPolynomial n = numerator.reversed();
        RationalPolynomial d = denominator.reversed();
        // N(1/x)/D(1/x) = x^(deg D - deg N)·rev(N)/rev(D)
        RationalPolynomial power = RationalPolynomial.monomial(Rational.ONE, Math.abs(shift));
        return shift >= 0 ? of(n, d.multiply(power)) : of(n.multiply(power), d);
    }

    /** The value at x, or empty when x is a pole. */
    public Optional<Rational> evaluate(Rational x) {
        Rational d = denominator.evaluate(x);
        return d.isZero() ? Optional.empty() : Optional.of(numerator.evaluate(x).divide(d));
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
    public List<Rational> seriesAtInfinity(int count) {
        RationalPolynomial r = numerator.mod(denominator);
        int d = denominator.degree();
        List<Rational> c = new ArrayList<>(count);
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
    public List<Rational> seriesAtZero(int count) {
        Rational d0 = denominator.coefficient(0);
        if (d0.isZero()) {
            throw new ArithmeticException("x = 0 is a pole");
        }
        List<Rational> a = new ArrayList<>(count);
        for (int m = 0; m < count; m++) {
            Rational s = numerator.coefficient(m);
            for (int k = 1; k <= Math.min(m, denominator.degree()); k++) {
                s = s.subtract(denominator.coefficient(k).multiply(a.get(m - k)));
            }
            a.add(s.divide(d0));
        }
        return a;
    }

    /** The monic irreducible factors of the denominator with multiplicities (empty for a polynomial). */
    public List<Factor> poles() {
        return denominator.degree() < 1 ? List.of() : JasFactorizer.factor(denominator);
    }

    /** The monic irreducible factors of the numerator with multiplicities (empty for a constant). */
    public List<Factor> zeros() {
        return numerator.degree() < 1 ? List.of() : JasFactorizer.factor(numerator);
    }

    /** The partial-fraction decomposition over Q. */
    public PartialFractions partialFractions() {
        return PartialFractions.of(this);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalFunction f && numerator.equals(f.numerator) && denominator.equals(f.denominator);
    }

    @Override
    public int hashCode() {
        return 31 * numerator.hashCode() + denominator.hashCode();
    }

    /** e.g. {@code (x + 3)/(x^2 + 2x + 5)}, or the numerator alone when the denominator is 1. */
    public String toString(String variable) {
        String n = numerator.toString(variable);
        if (isPolynomial()) {
            return n;
        }
        return group(numerator, n) + "/" + group(denominator, denominator.toString(variable));
    }

    private static String group(RationalPolynomial p, String text) {
        long nonzero = p.coefficients().stream().filter(c -> !c.isZero()).count();
        boolean single = nonzero == 1 && (p.degree() == 0 ? p.coefficient(0).isInteger() && p.coefficient(0).signum() > 0
                : p.leadingCoefficient().isOne());
        return single ? text : "(" + text + ")";
    }

    @Override
    public String toString() {
        return toString("x");
    }
}
