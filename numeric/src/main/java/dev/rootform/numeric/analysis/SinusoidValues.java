package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.sinusoid.SinusoidalParticular;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.SinusoidSolution;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Values of a recurrence's solution exact over Q(cos ω)[sin ω] ({@link SinusoidSolution}): the
 * exact parts (rational-valued solutions) exactly or from their modes, cos ω, sin ω and cos(ωn),
 * sin(ωn) in apfloat at a working precision, the elements of Q(c)[s] evaluated there in apfloat; a
 * value is given when two working precisions agree to the digits asked. Also the
 * independent check of the closed form against the recurrence iterated in apfloat.
 */
final class SinusoidValues {
    /** Steps of the iteration check. */
    static final int ITERATION_STEPS = 40;

    private SinusoidValues() {
    }

    /** x[at] to {@code wanted} significant digits. */
    static PointValue value(SinusoidSolution s, Rational at, int wanted, RootCache cache) {
        long n = at.toBigInteger().longValueExact();
        int lost = (int) Math.ceil(Math.log10(Math.abs((double) n) + 1));
        Apfloat[] v = WorkingPrecision.settle(wanted + lost, working -> evaluate(s, n, working, cache),
                (low, high, working) -> WorkingPrecision.agree(low, high, working, wanted),
                (working, high) -> working + WorkingPrecision.GUARD_DIGITS + lost, "value at n = " + n);
        return new PointValue(at, Decimals.toBigDecimal(v[0], wanted), Optional.empty());
    }

