package dev.rootform.numeric.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

class ComplexExpTest {
    private static final long PRECISION = 50;

    /** e^x·(cos y + i·sin y) by apfloat's own real functions, at 30 digits more. */
    private static Apcomplex reference(String x, String y) {
        long p = PRECISION + 30;
        Apfloat re = new Apfloat(x, p);
        Apfloat im = new Apfloat(y, p);
        Apfloat scale = ApfloatMath.exp(re);
        return new Apcomplex(scale.multiply(ApfloatMath.cos(im)), scale.multiply(ApfloatMath.sin(im)));
    }

    @Test
    void agreesWithApfloatsRealFunctionsToThePrecisionAsked() {
        // Euler's formula e^(x+iy) = e^x (cos y + i sin y) (any handbook), with apfloat's exp, cos and sin as the reference
        String[][] points = {{"0", "0"}, {"-0.65", "1.05"}, {"-1.5", "0"}, {"12.5", "-30.7"}, {"-45.123456789", "0.001"},
            {"700.25", "3"}, {"-2000.5", "0.5"}, {"0.000001", "-250"}, {"4000", "0"}, {"3e9", "0.25"}};
        for (String[] z : points) {
            Apcomplex expected = reference(z[0], z[1]);
            Apcomplex actual = ComplexExp.exp(new Apcomplex(new Apfloat(z[0], PRECISION + 30), new Apfloat(z[1], PRECISION + 30)), PRECISION);
            Apfloat error = ApcomplexMath.abs(actual.subtract(expected));
            Apfloat bound = ApcomplexMath.abs(expected).multiply(new Apfloat("1e-" + (PRECISION - 1), PRECISION));
            assertTrue(error.compareTo(bound) <= 0, "e^(" + z[0] + " + " + z[1] + "i): error " + error.precision(3));
        }
    }

    @Test
    void eulersIdentity() {
        // e^(iπ) = -1 (Euler's identity)
        Apcomplex e = ComplexExp.exp(new Apcomplex(Apfloat.ZERO, ApfloatMath.pi(PRECISION + 10)), PRECISION);
        Apfloat tolerance = new Apfloat("1e-" + (PRECISION - 2), PRECISION);
        assertEquals(-1, e.real().intValue());
        assertTrue(ApfloatMath.abs(e.real().add(Apfloat.ONE)).compareTo(tolerance) < 0, "real part " + e.real());
        assertTrue(ApfloatMath.abs(e.imag()).compareTo(tolerance) < 0, "imaginary part " + e.imag());
    }
}
