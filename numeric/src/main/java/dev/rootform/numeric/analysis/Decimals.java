package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;
import org.apfloat.Apfloat;

/** Conversions between exact rationals, apfloat numbers and rounded decimals at a stated precision. */
final class Decimals {
    private Decimals() {
    }

    static Apfloat toApfloat(Rational r, long precision) {
        return new Apfloat(r.toBigDecimal(new MathContext((int) precision)), precision);
    }

    /** {@code a} rounded to {@code digits}; read from apfloat's scientific form, so a huge exponent costs nothing. */
    static BigDecimal toBigDecimal(Apfloat a, int digits) {
        return new BigDecimal(a.toString(false)).round(new MathContext(digits));
    }
}
