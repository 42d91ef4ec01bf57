package dev.rootform.numeric.analysis;

import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * A truncated Taylor series f(x + h) = Σ_{k ≤ K} c_k h^k at one point, in complex apfloat
 * arithmetic: the value and the derivatives c_k·k! of an expression, carried through sums,
 * products, quotients, exp and log by the usual recurrences of automatic differentiation (e.g.
 * A. Griewank and A. Walther, Evaluating Derivatives, SIAM, 2008, ch. 13 — chapter from memory).
 */
final class Jet {
    private static final Apfloat HALF = new Apfloat("0.5");
    /** Integer powers up to this size are multiplied out. */
    private static final Apfloat LIMIT = new Apfloat(100_000);

    private final Apcomplex[] c;
    private final long precision;

    private Jet(Apcomplex[] c, long precision) {
        this.c = c;
        this.precision = precision;
    }

    static Jet constant(Apcomplex value, int order, long precision) {
        Apcomplex[] c = zeros(order, precision);
        c[0] = value;
        return new Jet(c, precision);
    }

    /** x + h at the point x. */
    static Jet variable(Apfloat x, int order, long precision) {
        Jet j = constant(x, order, precision);
        if (order > 0) {
            j.c[1] = new Apfloat(1, precision);
        }
        return j;
    }

    int order() {
        return c.length - 1;
    }

    Apcomplex value() {
        return c[0];
    }

    /** The k-th derivative f^{(k)}(x) = k!·c_k. */
    Apcomplex derivative(int k) {
        Apcomplex d = c[k];
        for (int i = 2; i <= k; i++) {
            d = d.multiply(new Apfloat(i, precision));
        }
        return d;
    }

    /** True when every derivative is exactly zero (a constant). */
    boolean isConstant() {
        for (int k = 1; k < c.length; k++) {
            if (!c[k].equals(Apcomplex.ZERO)) {
                return false;
            }
        }
        return true;
    }

    Jet add(Jet o) {
        Apcomplex[] r = new Apcomplex[c.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = c[k].add(o.c[k]);
        }
        return new Jet(r, precision);
    }

    Jet negate() {
        Apcomplex[] r = new Apcomplex[c.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = c[k].negate();
        }
        return new Jet(r, precision);
    }

    Jet subtract(Jet o) {
        return add(o.negate());
    }

    Jet scale(Apcomplex s) {
        Apcomplex[] r = new Apcomplex[c.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = c[k].multiply(s);
        }
        return new Jet(r, precision);
    }

    Jet multiply(Jet o) {
        Apcomplex[] r = zeros(order(), precision);
        for (int i = 0; i < c.length; i++) {
            for (int j = 0; i + j < c.length; j++) {
                r[i + j] = r[i + j].add(c[i].multiply(o.c[j]));
            }
        }
        return new Jet(r, precision);
    }

    /** this/o: h_k = (f_k − Σ_{j≥1} g_j h_{k−j})/g_0. @throws ArithmeticException if o(x) = 0 */
    Jet divide(Jet o) {
        if (o.c[0].equals(Apcomplex.ZERO)) {
            throw new ArithmeticException("division by zero");
        }
        Apcomplex[] h = new Apcomplex[c.length];
        for (int k = 0; k < c.length; k++) {
            Apcomplex s = c[k];
            for (int j = 1; j <= k; j++) {
                s = s.subtract(o.c[j].multiply(h[k - j]));
            }
            h[k] = s.divide(o.c[0]);
        }
        return new Jet(h, precision);
    }

    /** The value when this is a constant small integer (an exponent such as n at an index), else empty. */
    java.util.OptionalLong integerValue() {
        if (!isConstant() || c[0].imag().signum() != 0) {
            return java.util.OptionalLong.empty();
        }
        Apfloat v = c[0].real();
        Apfloat rounded = v.signum() >= 0 ? ApfloatMath.floor(v.add(HALF)) : ApfloatMath.ceil(v.subtract(HALF));
        return v.equals(rounded) && rounded.compareTo(LIMIT) <= 0 && rounded.compareTo(LIMIT.negate()) >= 0
                ? java.util.OptionalLong.of(rounded.longValue()) : java.util.OptionalLong.empty();
    }

