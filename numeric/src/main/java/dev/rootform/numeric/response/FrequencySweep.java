package dev.rootform.numeric.response;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.transfer.RationalFunctions;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The frequency response of a rational H at a list of frequencies. The point is x = jω (s) or
 * x = e^{jω} (z). When x is a Gaussian rational (jq in s; ±1, ±j in z) H(x) is computed exactly
 * and its magnitude is the surd √(|N|²/|D|²); a zero or pole on the axis or circle is decided
 * exactly (in z at e^{jqπ} by the cyclotomic factor of its order). Everything else is evaluated in
 * apfloat at the requested digits plus {@link #GUARD_DIGITS}, with certified root values for the
 * phase sum arg(lc) + Σ arg(x − zero) − Σ arg(x − pole).
 *
 * @since 0.3
 */
public final class FrequencySweep {
    /** Digits carried beyond the requested ones. */
    static final int GUARD_DIGITS = 15;

    private final RationalFunction h;
    private final boolean continuous;
    private final int digits;
    private final long precision;
    private final List<Root> roots;

    /** A root value with its multiplicity and sign in the phase sum (+1 zero, −1 pole). */
    private record Root(Apcomplex value, int weight) {
    }

    /**
     * @param h the transfer function in lowest terms
     * @param continuous true for H(s), false for H(z)
     * @param digits significant digits of the decimals
     */
    public FrequencySweep(RationalFunction h, boolean continuous, int digits) {
        this.h = h;
        this.continuous = continuous;
        this.digits = digits;
        this.precision = digits + GUARD_DIGITS;
        List<Root> all = new ArrayList<>();
        addRoots(all, RationalFunctions.zeros(h), 1);
        addRoots(all, RationalFunctions.poles(h), -1);
        this.roots = List.copyOf(all);
    }

    /** The response at each frequency, in the order given. */
    public List<FrequencyPoint> at(List<Frequency> frequencies) {
        return frequencies.stream().map(this::at).toList();
    }

    private FrequencyPoint at(Frequency w) {
        Deadline.checkCurrent();
        Optional<Rational[]> exactPoint = gaussianPoint(w);
        Optional<FrequencyPoint> onRoot = exactPoint.isPresent() ? exactRoot(w, exactPoint.get()) : cyclotomicRoot(w);
        if (onRoot.isPresent()) {
            return onRoot.get();
        }
        Apcomplex x = point(w);
        Apfloat magnitude = ApcomplexMath.abs(evaluate(h.numerator(), x)).divide(ApcomplexMath.abs(evaluate(h.denominator(), x)));
        Apfloat decibels = ApfloatMath.log(magnitude).divide(ApfloatMath.log(new Apfloat(10, precision))).multiply(new Apfloat(20, precision));
        Apfloat phase = phaseDegrees(x);
        Optional<Surd> exactMagnitude = Optional.empty();
        Optional<Rational> exactDecibels = Optional.empty();
        Optional<Rational> exactPhase = Optional.empty();
        if (exactPoint.isPresent()) {
            Rational[] value = divide(evaluate(h.numerator(), exactPoint.get()), evaluate(h.denominator(), exactPoint.get()));
            Rational squared = value[0].multiply(value[0]).add(value[1].multiply(value[1]));
            exactMagnitude = Optional.of(Surd.sqrt(squared));
            exactDecibels = powerOfTen(squared).map(k -> Rational.of(10L * k));
            exactPhase = principal(value).map(p -> unwrapped(p, phase));
        }
        return new FrequencyPoint(w, FrequencyPoint.Kind.FINITE, exactMagnitude, Optional.of(round(magnitude)), exactDecibels,
                Optional.of(exactDecibels.map(d -> d.toBigDecimal(new MathContext(digits))).orElse(round(decibels))),
                exactPhase, Optional.of(exactPhase.map(p -> p.toBigDecimal(new MathContext(digits))).orElse(round(phase))));
    }

    /** jq in s (q rational), ±1 or ±j in z (e^{jqπ} with 2q an integer, or ω = 0); empty otherwise. */
    private Optional<Rational[]> gaussianPoint(Frequency w) {
        if (continuous) {
            return w.timesPi() && !w.value().isZero() ? Optional.empty()
                    : Optional.of(new Rational[] {Rational.ZERO, w.value()});
        }
        if (w.value().isZero()) {
            return Optional.of(new Rational[] {Rational.ONE, Rational.ZERO});
        }
        if (!w.timesPi() || !w.value().multiply(2).isInteger()) {
            return Optional.empty();
        }
        int quarter = w.value().multiply(2).toBigInteger().mod(BigInteger.valueOf(4)).intValueExact();
        int[][] unit = {{1, 0}, {0, 1}, {-1, 0}, {0, -1}};
        return Optional.of(new Rational[] {Rational.of(unit[quarter][0]), Rational.of(unit[quarter][1])});
    }

    /** A zero or pole exactly at a Gaussian rational point. */
    private Optional<FrequencyPoint> exactRoot(Frequency w, Rational[] x) {
        if (isZero(evaluate(h.denominator(), x))) {
            return Optional.of(infinite(w));
        }
        return isZero(evaluate(h.numerator(), x)) ? Optional.of(zero(w)) : Optional.empty();
    }

    /** In z at e^{jqπ}: a zero or pole there exactly when the cyclotomic polynomial of its order divides N or D. */
    private Optional<FrequencyPoint> cyclotomicRoot(Frequency w) {
        if (continuous || !w.timesPi()) {
            return Optional.empty();
        }
        RationalPolynomial phi = Cyclotomic.polynomial(Cyclotomic.orderOfPiMultiple(w.value()));
        if (h.denominator().mod(phi).isZero()) {
            return Optional.of(infinite(w));
        }
        return h.numerator().mod(phi).isZero() ? Optional.of(zero(w)) : Optional.empty();
    }

    private FrequencyPoint infinite(Frequency w) {
        return new FrequencyPoint(w, FrequencyPoint.Kind.POLE, Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), Optional.empty(), Optional.empty());
    }

    private static FrequencyPoint zero(Frequency w) {
        return new FrequencyPoint(w, FrequencyPoint.Kind.ZERO, Optional.of(Surd.of(Rational.ZERO)), Optional.of(BigDecimal.ZERO),
                Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty());
    }

    /** x = jω or e^{jω} in the working precision. */
    private Apcomplex point(Frequency w) {
        Apfloat omega = new Apfloat(w.value().toBigDecimal(new MathContext((int) precision)), precision);
        if (w.timesPi()) {
            omega = omega.multiply(ApfloatMath.pi(precision));
        }
        return continuous ? new Apcomplex(Apfloat.ZERO, omega) : new Apcomplex(ApfloatMath.cos(omega), ApfloatMath.sin(omega));
    }

    /** arg(lc) + Σ_zeros arg(x − z) − Σ_poles arg(x − p), in degrees. */
    private Apfloat phaseDegrees(Apcomplex x) {
        Apfloat pi = ApfloatMath.pi(precision);
        Apfloat sum = h.numerator().leadingCoefficient().signum() < 0 ? pi : Apfloat.ZERO;
        for (Root r : roots) {
            Apcomplex d = x.subtract(r.value());
            sum = sum.add(ApfloatMath.atan2(d.imag(), d.real()).multiply(new Apfloat(r.weight(), precision)));
        }
        return sum.multiply(new Apfloat(180, precision)).divide(pi);
    }

    private void addRoots(List<Root> out, List<Factor> factors, int sign) {
        for (Factor f : factors) {
            for (Enclosure e : new RootFinder((int) precision).roots(f.polynomial())) {
                out.add(new Root(new Apcomplex(new Apfloat(e.re(), precision), new Apfloat(e.im(), precision)),
                        sign * f.multiplicity()));
            }
        }
    }

    private Apcomplex evaluate(RationalPolynomial p, Apcomplex x) {
        Apcomplex v = Apcomplex.ZERO;
        for (int i = p.degree(); i >= 0; i--) {
            v = v.multiply(x).add(new Apfloat(p.coefficient(i).toBigDecimal(new MathContext((int) precision)), precision));
        }
        return v;
    }

    /** p(a + bi) exactly, as {re, im}. */
    private static Rational[] evaluate(RationalPolynomial p, Rational[] x) {
        Rational re = Rational.ZERO;
        Rational im = Rational.ZERO;
        for (int i = p.degree(); i >= 0; i--) {
            Rational r = re.multiply(x[0]).subtract(im.multiply(x[1])).add(p.coefficient(i));
            im = re.multiply(x[1]).add(im.multiply(x[0]));
            re = r;
        }
        return new Rational[] {re, im};
    }

    private static Rational[] divide(Rational[] a, Rational[] b) {
        Rational norm = b[0].multiply(b[0]).add(b[1].multiply(b[1]));
        return new Rational[] {a[0].multiply(b[0]).add(a[1].multiply(b[1])).divide(norm),
            a[1].multiply(b[0]).subtract(a[0].multiply(b[1])).divide(norm)};
    }

    private static boolean isZero(Rational[] z) {
        return z[0].isZero() && z[1].isZero();
    }

    /** The principal argument in degrees when it is a multiple of 45° (the point on an axis or a diagonal). */
    private static Optional<Rational> principal(Rational[] z) {
        int re = z[0].signum();
        int im = z[1].signum();
        if (im == 0) {
            return Optional.of(Rational.of(re > 0 ? 0 : 180));
        }
        if (re == 0) {
            return Optional.of(Rational.of(90L * im));
        }
        if (z[0].abs().equals(z[1].abs())) {
            return Optional.of(Rational.of(im * (re > 0 ? 45L : 135L)));
        }
        return Optional.empty();
    }

    /** The exact principal angle moved by the multiple of 360° that brings it to the unwrapped numeric phase. */
    private static Rational unwrapped(Rational principal, Apfloat phase) {
        long turns = Math.round((phase.doubleValue() - principal.doubleValue()) / 360.0);
        return principal.add(Rational.of(360L * turns));
    }

    /** k with q = 10^k, when there is one. */
    private static Optional<Long> powerOfTen(Rational q) {
        if (q.numerator().equals(BigInteger.ONE)) {
            return exponentOfTen(q.denominator()).map(k -> -k);
        }
        return q.denominator().equals(BigInteger.ONE) ? exponentOfTen(q.numerator()) : Optional.empty();
    }

    private static Optional<Long> exponentOfTen(BigInteger n) {
        long k = 0;
        BigInteger rest = n;
        while (rest.mod(BigInteger.TEN).signum() == 0) {
            rest = rest.divide(BigInteger.TEN);
            k++;
        }
        return rest.equals(BigInteger.ONE) ? Optional.of(k) : Optional.empty();
    }

    private BigDecimal round(Apfloat a) {
        return new BigDecimal(a.toString(true)).round(new MathContext(digits));
    }
}
