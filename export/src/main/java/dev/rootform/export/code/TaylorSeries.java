package dev.rootform.export.code;

import dev.rootform.export.Wave;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.solve.ExactSolution;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;

/**
 * The Taylor series of a differential solution at t0 that generated code sums near t0, where the
 * modes cancel: radius h = 2^⌊log2(1/(2R))⌋ with R the largest |growth + i·frequency| of the waves,
 * so every mode's series converges there like Σ (1/2)^k/k!, and {@link #EXTRA_DEGREE} terms past the
 * largest power of v leave a remainder below 10^-40 of the modes' sizes. The coefficients are scaled,
 * b_d = y^(d)(t0)·h^d/d!, so that they stay in double range whatever R is. They are exact rationals
 * rounded once when the solution is exact, else computed term by term at {@link WaveBuilder#DIGITS}
 * digits from the closed form (constants fixed numerically).
 */
final class TaylorSeries {
    /** Terms of the series beyond the largest power v^p of a term. */
    static final int EXTRA_DEGREE = 30;

    /** The scaled coefficients and the radius; empty when every wave is constant in v (R = 0). */
    record Series(List<Double> coefficients, double radius) {
    }

    private TaylorSeries() {
    }

    static Optional<Series> of(ClosedForm form, Optional<ExactSolution> exact, List<Wave> waves) {
        double rate = waves.stream().filter(w -> w.amplitude() != 0.0)
                .mapToDouble(w -> Math.hypot(w.growth(), w.frequency())).max().orElse(0.0);
        if (rate == 0.0) {
            return Optional.empty();
        }
        int exponent = Math.getExponent(1 / (2 * rate));
        int degree = EXTRA_DEGREE + form.terms().stream().mapToInt(Term::power).max().orElse(0);
        List<Double> coefficients = exact.isPresent() ? exactCoefficients(exact.get(), degree, exponent)
                : fromTerms(form, degree, exponent);
        return Optional.of(new Series(coefficients, Math.scalb(1.0, exponent)));
    }

    /** b_d = y^(d)(t0)·2^(e·d)/d!, exact, rounded once. */
    private static List<Double> exactCoefficients(ExactSolution s, int degree, int exponent) {
        List<Double> out = new ArrayList<>();
        Rational factorial = Rational.ONE;
        Rational h = exponent >= 0 ? Rational.of(BigInteger.ONE.shiftLeft(exponent))
                : Rational.of(BigInteger.ONE, BigInteger.ONE.shiftLeft(-exponent));
        Rational power = Rational.ONE;
        for (int d = 0; d <= degree; d++) {
            if (d > 0) {
                factorial = factorial.multiply(d);
                power = power.multiply(h);
            }
            out.add(s.derivativeAtOrigin(d).multiply(power).divide(factorial).toBigDecimal(new MathContext(40)).doubleValue());
        }
        return out;
    }

    /** Σ over the terms of their series c·v^p·z^k/k! (real parts), at {@link WaveBuilder#DIGITS} digits, scaled by h^d. */
    private static List<Double> fromTerms(ClosedForm form, int degree, int exponent) {
        long precision = WaveBuilder.DIGITS + 10;
        Apfloat h = new Apfloat(new BigDecimal(Math.scalb(1.0, exponent)), precision);
        Apcomplex[] sum = new Apcomplex[degree + 1];
        java.util.Arrays.fill(sum, Apcomplex.ZERO);
        for (Term t : form.terms()) {
            if (t instanceof Term.Exponential e) {
                add(sum, new Apcomplex(WaveBuilder.exact(e.coefficient())), new Apcomplex(WaveBuilder.surd(e.rate())), e.power(), h);
            } else if (t instanceof Term.Oscillating o) {
                Apcomplex weight = new Apcomplex(WaveBuilder.exact(o.cosine()), WaveBuilder.exact(o.sine()).negate());
                add(sum, weight, new Apcomplex(WaveBuilder.surd(o.growth()), WaveBuilder.angle(o.angle())), o.power(), h);
            } else if (t instanceof Term.ConjugateSum r) {
                for (Enclosure z : new RootFinder(WaveBuilder.DIGITS).roots(r.factor())) {
                    Apcomplex alpha = new Apcomplex(new Apfloat(z.re(), precision), new Apfloat(z.im(), precision));
                    add(sum, WaveBuilder.value(r, alpha), alpha, r.power(), h);
                }
            } else {
                throw new AssertionError(t);
            }
        }
        List<Double> out = new ArrayList<>();
        for (int d = 0; d <= degree; d++) {
            out.add(new BigDecimal(sum[d].real().toString(false)).doubleValue());
        }
        return out;
    }

    /** Adds w·v^p·e^{zv} = Σ_k w·h^p·(zh)^k/k!·s^{p+k} (v = h·s) to the scaled coefficients. */
    private static void add(Apcomplex[] sum, Apcomplex weight, Apcomplex z, int power, Apfloat h) {
        long precision = h.precision();
        Apcomplex term = new Apcomplex(weight.real().precision(precision), weight.imag().precision(precision));
        for (int p = 0; p < power; p++) {
            term = term.multiply(h);
        }
        Apcomplex zh = z.multiply(h);
        for (int k = 0; power + k < sum.length; k++) {
            if (k > 0) {
                term = term.multiply(zh).divide(new Apfloat(k, precision));
            }
            sum[power + k] = sum[power + k].add(term);
        }
    }
}