    /** True when every coefficient is real. */
    boolean isReal() {
        for (Apcomplex x : c) {
            if (x.imag().signum() != 0) {
                return false;
            }
        }
        return true;
    }

    /** e^f: e_0 = e^{f_0}, e_k = (1/k)·Σ_{j=1..k} j·f_j·e_{k−j}. */
    Jet exp() {
        Apcomplex[] e = new Apcomplex[c.length];
        e[0] = ComplexExp.exp(c[0], precision);
        for (int k = 1; k < c.length; k++) {
            Apcomplex s = Apcomplex.ZERO;
            for (int j = 1; j <= k; j++) {
                s = s.add(c[j].multiply(e[k - j]).multiply(new Apfloat(j, precision)));
            }
            e[k] = s.divide(new Apfloat(k, precision));
        }
        return new Jet(e, precision);
    }

    /** log f (principal branch): l_0 = log f_0, l_k = (f_k − (1/k)·Σ_{j=1..k−1} j·l_j·f_{k−j})/f_0. */
    Jet log() {
        if (c[0].equals(Apcomplex.ZERO)) {
            throw new ArithmeticException("logarithm of zero");
        }
        Apcomplex[] l = new Apcomplex[c.length];
        l[0] = c[0].imag().signum() == 0 && c[0].real().signum() > 0 ? ApfloatMath.log(c[0].real()) : ApcomplexMath.log(c[0]);
        for (int k = 1; k < c.length; k++) {
            Apcomplex s = Apcomplex.ZERO;
            for (int j = 1; j < k; j++) {
                s = s.add(l[j].multiply(c[k - j]).multiply(new Apfloat(j, precision)));
            }
            l[k] = c[k].subtract(s.divide(new Apfloat(k, precision))).divide(c[0]);
        }
        return new Jet(l, precision);
    }

    /**
     * {cos f, sin f} of a real series: C_0 = cos f_0, S_0 = sin f_0, C_k = −(1/k)·Σ j·f_j·S_{k−j},
     * S_k = (1/k)·Σ j·f_j·C_{k−j}.
     */
    Jet[] cosSin() {
        Apcomplex[] cs = new Apcomplex[c.length];
        Apcomplex[] sn = new Apcomplex[c.length];
        Apcomplex unit = ComplexExp.exp(new Apcomplex(Apfloat.ZERO, c[0].real()), precision);
        cs[0] = unit.real();
        sn[0] = unit.imag();
        for (int k = 1; k < c.length; k++) {
            Apcomplex a = Apcomplex.ZERO;
            Apcomplex b = Apcomplex.ZERO;
            for (int j = 1; j <= k; j++) {
                Apfloat weight = new Apfloat(j, precision);
                a = a.add(c[j].multiply(sn[k - j]).multiply(weight));
                b = b.add(c[j].multiply(cs[k - j]).multiply(weight));
            }
            Apfloat divisor = new Apfloat(k, precision);
            cs[k] = a.negate().divide(divisor);
            sn[k] = b.divide(divisor);
        }
        return new Jet[] {new Jet(cs, precision), new Jet(sn, precision)};
    }

    /** this^k for an integer k, by repeated squaring (k &lt; 0 through 1/this). */
    Jet pow(long k) {
        Jet base = k < 0 ? constant(new Apfloat(1, precision), order(), precision).divide(this) : this;
        Jet result = constant(new Apfloat(1, precision), order(), precision);
        for (long e = Math.abs(k); e > 0; e >>= 1) {
            if ((e & 1) == 1) {
                result = result.multiply(base);
            }
            if (e > 1) {
                base = base.multiply(base);
            }
        }
        return result;
    }

    private static Apcomplex[] zeros(int order, long precision) {
        Apcomplex[] c = new Apcomplex[order + 1];
        java.util.Arrays.fill(c, Apcomplex.ZERO);
        return c;
    }
}
