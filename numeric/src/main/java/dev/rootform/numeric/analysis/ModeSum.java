package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;

/**
 * A real function of t written as Re Σ_r w_r·u^{p_r}·e^{z_r u}, u = t - origin, with complex
 * weights w_r and rates z_r at a fixed working precision, and its derivatives:
 * D^d(u^p e^{zu}) = Σ_{l ≤ min(d,p)} C(d,l)·p!/(p-l)!·u^{p-l}·z^{d-l}·e^{zu} (Leibniz rule).
 * Approximate; built from exact solutions and basis functions with certified root values. The
 * value of a fitted solution y(t) = Σ_components Σ_α Σ_i c_i(α)·u^i·e^{αu} is one such sum.
 *
 * @since 0.3 (public)
 */
public final class ModeSum {
    /** One mode w·u^p·e^{zu}. */
    record Mode(Apcomplex weight, int power, Apcomplex rate) {
    }

    /**
     * Digits of the largest mode's magnitude in {@link #valueAndLargest}: it sizes the agreement floor
     * and the next working precision, never the value.
     */
    static final int SIZE_DIGITS = 12;
    private static final Apfloat SHRINK = new Apfloat("0.999999999", SIZE_DIGITS);

    private final Rational origin;
    private final List<Mode> modes;
    private final long precision;

    private ModeSum(Rational origin, List<Mode> modes, long precision) {
        this.origin = origin;
        this.modes = List.copyOf(modes);
        this.precision = precision;
    }

    /**
     * A fitted differential-equation solution at a working precision of {@code digits} significant
     * digits (root values certified to that precision).
     */
    public static ModeSum of(ExactSolution s, int digits) {
        return of(s, new RootCache(), digits);
    }

    /** The d-th derivative at t, rounded to the working precision. */
    public BigDecimal derivativeAt(int d, BigDecimal t) {
        return Decimals.toBigDecimal(derivative(d, new Apfloat(t, precision)), (int) precision);
    }

    /** The exact solution's components Σ_α Σ_i c_i(α) u^i e^{αu}. */
    static ModeSum of(ExactSolution s, RootCache cache, long precision) {
        return cache.modeSum(s, precision, working -> build(s, cache, working));
    }

    private static ModeSum build(ExactSolution s, RootCache cache, long precision) {
        List<Mode> modes = new ArrayList<>();
        for (Component c : s.components()) {
            Deadline.checkCurrent();
            for (Apcomplex alpha : roots(c.factor().polynomial(), cache, precision)) {
                for (int i = 0; i < c.coefficients().size(); i++) {
                    modes.add(new Mode(polynomialAt(c.coefficients().get(i), alpha, precision), i, alpha));
                }
            }
        }
        return new ModeSum(s.origin(), modes, precision);
    }

    /** y = a + √r·b of a radical solution: the modes of a, and those of b with weights times √r. */
    static ModeSum of(RadicalSolution r, RootCache cache, long precision) {
        return cache.modeSum(r, precision, working -> build(r, cache, working));
    }

    private static ModeSum build(RadicalSolution r, RootCache cache, long precision) {
        List<Mode> modes = new ArrayList<>(of(r.rational(), cache, precision).modes);
        Apfloat root = org.apfloat.ApfloatMath.sqrt(new Apfloat(r.radicand(), precision));
        for (Mode m : of(r.radical(), cache, precision).modes) {
            modes.add(new Mode(m.weight().multiply(root), m.power(), m.rate()));
        }
        return new ModeSum(r.rational().origin(), modes, precision);
    }

    /**
     * One function per free constant of a closed form with origin 0 (general solution, trial form),
     * in the order of its constants; terms with exact coefficients are skipped.
     */
    static List<ModeSum> basis(ClosedForm form, RootCache cache, long precision) {
        Apcomplex one = new Apfloat(1, precision);
        Apcomplex minusI = new Apcomplex(Apfloat.ZERO, new Apfloat(-1, precision));
        List<ModeSum> basis = new ArrayList<>();
        for (Term t : form.terms()) {
            if (t instanceof Term.Exponential e) {
                if (e.coefficient() instanceof Coefficient.Free) {
                    basis.add(single(new Mode(one, e.power(), real(e.rate().toBigDecimal(context(precision)), precision))));
                }
            } else if (t instanceof Term.Oscillating o) {
                Apcomplex z = new Apcomplex(real(o.growth().toBigDecimal(context(precision)), precision).real(),
                        frequency(o.angle(), precision));
                if (o.cosine() instanceof Coefficient.Free) {
                    basis.add(single(new Mode(one, o.power(), z)));
                }
                if (o.sine() instanceof Coefficient.Free) {
                    basis.add(single(new Mode(minusI, o.power(), z)));
                }
            } else if (t instanceof Term.ConjugateSum r) {
                List<Apcomplex> alphas = roots(r.factor(), cache, precision);
                for (int j = 0; j < r.coefficients().size(); j++) {
                    if (r.coefficients().get(j) instanceof Coefficient.Free) {
                        List<Mode> modes = new ArrayList<>();
                        for (Apcomplex alpha : alphas) {
                            modes.add(new Mode(org.apfloat.ApcomplexMath.pow(alpha, j), r.power(), alpha));
                        }
                        basis.add(new ModeSum(Rational.ZERO, modes, precision));
                    }
                }
            } else {
                throw new AssertionError(t);
            }
        }
        return basis;
    }

