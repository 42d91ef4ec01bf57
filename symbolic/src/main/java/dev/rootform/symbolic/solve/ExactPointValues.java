package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Exact values of derivatives of closed-form terms of a differential equation (origin 0) at a
 * condition's point, in a real quadratic field Q(√r), where they are exact:
 * D^d(v^p·e^{zv}) = Σ_{l ≤ min(d,p)} C(d,l)·p!/(p−l)!·v^{p−l}·z^{d−l}·e^{zv}, which is exact when
 * every factor is: e^{zv} at v = 0, or for z = iω with rational ω at v = qπ when cos(ωqπ) and
 * sin(ωqπ) are surds ({@link CosineTable}); v^{p−l} at a rational v, or at qπ only to the power 0.
 * A conjugate sum is exact at v = 0 (a trace in Q(α)). Anything else involves e^{α·t} with algebraic
 * α·t ≠ 0 (transcendental, by Lindemann–Weierstrass) or a power of π, or a cosine outside the table,
 * and is reported as not exact (empty).
 */
final class ExactPointValues {
    /** a + b·i with surd parts (in one quadratic field, or a product fails). */
    private record Complex(Surd re, Surd im) {
        static final Complex ZERO = new Complex(Surd.of(Rational.ZERO), Surd.of(Rational.ZERO));
        static final Complex ONE = new Complex(Surd.of(Rational.ONE), Surd.of(Rational.ZERO));

        Complex add(Complex o) {
            return new Complex(re.add(o.re), im.add(o.im));
        }

        Complex multiply(Complex o) {
            return new Complex(re.multiply(o.re).add(im.multiply(o.im).negate()), re.multiply(o.im).add(im.multiply(o.re)));
        }

        Complex multiply(Rational f) {
            return new Complex(re.multiply(f), im.multiply(f));
        }

        Complex pow(int n) {
            Complex r = ONE;
            for (int i = 0; i < n; i++) {
                r = r.multiply(this);
            }
            return r;
        }
    }

    private ExactPointValues() {
    }

    /**
     * D^d of the term at the point of {@code at} (its derivative order is ignored), with every free
     * coefficient taken as 0 except {@code unit} (1); {@code unit} &lt; 0 takes the exact coefficients
     * as they are and free ones as 0. Empty when the value is not exact in one real quadratic field.
     */
    static Optional<Surd> derivative(Term term, int unit, int d, Condition at) {
        try {
            List<Surd> c = coefficients(term, unit);
            if (c.stream().allMatch(Surd::isZero)) {
                return Optional.of(Surd.of(Rational.ZERO));
            }
            if (term instanceof Term.Exponential e) {
                return exponential(new Complex(e.rate(), Surd.of(Rational.ZERO)), e.power(), d, at).map(v -> c.get(0).multiply(v.re()));
            }
            if (term instanceof Term.Oscillating o) {
                return oscillating(o, c, d, at);
            }
            if (term instanceof Term.ConjugateSum s) {
                return conjugateSum(s, c, d, at);
            }
            throw new AssertionError(term);
        } catch (ArithmeticException secondRadicand) {
            return Optional.empty();
        }
    }

    /** The coefficients as surds: exact ones as they are (or 0 when a unit is chosen), free ones 0 or the unit 1. */
    private static List<Surd> coefficients(Term term, int unit) {
        List<Surd> out = new ArrayList<>();
        List<Coefficient> cs = term.coefficients();
        for (int j = 0; j < cs.size(); j++) {
            Coefficient c = cs.get(j);
            if (c instanceof Coefficient.Exact e) {
                out.add(unit < 0 ? e.value() : Surd.of(Rational.ZERO));
            } else {
                out.add(Surd.of(j == unit ? Rational.ONE : Rational.ZERO));
            }
        }
        return out;
    }

    /** cos·Re + sin·Re of (A − iB)·D^d(v^p e^{(a+iω)v}). */
    private static Optional<Surd> oscillating(Term.Oscillating o, List<Surd> c, int d, Condition at) {
        if (!(o.angle() instanceof Angle.Value omega)) {
            return Optional.empty();
        }
        Complex weight = new Complex(c.get(0), c.get(1).negate());
        return exponential(new Complex(o.growth(), omega.value()), o.power(), d, at).map(v -> weight.multiply(v).re());
    }

