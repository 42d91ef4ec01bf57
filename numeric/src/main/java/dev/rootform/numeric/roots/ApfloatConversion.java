package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.math.MathContext;
import org.apfloat.Apfloat;

/**
 * Exact rationals as apfloat numbers at a stated precision (approximate: the quotient is rounded
 * to that many significant digits). Numerators and denominators that fit a {@code long} take
 * apfloat's integer constructor; apfloat reads a {@link BigInteger} or {@link java.math.BigDecimal}
 * from its decimal text, which dominated the cost of small exact numbers (measured, README
 * "Performance").
 */
public final class ApfloatConversion {
    private ApfloatConversion() {
    }

    /** r to {@code precision} significant digits. */
    public static Apfloat of(Rational r, long precision) {
        BigInteger numerator = r.numerator();
        BigInteger denominator = r.denominator();
        if (numerator.bitLength() < Long.SIZE && denominator.bitLength() < Long.SIZE) {
            Apfloat top = new Apfloat(numerator.longValue(), precision);
            return denominator.equals(BigInteger.ONE) ? top : top.divide(new Apfloat(denominator.longValue(), precision));
        }
        return new Apfloat(r.toBigDecimal(new MathContext((int) Math.min(Integer.MAX_VALUE, precision))), precision);
    }
}