    /** The angular frequency ω of an oscillating term of a differential equation: a surd or qπ. */
    private static Apfloat frequency(Angle angle, long precision) {
        if (angle instanceof Angle.PiMultiple p) {
            return Decimals.toApfloat(p.multiple(), precision).multiply(org.apfloat.ApfloatMath.pi(precision));
        }
        if (angle instanceof Angle.Value v) {
            return real(v.value().toBigDecimal(context(precision)), precision).real();
        }
        throw new IllegalArgumentException("no angular frequency for " + angle);
    }

    /** The d-th derivative at t. */
    Apfloat derivative(int d, Rational t) {
        return derivative(d, Decimals.toApfloat(t, precision));
    }

    /** The d-th derivative at a point given in the working precision (e.g. a multiple of π). */
    Apfloat derivative(int d, Apfloat t) {
        Apcomplex sum = Apcomplex.ZERO;
        for (Apcomplex term : terms(d, t)) {
            sum = sum.add(term);
        }
        return sum.real();
    }

    /**
     * The value in double precision, for plots: the weights and rates rounded to double once,
     * then Re Σ w·u^p·e^{zu} per point. Approximate: the error is about 1e-16 times the largest
     * mode at t, far below what a picture resolves.
     */
    DoubleUnaryOperator inDoubles() {
        return doubles()::value;
    }

    /** The sum rounded to double, with an estimate of its rounding error per point. */
    DoubleModes doubles() {
        return new DoubleModes(origin, modes);
    }

    /**
     * The value at t and the largest magnitude of one mode there, to {@link #SIZE_DIGITS} digits and
     * never above it (to size cancellation).
     */
    Apfloat[] valueAndLargest(Rational t) {
        Apcomplex sum = Apcomplex.ZERO;
        Apfloat largest = Apfloat.ZERO;
        for (Apcomplex term : terms(0, Decimals.toApfloat(t, precision))) {
            sum = sum.add(term);
            Apfloat size = magnitude(term);
            largest = size.compareTo(largest) > 0 ? size : largest;
        }
        return new Apfloat[] {sum.real(), largest};
    }

    /**
     * |z| to {@link #SIZE_DIGITS} digits and rounded down: the parts cut to that many digits, their
     * modulus taken there and shrunk by 10^-9 relative, so it never exceeds |z| (the agreement floor
     * of {@link WorkingPrecision#agree} that it sets is never looser than with the full modulus).
     */
    private static Apfloat magnitude(Apcomplex z) {
        Apcomplex cut = new Apcomplex(z.real().precision(SIZE_DIGITS), z.imag().precision(SIZE_DIGITS));
        return org.apfloat.ApcomplexMath.abs(cut).multiply(SHRINK);
    }

    /** w·D^d(u^p e^{zu}) for every mode. */
    private List<Apcomplex> terms(int d, Apfloat t) {
        Apcomplex u = t.subtract(Decimals.toApfloat(origin, precision));
        List<Apcomplex> terms = new ArrayList<>(modes.size());
        Apcomplex rate = null;
        Apcomplex e = null;
        for (Mode m : modes) {
            Deadline.checkCurrent();
            if (m.rate() != rate) { // the modes u^i e^{αu} of one root share its rate object: one exponential
                rate = m.rate();
                e = ComplexExp.exp(rate.multiply(u), precision);
            }
            Apcomplex inner = Apcomplex.ZERO;
            Apfloat binomial = new Apfloat(1, precision);
            Apfloat falling = new Apfloat(1, precision);
            for (int l = 0; l <= Math.min(d, m.power()); l++) {
                inner = inner.add(binomial.multiply(falling).multiply(pow(u, m.power() - l)).multiply(pow(m.rate(), d - l)));
                binomial = binomial.multiply(new Apfloat(d - l, precision)).divide(new Apfloat(l + 1, precision));
                falling = falling.multiply(new Apfloat(m.power() - l, precision));
            }
            terms.add(m.weight().multiply(inner).multiply(e));
        }
        return terms;
    }

    private static ModeSum single(Mode m) {
        return new ModeSum(Rational.ZERO, List.of(m), m.weight().precision());
    }

    /** The one mode w·u^p·e^{zu}, u = t - origin. */
    static ModeSum of(Rational origin, Apcomplex weight, int power, Apcomplex rate, long precision) {
        return new ModeSum(origin, List.of(new Mode(weight, power, rate)), precision);
    }

    private static Apcomplex pow(Apcomplex z, int n) {
        return n == 0 ? new Apfloat(1, z.precision()) : org.apfloat.ApcomplexMath.pow(z, n);
    }

    /** The roots of f at the working precision: exact for a linear f, else from certified enclosures. */
    static List<Apcomplex> roots(RationalPolynomial f, RootCache cache, long precision) {
        if (f.degree() == 1) {
            return List.of(Decimals.toApfloat(f.coefficient(0).negate(), precision));
        }
        return cache.roots(f, (int) precision).stream()
                .map(r -> new Apcomplex(new Apfloat(r.re(), precision), new Apfloat(r.im(), precision))).toList();
    }

    /** c(α) by Horner's rule at the working precision. */
    static Apcomplex polynomialAt(RationalPolynomial c, Apcomplex alpha, long precision) {
        Apcomplex v = Apcomplex.ZERO;
        for (int j = c.degree(); j >= 0; j--) {
            v = v.multiply(alpha).add(Decimals.toApfloat(c.coefficient(j), precision));
        }
        return v;
    }

    private static Apcomplex real(java.math.BigDecimal x, long precision) {
        return new Apfloat(x, precision);
    }

    private static java.math.MathContext context(long precision) {
        return new java.math.MathContext((int) precision);
    }
}