    /**
     * The closed form against the recurrence iterated in apfloat at digits + {@link WorkingPrecision#GUARD_DIGITS}
     * from the closed form's first k values, with the forcing evaluated term by term: both agree at
     * {@link #ITERATION_STEPS} indices to the digits asked, relative to the largest value.
     */
    static Check iterationCheck(SinusoidSolution s, LinearEquation eq, int digits, RootCache cache) {
        String name = "agrees with iteration of the recurrence";
        int working = digits + WorkingPrecision.GUARD_DIGITS;
        long first = s.rest().validFrom();
        int k = eq.order();
        List<Apfloat> x = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            x.add(new Apfloat(value(s, Rational.of(first + i), working, cache).value(), working));
        }
        Apfloat largest = Apfloat.ZERO;
        Apfloat worst = Apfloat.ZERO;
        Apfloat lead = Decimals.toApfloat(eq.coefficients().get(k), working);
        for (long m = first; m < first + ITERATION_STEPS; m++) {
            Deadline.checkCurrent();
            long n = m - eq.shift(); // the equation at n gives x[m + k] from x[m .. m + k - 1]
            Apfloat rhs = forcing(eq, n, working);
            for (int j = 0; j < k; j++) {
                rhs = rhs.subtract(Decimals.toApfloat(eq.coefficients().get(j), working).multiply(x.get(x.size() - k + j)));
            }
            Apfloat next = rhs.divide(lead);
            x.add(next);
            Apfloat closed = new Apfloat(value(s, Rational.of(m + k), working, cache).value(), working);
            worst = max(worst, ApfloatMath.abs(closed.subtract(next)));
            largest = max(largest, ApfloatMath.abs(closed));
        }
        boolean agree = worst.compareTo(largest.multiply(new Apfloat("1e-" + digits, working))) <= 0;
        String range = "n = " + first + ".." + (first + ITERATION_STEPS + k - 1);
        return new Check(name, agree, agree ? "iterated in " + working + "-digit arithmetic, cos and sin by apfloat, " + range
                : "differs by " + Decimals.toBigDecimal(worst, 6) + " on " + range);
    }

    /** b^e with b^0 = 1 also for b = 0. */
    private static Apfloat power(Apfloat b, long e, int working) {
        return e == 0 ? new Apfloat(1, working) : ApfloatMath.pow(b, e);
    }

    private static Apfloat max(Apfloat a, Apfloat b) {
        return a.compareTo(b) >= 0 ? a : b;
    }

    /** f(n), term by term: q·n^p·r^n·cos or sin(ωn) (ω times π where marked). */
    private static Apfloat forcing(LinearEquation eq, long n, int working) {
        Apfloat sum = new Apfloat(0, working);
        Apfloat nn = new Apfloat(n, working);
        for (ForcingTerm t : eq.forcing()) {
            Apfloat term = Decimals.toApfloat(t.coefficient(), working).multiply(power(nn, t.power(), working))
                    .multiply(power(Decimals.toApfloat(t.exponential(), working), n, working));
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                Apfloat angle = Decimals.toApfloat(t.frequency(), working).multiply(nn);
                if (t.frequencyTimesPi()) {
                    angle = angle.multiply(ApfloatMath.pi(working));
                }
                term = term.multiply(t.oscillation() == ForcingTerm.Oscillation.COS ? ApfloatMath.cos(angle) : ApfloatMath.sin(angle));
            }
            sum = sum.add(term);
        }
        return sum;
    }

    /** {x[n], the largest part in size} at a working precision. */
    private static Apfloat[] evaluate(SinusoidSolution s, long n, int working, RootCache cache) {
        List<Apfloat> units = new ArrayList<>();
        for (ExactSolution u : s.units()) {
            units.add(exactPart(u, n, working, cache));
        }
        List<Apfloat> parts = new ArrayList<>();
        parts.add(exactPart(s.rest(), n, working, cache));
        for (SinusoidSolution.Wave w : s.waves()) {
            Apcomplex unit = ComplexExp.exp(new Apcomplex(Apfloat.ZERO, Decimals.toApfloat(w.frequency(), working)), working);
            Apfloat c = unit.real();
            Apfloat sine = unit.imag();
            for (int j = 0; j < units.size(); j++) {
                parts.add(units.get(j).multiply(at(w.weights().get(j), c, sine, working)));
            }
            for (SinusoidalParticular p : w.particular()) {
                parts.add(particular(p, n, c, sine, working));
            }
        }
        Apfloat sum = Apfloat.ZERO;
        Apfloat largest = Apfloat.ZERO;
        for (Apfloat part : parts) {
            sum = sum.add(part);
            largest = max(largest, ApfloatMath.abs(part));
        }
        return new Apfloat[] {sum, largest};
    }

    /** a(c) + b(c)·s in apfloat (Horner); cancellation shows as disagreement of two working precisions. */
    private static Apfloat at(TrigNumber t, Apfloat c, Apfloat s, int working) {
        return quotient(t.rational(), c, working).add(quotient(t.sine(), c, working).multiply(s));
    }

    private static Apfloat quotient(RationalFunction f, Apfloat x, int working) {
        return polynomial(f.numerator(), x, working).divide(polynomial(f.denominator(), x, working));
    }

    private static Apfloat polynomial(RationalPolynomial p, Apfloat x, int working) {
        Apfloat sum = new Apfloat(0, working);
        for (int i = p.degree(); i >= 0; i--) {
            sum = sum.multiply(x).add(Decimals.toApfloat(p.coefficient(i), working));
        }
        return sum;
    }

    /** Σ_j n^j·r^n·(A_j·cos(ωn) + B_j·sin(ωn)), with e^{iωn} at the working precision plus the digits of ωn. */
    private static Apfloat particular(SinusoidalParticular p, long n, Apfloat c, Apfloat s, int working) {
        int extra = (int) Math.ceil(Math.log10(Math.abs((double) n) * p.frequency().doubleValue() + 1));
        Apcomplex wave = ComplexExp.exp(new Apcomplex(Apfloat.ZERO,
                Decimals.toApfloat(p.frequency().multiply(Rational.of(n)), working + extra)), working);
        Apfloat nn = new Apfloat(n, working);
        Apfloat sum = Apfloat.ZERO;
        for (int j = p.degree(); j >= 0; j--) {
            Apfloat amplitude = at(p.cosine().get(j), c, s, working).multiply(wave.real())
                    .add(at(p.sine().get(j), c, s, working).multiply(wave.imag()));
            sum = sum.multiply(nn).add(amplitude);
        }
        return sum.multiply(power(Decimals.toApfloat(p.base(), working), n, working));
    }

    /** A rational-valued exact solution at n: exactly while its fraction is small, else from its modes. */
    private static Apfloat exactPart(ExactSolution e, long n, int working, RootCache cache) {
        if (n < e.validFrom() || SequenceSum.exactDigits(e, n, cache) <= Math.max(Analyzer.EXACT_SIZE_LIMIT, working)) {
            return Decimals.toApfloat(e.valueAt(n), working);
        }
        return SequenceSum.of(e, cache, working).valueAndLargest(n)[0];
    }
}
