package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Steady-state amplitude and phase of a stable system driven by sinusoids (common practice: the
 * frequency response of a linear time-invariant system). Differential: for L = Σ a_j D^j and input
 * e^{iωt}, the steady output is H·e^{iωt} with H = 1/χ(iω). Difference: for Σ a_j x[m+j] = f(m - s)
 * and input e^{iθn}, H = e^{-iθs}/χ(e^{iθ}). Only plain sinusoids (no polynomial or exponential
 * factor) get a steady state; the caller decides stability.
 */
final class FrequencyResponse {
    private FrequencyResponse() {
    }

    static List<SteadyState> of(LinearEquation eq, int digits) {
        long precision = digits + WorkingPrecision.GUARD_DIGITS;
        List<SteadyState> result = new ArrayList<>();
        for (ForcingTerm t : sinusoids(eq)) {
            Apcomplex h = response(eq, angularFrequency(t, precision), precision);
            Apfloat gain = ApcomplexMath.abs(h);
            Apfloat degrees = ApfloatMath.toDegrees(ApfloatMath.atan2(h.imag(), h.real()));
            result.add(new SteadyState(t, Decimals.toBigDecimal(gain, digits),
                    Decimals.toBigDecimal(gain.multiply(Decimals.toApfloat(t.coefficient().abs(), precision)), digits),
                    Decimals.toBigDecimal(degrees, digits)));
        }
        return result;
    }

    /** ω of a sinusoidal input term (rad per unit of t, or per sample). */
    static Apfloat angularFrequency(ForcingTerm t, long precision) {
        Apfloat w = Decimals.toApfloat(t.frequency(), precision);
        return t.frequencyTimesPi() ? w.multiply(ApfloatMath.pi(precision)) : w;
    }

    /**
     * The sinusoidal inputs that get a steady state: plain sinusoids, no polynomial or
     * exponential factor.
     */
    static List<ForcingTerm> sinusoids(LinearEquation eq) {
        return eq.forcing().stream().filter(t -> t.oscillation() != ForcingTerm.Oscillation.NONE && t.power() == 0
                && plainRate(eq.domain(), t)).toList();
    }

    /** H at angular frequency w: 1/χ(iw) (differential) or e^{-iws}/χ(e^{iw}) (difference). */
    static Apcomplex response(LinearEquation eq, Apfloat w, long precision) {
        return eq.domain() == Domain.DIFFERENTIAL
                ? inverse(characteristic(eq, new Apcomplex(Apfloat.ZERO, w), precision))
                : unitShift(w, -eq.shift(), precision).divide(characteristic(eq, unitShift(w, 1, precision), precision));
    }

    /** No exponential factor: rate 0 (differential) or base 1 (difference). */
    private static boolean plainRate(Domain domain, ForcingTerm t) {
        return domain == Domain.DIFFERENTIAL ? t.exponential().isZero() : t.exponential().equals(Rational.ONE);
    }

    /** e^{i·w·count}, by {@link ComplexExp} (cancellable, and far faster than apfloat's cos and sin). */
    private static Apcomplex unitShift(Apfloat w, long count, long precision) {
        return ComplexExp.exp(new Apcomplex(Apfloat.ZERO, w.multiply(new Apfloat(count, precision))), precision);
    }

    private static Apcomplex characteristic(LinearEquation eq, Apcomplex z, long precision) {
        Apcomplex v = Apcomplex.ZERO;
        for (int j = eq.order(); j >= 0; j--) {
            v = v.multiply(z).add(Decimals.toApfloat(eq.coefficients().get(j), precision));
        }
        return v;
    }

    private static Apcomplex inverse(Apcomplex z) {
        return new Apfloat(1, z.precision()).divide(z);
    }
}
