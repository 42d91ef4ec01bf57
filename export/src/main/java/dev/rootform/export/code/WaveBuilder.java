package dev.rootform.export.code;

import dev.rootform.export.CodeFacts;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Wave;
import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
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
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Turns the terms of a fitted {@link ClosedForm} into {@link Wave}s. Every constant is computed
 * from its exact form at {@link #DIGITS} significant digits and rounded once to the nearest double:
 * a·cos x + b·sin x becomes √(a²+b²)·cos(x − atan2(b, a)); a conjugate sum over an irreducible factor
 * uses certified roots ({@link RootFinder}): a real root ρ gives c(ρ)·v^i·ρ^v (or e^{ρv}), a
 * conjugate pair α, ᾱ gives 2|c(α)|·v^i·|α|^v·cos(v·arg α + arg c(α)) (differential:
 * 2|c(α)|·v^i·e^{Re α·v}·cos(Im α·v + arg c(α))).
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
                waves.add(new Wave(round(exact(e.coefficient())), e.power(), round(surd(e.rate())), 0.0, 0.0));
            } else if (t instanceof Term.Oscillating o) {
                Apcomplex c = new Apcomplex(exact(o.cosine()), exact(o.sine()).negate());
                waves.add(new Wave(round(ApcomplexMath.abs(c)), o.power(), round(surd(o.growth())),
                        round(angle(o.angle())), round(ApcomplexMath.arg(c))));
            } else if (t instanceof Term.ConjugateSum r) {
                conjugateSum(r, differential, waves);
            } else {
                throw new AssertionError(t);
            }
        }
        waves.removeIf(w -> w.amplitude() == 0.0);
        return waves.isEmpty() ? List.of(Wave.ZERO) : List.copyOf(waves);
    }

    private static void conjugateSum(Term.ConjugateSum r, boolean differential, List<Wave> out) {
        for (Enclosure z : new RootFinder(DIGITS).roots(r.factor())) {
            Apcomplex alpha = new Apcomplex(apfloat(z.re()), apfloat(z.im()));
            Apcomplex c = Apcomplex.ZERO;
            for (int j = r.coefficients().size() - 1; j >= 0; j--) {
                c = c.multiply(alpha).add(exact(r.coefficients().get(j)));
            }
            if (z.isReal()) {
                out.add(new Wave(round(c.real()), r.power(), z.re().doubleValue(), 0.0, 0.0));
            } else if (z.im().signum() > 0) {
                double growth = differential ? z.re().doubleValue() : round(ApcomplexMath.abs(alpha));
                double frequency = differential ? z.im().doubleValue() : round(ApcomplexMath.arg(alpha));
                out.add(new Wave(round(ApcomplexMath.abs(c).multiply(new Apfloat(2))), r.power(), growth,
                        frequency, round(ApcomplexMath.arg(c))));
            }
        }
    }

    /** The nearest double (BigDecimal's conversion rounds correctly). */
    private static double round(Apfloat x) {
        return new BigDecimal(x.toString(true)).doubleValue();
    }

    private static Apfloat exact(Coefficient c) {
        if (c instanceof Coefficient.Exact e) {
            return surd(e.value());
        }
        throw new AssertionError("free constant " + c);
    }

    private static Apfloat surd(Surd s) {
        return apfloat(s.toBigDecimal(CONTEXT));
    }

    private static Apfloat apfloat(BigDecimal x) {
        return new Apfloat(x, CONTEXT.getPrecision());
    }

    /** The angle or angular frequency in radians, at the working precision. */
    private static Apfloat angle(Angle a) {
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
