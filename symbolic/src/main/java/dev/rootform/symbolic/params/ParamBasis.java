package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;

/**
 * The basis functions of ker μ, v^j·X with X a mode's exponential/power or X_E, X_O (see
 * {@link ParamMode}), and their exact values: the k-th derivative at 0 (differential,
 * (t^j·X)^(k)(0) = k!/(k−j)!·X^(k−j)(0)) or the value at index k (difference, k^j·X(k)).
 */
final class ParamBasis {
    /** One basis function: mode, power of the variable, and the odd part of a pair. */
    record Function(int mode, int power, boolean odd) { }

    private final Domain domain;
    private final List<ParamMode> modes;
    private final List<PairPowers> powers = new ArrayList<>();
    private final List<Function> functions = new ArrayList<>();

    ParamBasis(Domain domain, List<ParamMode> modes) {
        this.domain = domain;
        this.modes = List.copyOf(modes);
        for (int i = 0; i < modes.size(); i++) {
            ParamMode m = modes.get(i);
            powers.add(new PairPowers(m.centre(), m.square()));
            for (int j = 0; j < m.multiplicity(); j++) {
                functions.add(new Function(i, j, false));
                if (m.pair()) {
                    functions.add(new Function(i, j, true));
                }
            }
        }
    }

    List<Function> functions() {
        return List.copyOf(functions);
    }

    /** True when f lies in ker χ (its power is below the mode's multiplicity in χ). */
    boolean homogeneous(Function f) {
        return f.power() < modes.get(f.mode()).inEquation();
    }

    /** The k-th derivative at 0 or the value at k of f. */
    ParamFunction value(Function f, int k) {
        PairPowers p = powers.get(f.mode());
        List<String> names = modes.get(f.mode()).centre().names();
        if (domain == Domain.DIFFERENTIAL) {
            if (k < f.power()) {
                return ParamFunction.zero(names);
            }
            ParamFunction base = f.odd() ? p.odd(k - f.power()) : p.even(k - f.power());
            return base.scale(fallingFactorial(k, f.power()));
        }
        ParamFunction base = f.odd() ? p.odd(k) : p.even(k);
        return base.scale(Rational.of(k).pow(f.power()));
    }

    /** The k-th derivative at 0 or the value at k of one forcing term (over {@code names}). */
    static ParamFunction forcing(Domain domain, ParamTerm t, int k, List<String> names) {
        ParamFunction amplitude = ModeFinder.over(t.amplitude(), names);
        ParamFunction rate = ModeFinder.over(t.rate(), names);
        if (domain == Domain.DIFFERENCE) {
            return amplitude.multiply(rate.pow(k)).scale(Rational.of(k).pow(t.power()));
        }
        if (k < t.power()) {
            return ParamFunction.zero(names);
        }
        int q = k - t.power();
        ParamFunction frequency = ModeFinder.over(t.frequency(), names);
        PairPowers wave = new PairPowers(rate, frequency.pow(2).negate());
        ParamFunction h = t.wave() == ParamTerm.Wave.NONE ? rate.pow(q)
                : t.wave() == ParamTerm.Wave.COS ? wave.even(q) : wave.odd(q).multiply(frequency);
        return amplitude.multiply(h).scale(fallingFactorial(k, t.power()));
    }

    /** k!/(k−j)!. */
    private static Rational fallingFactorial(int k, int j) {
        Rational r = Rational.ONE;
        for (int i = 0; i < j; i++) {
            r = r.multiply(k - i);
        }
        return r;
    }
}
