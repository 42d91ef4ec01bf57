package dev.rootform.numeric.roots;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;

/** p(z) and p'(z) by Horner's rule in apfloat, for the iterations that refine roots (approximate). */
final class Horner {
    private Horner() {
    }

    /** The coefficients a_0..a_d of p at {@code precision} digits. */
    static Apfloat[] coefficients(RationalPolynomial p, long precision) {
        Apfloat[] c = new Apfloat[p.degree() + 1];
        for (int i = 0; i < c.length; i++) {
            c[i] = ApfloatConversion.of(p.coefficient(i), precision);
        }
        return c;
    }

    /** {p(z), p'(z)} for p with the given coefficients a_0..a_d. */
    static Apcomplex[] valueAndSlope(Apfloat[] coefficients, Apcomplex z) {
        Apcomplex value = Apcomplex.ZERO;
        Apcomplex slope = Apcomplex.ZERO;
        for (int k = coefficients.length - 1; k >= 0; k--) {
            slope = slope.multiply(z).add(value);
            value = value.multiply(z).add(coefficients[k]);
        }
        return new Apcomplex[] {value, slope};
    }
}
