package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * A difference-equation solution x[n] = Re Σ_α Σ_i c_i(α)·n^i·α^n (one mode per root α of each
 * component's factor) at a fixed working precision: the roots from certified enclosures (exact
 * decimals for rational roots), the weights c_i(α) and α^n by binary powering in apfloat. With p
 * digits, α^n carries a relative error of about (n·10^-p + 2·log2(n)·10^-p), so about log10(n)
 * digits are lost; callers add them to the working precision and confirm the value by two
 * precisions agreeing ({@link WorkingPrecision}). Approximate.
 */
final class SequenceSum {
    /** One mode Σ_i weights[i]·n^i·base^n. */
    private record Mode(List<Apcomplex> weights, Apcomplex base) {
    }

    private final List<Mode> modes;
    private final long precision;

    private SequenceSum(List<Mode> modes, long precision) {
        this.modes = List.copyOf(modes);
        this.precision = precision;
    }

    static SequenceSum of(ExactSolution s, RootCache cache, long precision) {
        List<Mode> modes = new ArrayList<>();
        for (Component c : s.components()) {
            Deadline.checkCurrent();
            for (Apcomplex alpha : ModeSum.roots(c.factor().polynomial(), cache, precision)) {
                List<Apcomplex> weights = new ArrayList<>();
                for (RationalPolynomial ci : c.coefficients()) {
                    weights.add(ModeSum.polynomialAt(ci, alpha, precision));
                }
                modes.add(new Mode(weights, alpha));
            }
        }
        return new SequenceSum(modes, precision);
    }

    /** {x[n], the largest magnitude of one mode at n} (the second sizes cancellation). */
    Apfloat[] valueAndLargest(long n) {
        Apfloat nn = new Apfloat(n, precision);
        Apcomplex sum = Apcomplex.ZERO;
        Apfloat largest = Apfloat.ZERO;
        for (Mode m : modes) {
            Deadline.checkCurrent();
            Apcomplex weight = Apcomplex.ZERO;
            for (int i = m.weights().size() - 1; i >= 0; i--) {
                weight = weight.multiply(nn).add(m.weights().get(i));
            }
            Apcomplex power = m.base().imag().signum() == 0 ? ApfloatMath.pow(m.base().real(), n) : ApcomplexMath.pow(m.base(), n);
            Apcomplex term = weight.multiply(power);
            sum = sum.add(term);
            Apfloat size = ApcomplexMath.abs(term);
            largest = size.compareTo(largest) > 0 ? size : largest;
        }
        return new Apfloat[] {sum.real(), largest};
    }

    /**
     * Decimal digits of the exact value x[n] as a fraction, estimated: per step, log10 of the largest
     * root modulus (at least 1) plus twice log10 of the common denominator of the factor's
     * coefficients (numerator and denominator of α^n both grow by it), summed over the components.
     */
    static double exactDigits(ExactSolution s, long n, RootCache cache) {
        double perStep = 0;
        for (Component c : s.components()) {
            RationalPolynomial f = c.factor().polynomial();
            java.math.BigInteger den = java.math.BigInteger.ONE;
            for (Rational q : f.coefficients()) {
                den = den.divide(den.gcd(q.denominator())).multiply(q.denominator());
            }
            double largest = 1;
            for (Enclosure z : cache.roots(f, 20)) {
                largest = Math.max(largest, Math.hypot(z.re().doubleValue(), z.im().doubleValue()));
            }
            perStep += Math.log10(largest) + 2 * Math.log10(den.doubleValue());
        }
        return Math.abs((double) n) * perStep;
    }
}
