package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;

/**
 * The conjugate sums of a closed form written mode by mode ({@link DecimalMode}): for each root α of
 * the factor (certified, at the digits asked plus guard digits), c(α) = Σ_j c_j α^j; a real root
 * gives one real mode, a pair α, ᾱ (Im α &gt; 0) one cos/sin mode. Roots where c vanishes exactly
 * ({@link Term.ConjugateSum#vanishesAtSomeRoots}) give none.
 */
final class ConjugateSumModes {
    /** Most correction steps of {@link #argument} before apfloat's arg takes over. */
    private static final int ARGUMENT_STEPS = 8;

    private ConjugateSumModes() {
    }

    /** One list per conjugate sum whose coefficients are all exact, in term order. */
    static List<List<DecimalMode>> of(ClosedForm form, int digits, RootCache cache) {
        List<List<DecimalMode>> out = new ArrayList<>();
        for (Term t : form.terms()) {
            if (t instanceof Term.ConjugateSum r && r.coefficients().stream().allMatch(Coefficient.Exact.class::isInstance)) {
                out.add(modes(r, form.domain() == Domain.DIFFERENTIAL, digits, cache));
            }
        }
        return out;
    }

    private static List<DecimalMode> modes(Term.ConjugateSum r, boolean differential, int digits, RootCache cache) {
        long precision = digits + WorkingPrecision.GUARD_DIGITS;
        boolean someVanish = r.vanishesAtSomeRoots();
        List<DecimalMode> modes = new ArrayList<>();
        for (Apcomplex alpha : ModeSum.roots(r.factor(), cache, precision)) {
            Deadline.checkCurrent();
            Apcomplex c = value(r, alpha, precision);
            if (someVanish && ApcomplexMath.abs(c).compareTo(ApcomplexMath.abs(value(r.conjugated(), alpha, precision))) < 0) {
                continue;
            }
            BigDecimal zero = BigDecimal.ZERO;
            if (alpha.imag().signum() == 0) {
                modes.add(new DecimalMode(decimal(c.real(), digits), zero, r.power(), decimal(alpha.real(), digits), zero));
            } else if (alpha.imag().signum() > 0) {
                Apfloat two = new Apfloat(2, precision);
                Apfloat growth = differential ? alpha.real() : ApcomplexMath.abs(alpha);
                Apfloat frequency = differential ? alpha.imag() : argument(alpha, precision);
                modes.add(new DecimalMode(decimal(c.real().multiply(two), digits), decimal(c.imag().multiply(two).negate(), digits),
                        r.power(), decimal(growth, digits), decimal(frequency, digits)));
            }
        }
        return modes;
    }

    /**
     * arg α (α ≠ 0) at the working precision: from the double-precision angle θ, the step
     * θ ← θ + Im(e^{−iθ}·α/|α|) = θ + sin(arg α − θ) leaves an error of about (arg α − θ)^3/6, so each
     * step triples the digits (common practice); apfloat's own arg when that does not settle.
     */
    private static Apfloat argument(Apcomplex alpha, long precision) {
        Apfloat theta = new Apfloat(Math.atan2(alpha.imag().doubleValue(), alpha.real().doubleValue()), precision);
        Apcomplex unit = alpha.divide(ApcomplexMath.abs(alpha));
        for (int step = 0; step < ARGUMENT_STEPS; step++) {
            Apfloat s = unit.multiply(ComplexExp.exp(new Apcomplex(Apfloat.ZERO, theta.negate()), precision)).imag();
            theta = theta.add(s);
            if (s.signum() == 0 || 3 * s.scale() < -precision - 3) {
                return theta;
            }
        }
        return ApcomplexMath.arg(alpha);
    }

    /** c(α) = Σ_j c_j α^j with exact (surd) c_j. */
    private static Apcomplex value(Term.ConjugateSum r, Apcomplex alpha, long precision) {
        Apcomplex c = Apcomplex.ZERO;
        for (int j = r.coefficients().size() - 1; j >= 0; j--) {
            BigDecimal cj = ((Coefficient.Exact) r.coefficients().get(j)).value().toBigDecimal(new java.math.MathContext((int) precision));
            c = c.multiply(alpha).add(new Apfloat(cj, precision));
        }
        return c;
    }

    private static BigDecimal decimal(Apfloat x, int digits) {
        return x.signum() == 0 ? BigDecimal.ZERO : Decimals.toBigDecimal(x, digits);
    }
}
