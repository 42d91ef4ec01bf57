package dev.rootform.symbolic.algebra;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;

/**
 * An exact rational number p/q in lowest terms with q &gt; 0. Immutable and canonical, so
 * {@link #equals} is numeric equality.
 *
 * @since 0.1
 */
public final class Rational implements Comparable<Rational> {
    private static final MathContext DOUBLE_ROUNDING = new MathContext(40);
    public static final Rational ZERO = new Rational(BigInteger.ZERO, BigInteger.ONE);
    public static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);
    public static final Rational MINUS_ONE = new Rational(BigInteger.ONE.negate(), BigInteger.ONE);

    private final BigInteger numerator;
    private final BigInteger denominator;
    /** log2(10): bits per decimal digit. */
    private static final double BITS_PER_DIGIT = 3.3219280948873626;
    /** Extra bits kept when a long numerator or denominator is cut for rounding. */
    private static final int GUARD_BITS = 64;
    /** Extra decimal digits of the intermediate results of a cut rounding. */
    private static final int GUARD_DIGITS = 10;

    private Rational(BigInteger numerator, BigInteger denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /** The rational {@code numerator/denominator}, reduced. @throws ArithmeticException if the denominator is 0. */
    public static Rational of(BigInteger numerator, BigInteger denominator) {
        Objects.requireNonNull(numerator, "numerator");
        Objects.requireNonNull(denominator, "denominator");
        if (denominator.signum() == 0) {
            throw new ArithmeticException("division by zero");
        }
        if (numerator.signum() == 0) {
            return ZERO;
        }
        BigInteger g = gcd(numerator, denominator);
        if (denominator.signum() < 0) {
            g = g.negate();
        }
        return new Rational(quotient(numerator, g), quotient(denominator, g));
    }

    public static Rational of(BigInteger integer) {
        return of(integer, BigInteger.ONE);
    }

    public static Rational of(long integer) {
        return of(BigInteger.valueOf(integer), BigInteger.ONE);
    }

    public static Rational of(long numerator, long denominator) {
        return of(BigInteger.valueOf(numerator), BigInteger.valueOf(denominator));
    }

    /** The exact value of a decimal such as {@code 0.1} (= 1/10) or {@code 2.5e-3}. */
    public static Rational of(BigDecimal decimal) {
        BigInteger unscaled = decimal.unscaledValue();
        int scale = decimal.scale();
        return scale >= 0
                ? of(unscaled, BigInteger.TEN.pow(scale))
                : of(unscaled.multiply(BigInteger.TEN.pow(-scale)));
    }

    /**
     * Parses an integer, a decimal ({@code -0.25}, {@code 1e3}) or a fraction ({@code 3/4}) exactly.
     *
     * @throws NumberFormatException if {@code text} is none of these
     */
    public static Rational parse(String text) {
        int slash = text.indexOf('/');
        if (slash >= 0) {
            return of(new BigDecimal(text.substring(0, slash).trim()))
                    .divide(of(new BigDecimal(text.substring(slash + 1).trim())));
        }
        return of(new BigDecimal(text.trim()));
    }

    public BigInteger numerator() {
        return numerator;
    }

    public BigInteger denominator() {
        return denominator;
    }

    public int signum() {
        return numerator.signum();
    }

    public boolean isZero() {
        return numerator.signum() == 0;
    }

    public boolean isOne() {
        return equals(ONE);
    }

    public boolean isInteger() {
        return denominator.equals(BigInteger.ONE);
    }

    /**
     * The sum in lowest terms by Henrici's method (Knuth, TAOCP vol. 2, §4.5.1): with d1 = gcd(b, d),
     * a/b + c/d = (t/d2) / ((b/d1)·(d/d2)) where t = a·(d/d1) + c·(b/d1) and d2 = gcd(t, d1), so no gcd
     * of the full cross products is needed (none at all when d1 = 1, e.g. for integers).
     */
    public Rational add(Rational other) {
        if (isZero()) {
            return other;
        }
        if (other.isZero()) {
            return this;
        }
        BigInteger d1 = gcd(denominator, other.denominator);
        if (d1.equals(BigInteger.ONE)) {
            return new Rational(numerator.multiply(other.denominator).add(other.numerator.multiply(denominator)),
                    denominator.multiply(other.denominator));
        }
        BigInteger b = quotient(denominator, d1);
        BigInteger t = numerator.multiply(quotient(other.denominator, d1)).add(other.numerator.multiply(b));
        if (t.signum() == 0) {
            return ZERO;
        }
        BigInteger d2 = gcd(t, d1);
        return new Rational(quotient(t, d2), b.multiply(quotient(other.denominator, d2)));
    }

    public Rational subtract(Rational other) {
        return add(other.negate());
    }

    /**
     * The product in lowest terms by cross-cancelling first (Knuth, TAOCP vol. 2, §4.5.1):
     * (a/b)·(c/d) = ((a/g1)·(c/g2)) / ((b/g2)·(d/g1)) with g1 = gcd(a, d), g2 = gcd(c, b), two gcds of
     * one factor each instead of one of the products.
     */
    public Rational multiply(Rational other) {
        if (isZero() || other.isZero()) {
            return ZERO;
        }
        if (denominator.equals(BigInteger.ONE) && other.denominator.equals(BigInteger.ONE)) {
            return new Rational(numerator.multiply(other.numerator), BigInteger.ONE);
        }
        BigInteger g1 = gcd(numerator, other.denominator);
        BigInteger g2 = gcd(other.numerator, denominator);
        return new Rational(quotient(numerator, g1).multiply(quotient(other.numerator, g2)),
                quotient(denominator, g2).multiply(quotient(other.denominator, g1)));
    }

    /**
     * gcd(|a|, |b|), by Stein's binary algorithm on {@code long}s when both fit in 62 bits (Knuth,
     * TAOCP vol. 2, §4.5.2, Algorithm B): {@link BigInteger#gcd} builds mutable copies of both
     * operands even for one-word numbers, and most gcds here are of such numbers.
     */
    static BigInteger gcd(BigInteger a, BigInteger b) {
        if (a.bitLength() >= 63 || b.bitLength() >= 63) {
            return a.gcd(b);
        }
        long x = Math.abs(a.longValue());
        long y = Math.abs(b.longValue());
        if (x == 0 || y == 0) {
            return BigInteger.valueOf(x | y);
        }
        int shift = Long.numberOfTrailingZeros(x | y);
        x >>= Long.numberOfTrailingZeros(x);
        while (y != 0) {
            y >>= Long.numberOfTrailingZeros(y);
            if (x > y) {
                long t = x;
                x = y;
                y = t;
            }
            y -= x;
        }
        return BigInteger.valueOf(x << shift);
    }

    /** x/g for a divisor g of x: x itself when g is 1, in {@code long}s when x fits in one. */
    private static BigInteger quotient(BigInteger x, BigInteger g) {
        if (g.equals(BigInteger.ONE)) {
            return x;
        }
        return x.bitLength() < 63 ? BigInteger.valueOf(x.longValue() / g.longValue()) : x.divide(g);
    }

    public Rational multiply(long factor) {
        return multiply(of(factor));
    }

    /** @throws ArithmeticException if {@code other} is zero */
    public Rational divide(Rational other) {
        if (other.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        BigInteger sign = BigInteger.valueOf(other.signum());
        return multiply(new Rational(other.denominator.multiply(sign), other.numerator.abs()));
    }

    public Rational negate() {
        return isZero() ? this : new Rational(numerator.negate(), denominator);
    }

    public Rational abs() {
        return signum() < 0 ? negate() : this;
    }

    /** @throws ArithmeticException if this is zero */
    public Rational inverse() {
        return ONE.divide(this);
    }

    /** this^exponent for any integer exponent. @throws ArithmeticException for 0 to a negative power */
    public Rational pow(int exponent) {
        if (exponent < 0) {
            return inverse().pow(-exponent);
        }
        return of(numerator.pow(exponent), denominator.pow(exponent));
    }

    /** The integer value. @throws ArithmeticException if this is not an integer */
    public BigInteger toBigInteger() {
        if (!isInteger()) {
            throw new ArithmeticException(this + " is not an integer");
        }
        return numerator;
    }

    /**
     * The value rounded to {@code context}; approximate unless the decimal expansion terminates in
     * time. A numerator or denominator far longer than the precision needs is first cut to
     * precision + {@link #GUARD_BITS} bits and the power of two restored in decimal at
     * {@link #GUARD_DIGITS} extra digits, so x[10^6] of a recurrence rounds in milliseconds; the
     * result can then differ from correct rounding only when the value lies within about
     * 10^-(precision + 8) relative of a rounding boundary.
     */
    public BigDecimal toBigDecimal(MathContext context) {
        if (context.getPrecision() == 0) {
            return new BigDecimal(numerator).divide(new BigDecimal(denominator), context);
        }
        int keep = (int) Math.ceil(context.getPrecision() * BITS_PER_DIGIT) + GUARD_BITS;
        int cutNumerator = Math.max(0, numerator.bitLength() - keep);
        int cutDenominator = Math.max(0, denominator.bitLength() - keep);
        if (cutNumerator == 0 && cutDenominator == 0) {
            return new BigDecimal(numerator).divide(new BigDecimal(denominator), context);
        }
        MathContext wide = new MathContext(context.getPrecision() + GUARD_DIGITS);
        BigDecimal quotient = new BigDecimal(numerator.shiftRight(cutNumerator))
                .divide(new BigDecimal(denominator.shiftRight(cutDenominator)), wide);
        int shift = cutNumerator - cutDenominator;
        BigDecimal power = BigDecimal.valueOf(2).pow(Math.abs(shift), wide);
        return (shift >= 0 ? quotient.multiply(power, wide) : quotient.divide(power, wide)).round(context);
    }

    /**
     * The nearest double, through 40 significant digits (so a rational that is a double, such as the
     * exact value of an input, converts back to exactly that double). When numerator and denominator
     * both have at most 53 bits they are exact doubles and their quotient is one correctly rounded
     * division: the same double (a quotient with such a denominator lies at least about 2^-106
     * relative from the midpoint of two doubles, or on a double, so the 40 digits never round across).
     */
    public double doubleValue() {
        if (numerator.bitLength() <= 53 && denominator.bitLength() <= 53) {
            return numerator.doubleValue() / denominator.doubleValue();
        }
        return toBigDecimal(DOUBLE_ROUNDING).doubleValue();
    }

    @Override
    public int compareTo(Rational other) {
        return numerator.multiply(other.denominator).compareTo(other.numerator.multiply(denominator));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rational r && numerator.equals(r.numerator) && denominator.equals(r.denominator);
    }

    @Override
    public int hashCode() {
        return 31 * numerator.hashCode() + denominator.hashCode();
    }

    /** {@code p} or {@code p/q}. */
    @Override
    public String toString() {
        return isInteger() ? numerator.toString() : numerator + "/" + denominator;
    }
}
