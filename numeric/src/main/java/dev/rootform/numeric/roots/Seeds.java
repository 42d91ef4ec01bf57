package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.math.BigDecimal;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Starting approximations of all zeros of p (degree ≥ 2, p(0) ≠ 0) at a given precision; approximate.
 * Degree 2 uses the closed form in the cancellation-free arrangement q = −(b + sgn(b)·√Δ)/2,
 * x₁ = q/a, x₂ = c/q for Δ ≥ 0 and (−b ± i√−Δ)/(2a) otherwise (the sign of Δ = b² − 4ac is decided
 * exactly); higher degrees use {@link DoubleSeeds}.
 */
final class Seeds {
    private Seeds() {
    }

    static Apcomplex[] of(RationalPolynomial p, long precision) {
        if (p.degree() == 2) {
            return quadratic(p, precision);
        }
        double[][] z = DoubleSeeds.of(p);
        Apcomplex[] result = new Apcomplex[z[0].length];
        for (int i = 0; i < result.length; i++) {
            result[i] = new Apcomplex(new Apfloat(z[0][i], precision), new Apfloat(z[1][i], precision));
        }
        return result;
    }

    private static Apcomplex[] quadratic(RationalPolynomial p, long precision) {
        Rational a = p.coefficient(2);
        Rational b = p.coefficient(1);
        Rational c = p.coefficient(0);
        Rational discriminant = b.multiply(b).subtract(a.multiply(c).multiply(4));
        Apfloat two = new Apfloat(2, precision);
        Apfloat root = ApfloatMath.sqrt(toApfloat(discriminant.abs(), precision));
        Apfloat ap = toApfloat(a, precision);
        Apfloat bp = toApfloat(b, precision);
        if (discriminant.signum() < 0) {
            Apfloat re = bp.negate().divide(two.multiply(ap));
            Apfloat im = root.divide(two.multiply(ap));
            return new Apcomplex[] {new Apcomplex(re, im), new Apcomplex(re, im.negate())};
        }
        Apfloat q = (b.signum() < 0 ? bp.subtract(root) : bp.add(root)).negate().divide(two);
        return new Apcomplex[] {new Apcomplex(q.divide(ap)), new Apcomplex(toApfloat(c, precision).divide(q))};
    }

    /**
     * r at {@code precision} digits. Numerator and denominator go in through {@code BigDecimal}: apfloat
     * 1.12's {@code BigInteger} constructor took about 0.5 ms even for one-digit integers (measured; its
     * time goes to reading the digits through a stream and sizing a data storage), the
     * {@code BigDecimal} one about 0.2 µs, for the same value.
     */
    static Apfloat toApfloat(Rational r, long precision) {
        return new Apfloat(new BigDecimal(r.numerator()), precision).divide(new Apfloat(new BigDecimal(r.denominator()), precision));
    }
}
