package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;
import org.apfloat.Apfloat;
import org.apfloat.Apint;

/**
 * An exact rational number in lowest terms with all its digits, however many: a sequence value asked
 * for with all its digits at a large index (F(10^7) has 2,089,877 digits). It is
 * kept in decimal (apfloat's radix-10 integers), so that writing it out costs milliseconds where a
 * binary {@link BigInteger} would need seconds to convert. Immutable.
 *
 * @since 0.3
 */
public final class ExactDigits {
    private final Apint numerator;
    private final Apint denominator;

    /** @param numerator and @param denominator (positive) of a fraction already in lowest terms */
    ExactDigits(Apint numerator, Apint denominator) {
        this.numerator = Objects.requireNonNull(numerator, "numerator");
        this.denominator = Objects.requireNonNull(denominator, "denominator");
        if (denominator.signum() <= 0) {
            throw new IllegalArgumentException("denominator " + denominator + " is not positive");
        }
    }

    /** The same number as a (lowest-terms) rational. */
    static ExactDigits of(Rational q) {
        return new ExactDigits(new Apint(q.numerator()), new Apint(q.denominator()));
    }

    /** Whether the denominator is 1. */
    public boolean isInteger() {
        return denominator.equals(Apint.ONE);
    }

    /** -1, 0 or 1 as the number is negative, zero or positive. */
    public int signum() {
        return numerator.signum();
    }

    /** Decimal digits of the numerator and the denominator together (without sign). */
    public long digitCount() {
        return numerator.signum() == 0 ? 1 : numerator.scale() + (isInteger() ? 0 : denominator.scale());
    }

    /** The number rounded to {@code context}'s significant digits (half-even). */
    public BigDecimal toBigDecimal(MathContext context) {
        if (numerator.signum() == 0) {
            return BigDecimal.ZERO;
        }
        long working = context.getPrecision() + 10L;
        Apfloat q = numerator.precision(working).divide(denominator.precision(working));
        return new BigDecimal(q.toString(false)).round(context);
    }

    /**
     * The same number as a {@link Rational}: a conversion to binary that takes seconds at millions
     * of digits (about 1.5 s for F(10^7) on a 2-vCPU machine).
     */
    public Rational toRational() {
        return Rational.of(numerator.toBigInteger(), denominator.toBigInteger());
    }

    /** All the digits: {@code 354224848179261915075} or {@code -7/128}. */
    @Override
    public String toString() {
        return isInteger() ? numerator.toString(true) : numerator.toString(true) + "/" + denominator.toString(true);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ExactDigits e && numerator.equals(e.numerator) && denominator.equals(e.denominator);
    }

    @Override
    public int hashCode() {
        return 31 * numerator.hashCode() + denominator.hashCode();
    }
}
