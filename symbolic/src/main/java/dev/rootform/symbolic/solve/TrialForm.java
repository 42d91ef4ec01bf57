package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The trial form of undetermined coefficients (common practice; e.g. W. E. Boyce and R. C.
 * DiPrima, Elementary Differential Equations, method of undetermined coefficients — from memory)
 * for a differential equation whose forcing has a frequency qπ: for each term c·t^p·e^{at}·cos or
 * sin(ωt), the functions t^i·e^{at}·cos(ωt) and t^i·e^{at}·sin(ωt) (or t^i·e^{at}) for
 * m ≤ i ≤ m + p, where m is the multiplicity of a + iω as a characteristic root (always 0 when ω is
 * a nonzero multiple of π, since π is transcendental), each with a free constant P1, P2, ….
 * Those constants are transcendental (e.g. 1/(1 - π²)), so the numeric layer fixes them.
 */
final class TrialForm {
    private TrialForm() {
    }

    /** The general solution followed by the trial terms, with free constants C1..Ck, P1..Pm. */
    static ClosedForm of(LinearEquation eq, ClosedForm general, List<Factor> characteristic) {
        Set<String> seen = new LinkedHashSet<>();
        List<Term> terms = new ArrayList<>(general.terms());
        List<String> names = new ArrayList<>(general.freeConstants());
        for (ForcingTerm t : eq.forcing()) {
            int m = resonance(t, characteristic);
            for (int i = m; i <= m + t.power(); i++) {
                String key = t.exponential() + "|" + t.oscillation().equals(ForcingTerm.Oscillation.NONE) + "|"
                        + t.frequency() + "|" + t.frequencyTimesPi() + "|" + i;
                if (seen.add(key)) {
                    terms.add(term(t, i, names));
                }
            }
        }
        return new ClosedForm(general.domain(), general.function(), general.variable(), Rational.ZERO,
                general.validFrom(), List.of(), terms, names, general.terms().size());
    }

    private static Term term(ForcingTerm t, int power, List<String> names) {
        Surd rate = Surd.of(t.exponential());
        if (t.oscillation() == ForcingTerm.Oscillation.NONE) {
            return new Term.Exponential(next(names), power, rate);
        }
        Angle angle = t.frequencyTimesPi() ? new Angle.PiMultiple(t.frequency().abs())
                : new Angle.Value(Surd.of(t.frequency().abs()));
        return new Term.Oscillating(next(names), next(names), power, rate, angle);
    }

    private static Coefficient next(List<String> names) {
        long count = names.stream().filter(n -> n.startsWith("P")).count();
        String name = "P" + (count + 1);
        names.add(name);
        return new Coefficient.Free(name);
    }

    /** The multiplicity of a + iω among the characteristic roots; 0 for ω a nonzero multiple of π. */
    private static int resonance(ForcingTerm t, List<Factor> characteristic) {
        if (t.frequencyTimesPi() && !t.frequency().isZero()) {
            return 0;
        }
        Rational a = t.exponential();
        Rational w = t.oscillation() == ForcingTerm.Oscillation.NONE ? Rational.ZERO : t.frequency();
        RationalPolynomial f = w.isZero() ? RationalPolynomial.of(a.negate(), Rational.ONE)
                : RationalPolynomial.of(a.multiply(a).add(w.multiply(w)), a.multiply(-2), Rational.ONE);
        return ClosedFormBuilder.multiplicity(characteristic, f);
    }
}