    /** D^d(v^p·e^{zv}) at the point, exactly, or empty. */
    private static Optional<Complex> exponential(Complex z, int p, int d, Condition at) {
        Optional<Complex> e = exp(z, at);
        if (e.isEmpty()) {
            return Optional.empty();
        }
        Complex sum = Complex.ZERO;
        Rational binomial = Rational.ONE;
        Rational falling = Rational.ONE;
        for (int l = 0; l <= Math.min(d, p); l++) {
            Complex zPower = z.pow(d - l);
            boolean vanishes = zPower.re().isZero() && zPower.im().isZero();
            if (!vanishes) {
                Optional<Rational> vPower = power(at, p - l);
                if (vPower.isEmpty()) {
                    return Optional.empty();
                }
                sum = sum.add(zPower.multiply(binomial.multiply(falling).multiply(vPower.get())));
            }
            binomial = binomial.multiply(Rational.of(d - l, l + 1));
            falling = falling.multiply(p - l);
        }
        return Optional.of(sum.multiply(e.get()));
    }

    /** e^{zv} at the point, exactly: 1 at v = 0 or z = 0; cos + i·sin of ωqπ for z = iω, rational ω, v = qπ. */
    private static Optional<Complex> exp(Complex z, Condition at) {
        if (at.at().isZero() || (z.re().isZero() && z.im().isZero())) {
            return Optional.of(Complex.ONE);
        }
        if (!at.atTimesPi() || !z.re().isZero() || !z.im().isRational()) {
            return Optional.empty();
        }
        Rational q = z.im().rational().multiply(at.at());
        Optional<CosineTable.Value> cos = CosineTable.cosPi(q);
        Optional<CosineTable.Value> sin = CosineTable.cosPi(q.subtract(Rational.of(1, 2)));
        if (cos.isEmpty() || sin.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Complex(surd(cos.get()), surd(sin.get())));
    }

    /** v^k at the point: a rational power of a rational point, or 1 for k = 0; empty for (qπ)^k, k &gt; 0, q ≠ 0. */
    private static Optional<Rational> power(Condition at, int k) {
        if (k == 0) {
            return Optional.of(Rational.ONE);
        }
        if (at.atTimesPi() && !at.at().isZero()) {
            return Optional.empty();
        }
        Rational r = Rational.ONE;
        for (int i = 0; i < k; i++) {
            r = r.multiply(at.at());
        }
        return Optional.of(r);
    }

    /** At v = 0: Σ_α c(α)·C(d,p)·p!·α^{d−p} = C(d,p)·p!·Tr(c(x)·x^{d−p}), c = c0 + √r·c1; elsewhere empty. */
    private static Optional<Surd> conjugateSum(Term.ConjugateSum s, List<Surd> c, int d, Condition at) {
        if (!at.at().isZero()) {
            return Optional.empty();
        }
        int p = s.power();
        if (d < p) {
            return Optional.of(Surd.of(Rational.ZERO));
        }
        NumberField k = new NumberField(s.factor());
        List<Rational> rational = new ArrayList<>();
        List<Rational> radical = new ArrayList<>();
        Rational radicand = Rational.ONE;
        for (Surd cj : c) {
            rational.add(cj.rational());
            radical.add(cj.coefficient());
            radicand = cj.isRational() ? radicand : Rational.of(cj.radicand());
        }
        RationalPolynomial shift = k.pow(k.generator(), d - p);
        Rational factor = Rational.ONE;
        for (int i = 0; i < p; i++) {
            factor = factor.multiply(d - i);
        }
        Rational a = k.trace(k.multiply(RationalPolynomial.of(rational), shift)).multiply(factor);
        Rational b = k.trace(k.multiply(RationalPolynomial.of(radical), shift)).multiply(factor);
        return Optional.of(Surd.of(a, b, radicand));
    }

    private static Surd surd(CosineTable.Value v) {
        return Surd.of(v.rational(), v.radical(), Rational.of(v.radicand()));
    }
}
