package dev.rootform.export.code;

import dev.rootform.export.Wave;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Turns the terms of a fitted {@link ClosedForm} into {@link Wave}s. Every constant is computed
 * from its exact form at {@link #DIGITS} significant digits (a sampled sinusoid's coefficients from cos ω
 * and sin ω at two working precisions) and rounded once to the nearest double:
 * a·cos x + b·sin x becomes √(a²+b²)·cos(x − atan2(b, a)); a conjugate sum over an irreducible factor
 * uses certified roots ({@link RootFinder}): a real root ρ gives c(ρ)·v^i·ρ^v (or e^{ρv}), a
 * conjugate pair α, ᾱ gives 2|c(α)|·v^i·|α|^v·cos(v·arg α + arg c(α)) (differential:
 * 2|c(α)|·v^i·e^{Re α·v}·cos(Im α·v + arg c(α))). A sequence's angle that is exactly 2π·k/M per step
 * (a rational multiple of π, or a root of unity) is reduced in integers by the code; every other
 * rounded growth and frequency carries its rounding error, from which the valid range is limited.
 *
 * @since 0.2
 */
final class WaveBuilder {
    /** Working precision of every constant before the one rounding to double. */
    static final int DIGITS = 40;
    private static final MathContext CONTEXT = new MathContext(DIGITS + 10);

    private WaveBuilder() {
    }

    /** The waves of a form without free constants (one that {@link CodeRequests#refusal} accepts). */
    static List<Wave> of(ClosedForm form) {
        boolean differential = form.domain() == Domain.DIFFERENTIAL;
        List<Wave> waves = new ArrayList<>();
        for (Term t : form.terms()) {
            if (t instanceof Term.Exponential e) {
                Apfloat rate = surd(e.rate());
                waves.add(new Wave(round(exact(e.coefficient())), e.power(), round(rate), 0.0, 0.0, error(rate), 0.0));
            } else if (t instanceof Term.Oscillating o) {
                Apcomplex c = new Apcomplex(exact(o.cosine()), exact(o.sine()).negate());
                Apfloat growth = surd(o.growth());
                double amplitude = round(ApcomplexMath.abs(c));
                double phase = round(ApcomplexMath.arg(c));
                if (!differential && o.angle() instanceof Angle.PiMultiple p) {
                    // θ = πa/b: θ·n mod 2π = 2π·((a·n) mod 2b)/2b, reduced exactly in integers
                    long modulus = p.multiple().denominator().shiftLeft(1).longValueExact();
                    long multiplier = Math.floorMod(p.multiple().numerator().longValueExact(), modulus);
                    waves.add(reduced(amplitude, o.power(), growth, phase, modulus, multiplier));
                } else {
                    Apfloat angle = angle(o.angle());
                    waves.add(new Wave(amplitude, o.power(), round(growth), round(angle), phase, error(growth), error(angle)));
                }
            } else if (t instanceof Term.ConjugateSum r) {
                conjugateSum(r, differential, waves);
            } else {
                throw new AssertionError(t);
            }
        }
        waves.removeIf(w -> w.amplitude() == 0.0);
        return waves.isEmpty() ? List.of(Wave.ZERO) : List.copyOf(waves);
    }

    /** A sequence's wave whose angle per step is exactly 2π·multiplier/modulus. */
    private static Wave reduced(double amplitude, int power, Apfloat growth, double phase, long modulus, long multiplier) {
        Apfloat step = ApfloatMath.pi(CONTEXT.getPrecision()).multiply(new Apfloat(2)).divide(new Apfloat(modulus, CONTEXT.getPrecision()));
        return new Wave(amplitude, power, round(growth), round(step), phase, modulus, multiplier, error(growth), 0.0);
    }

    private static void conjugateSum(Term.ConjugateSum r, boolean differential, List<Wave> out) {
        boolean someVanish = r.vanishesAtSomeRoots();
        OptionalInt order = differential ? OptionalInt.empty() : Cyclotomic.order(r.factor());
        for (Enclosure z : new RootFinder(DIGITS).roots(r.factor())) {
            Apcomplex alpha = new Apcomplex(apfloat(z.re()), apfloat(z.im()));
            Apcomplex c = value(r, alpha);
            if (someVanish && ApcomplexMath.abs(c).compareTo(ApcomplexMath.abs(value(r.conjugated(), alpha))) < 0) {
                continue; // c(α) = 0 exactly at this root (Term.ConjugateSum#vanishesAtSomeRoots)
            }
            if (z.isReal()) {
                Apfloat root = apfloat(z.re());
                out.add(new Wave(round(c.real()), r.power(), round(root), 0.0, 0.0, error(root), 0.0));
            } else if (z.im().signum() > 0) {
                Apfloat amplitude = ApcomplexMath.abs(c).multiply(new Apfloat(2));
                Apfloat growth = differential ? alpha.real() : ApcomplexMath.abs(alpha);
                Apfloat frequency = differential ? alpha.imag() : ApcomplexMath.arg(alpha);
                if (order.isPresent()) {
                    // a primitive N-th root of unity e^{2πik/N}: k from its argument, the angle reduced exactly
                    long n = order.getAsInt();
                    long k = Math.round(frequency.doubleValue() * n / (2 * Math.PI));
                    out.add(reduced(round(amplitude), r.power(), growth, round(ApcomplexMath.arg(c)), n, Math.floorMod(k, n)));
                } else {
                    out.add(new Wave(round(amplitude), r.power(), round(growth), round(frequency), round(ApcomplexMath.arg(c)),
                            error(growth), error(frequency)));
                }
            }
        }
    }

    /** |x − round(x)|: how far the double that code carries is from the value. */
    private static double error(Apfloat x) {
        return Math.abs(x.subtract(new Apfloat(new BigDecimal(round(x)), CONTEXT.getPrecision())).doubleValue());
    }

    /** c(α) = Σ_j c_j α^j at the working precision. */
    static Apcomplex value(Term.ConjugateSum r, Apcomplex alpha) {
        Apcomplex c = Apcomplex.ZERO;
        for (int j = r.coefficients().size() - 1; j >= 0; j--) {
            c = c.multiply(alpha).add(exact(r.coefficients().get(j)));
        }
        return c;
    }

    /** The nearest double (BigDecimal's conversion rounds correctly). */
    private static double round(Apfloat x) {
        return new BigDecimal(x.toString(false)).doubleValue();
    }

    /** An exact coefficient at the working precision. */
    static Apfloat exact(Coefficient c) {
        if (c instanceof Coefficient.Exact e) {
            return surd(e.value());
        }
        if (c instanceof Coefficient.Trig t) {
            return apfloat(t.toBigDecimal(CONTEXT));
        }
        throw new AssertionError("free constant " + c);
    }

    /** A surd at the working precision. */
    static Apfloat surd(Surd s) {
        return apfloat(s.toBigDecimal(CONTEXT));
    }

    private static Apfloat apfloat(BigDecimal x) {
        return new Apfloat(x, CONTEXT.getPrecision());
    }

    /** The angle or angular frequency in radians, at the working precision. */
    static Apfloat angle(Angle a) {
        long precision = CONTEXT.getPrecision();
        if (a instanceof Angle.PiMultiple p) {
            return ApfloatMath.pi(precision).multiply(apfloat(p.multiple().toBigDecimal(CONTEXT)));
        }
        if (a instanceof Angle.Value v) {
            return surd(v.value());
        }
        if (a instanceof Angle.ArcCos arc) {
            return ApfloatMath.acos(surd(arc.cosine()));
        }
        throw new AssertionError(a);
    }
}
