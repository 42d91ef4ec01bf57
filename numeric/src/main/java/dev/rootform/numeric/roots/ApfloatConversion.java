package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.math.MathContext;
import org.apfloat.Apfloat;

/**
 * Exact rationals as apfloat numbers at a stated precision (approximate: the quotient is rounded
 * to that many significant digits). Numerators and denominators that fit a {@code long} take
 * apfloat's integer constructor (apfloat 1.12's {@link BigInteger} constructor reads the digits
 * through a stream and dominated the cost of small exact numbers; measured, README "Performance"),
 * others go through {@link java.math.BigDecimal}.
 */
final class ApfloatConversion {
    private ApfloatConversion() {
    }

    /** r to {@code precision} significant digits. */
    static Apfloat of(Rational r, long precision) {
        BigInteger numerator = r.numerator();
        BigInteger denominator = r.denominator();
        if (numerator.bitLength() < Long.SIZE && denominator.bitLength() < Long.SIZE) {
            Apfloat top = new Apfloat(numerator.longValue(), precision);
            return denominator.equals(BigInteger.ONE) ? top : top.divide(new Apfloat(denominator.longValue(), precision));
        }
        return new Apfloat(r.toBigDecimal(new MathContext((int) Math.min(Integer.MAX_VALUE, precision))), precision);
    }
}
