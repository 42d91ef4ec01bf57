package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.work.Deadline;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The exact check of a solution over Q(params), independent of the fit: the operator is applied to
 * the closed form by the rules D(v^j·X) = j·v^(j−1)·X + v^j·DX (differential) and
 * E(v^j·X) = Σ_i C(j,i)·v^i·EX (difference), with DX_E = σX_E + W·X_O, DX_O = X_E + σX_O (the same
 * for E, and D e^(ρt) = ρe^(ρt), E ρ^n = ρ·ρ^n); L y − g written in the basis must have every
 * coefficient zero as a rational function (the basis functions of distinct modes are linearly
 * independent). Then every condition is evaluated exactly.
 */
final class ParamVerifier {
    private record Key(int mode, int power, boolean odd) { }

    private ParamVerifier() {
    }

    static boolean verify(ParametricProblem problem, List<ParamMode> modes, List<ParamPiece> pieces, List<String> names) {
        Map<Key, ParamFunction> y = new HashMap<>();
        for (ParamPiece p : pieces) {
            add(y, new Key(p.mode(), p.power(), false), p.even());
            add(y, new Key(p.mode(), p.power(), true), p.odd());
        }
        Map<Key, ParamFunction> residual = new HashMap<>();
        Map<Key, ParamFunction> power = y;
        for (int k = 0; k < problem.coefficients().size(); k++) {
            Deadline.checkCurrent();
            ParamFunction a = ModeFinder.over(problem.coefficients().get(k), names);
            for (Map.Entry<Key, ParamFunction> e : power.entrySet()) {
                add(residual, e.getKey(), e.getValue().multiply(a));
            }
            power = apply(problem.domain(), modes, power);
        }
        Map<Key, ParamFunction> forcing = new HashMap<>();
        for (ParamTerm t : problem.forcing()) {
            int mode = modeOf(modes, t, names);
            if (mode < 0) {
                return false;
            }
            ParamFunction amplitude = ModeFinder.over(t.amplitude(), names);
            if (t.wave() == ParamTerm.Wave.SIN) {
                add(forcing, new Key(mode, t.power(), true), amplitude.multiply(ModeFinder.over(t.frequency(), names)));
            } else {
                add(forcing, new Key(mode, t.power(), false), amplitude);
            }
        }
        // Σ a_j y(n + s + j) = g(n) for all n: shift the side that lags, by |s|
        for (int i = 0; i < Math.abs(problem.shift()); i++) {
            if (problem.shift() > 0) {
                residual = apply(Domain.DIFFERENCE, modes, residual);
            } else {
                forcing = apply(Domain.DIFFERENCE, modes, forcing);
            }
        }
        for (Map.Entry<Key, ParamFunction> e : forcing.entrySet()) {
            add(residual, e.getKey(), e.getValue().negate());
        }
        if (residual.values().stream().anyMatch(c -> !c.isZero())) {
            return false;
        }
        for (ParamCondition c : problem.conditions()) {
            ParamFunction value = problem.domain() == Domain.DIFFERENTIAL ? derivativeAtZero(modes, y, c.order())
                    : valueAt(modes, y, c.point().toBigInteger().intValueExact());
            if (!value.equals(ModeFinder.over(c.value(), names))) {
                return false;
            }
        }
        return true;
    }

    private static int modeOf(List<ParamMode> modes, ParamTerm t, List<String> names) {
        for (int i = 0; i < modes.size(); i++) {
            ParamMode m = modes.get(i);
            ParamFunction rate = ModeFinder.over(t.rate(), names);
            if (t.wave() == ParamTerm.Wave.NONE ? !m.pair() && m.centre().equals(rate)
                    : m.pair() && m.centre().equals(rate) && m.square().equals(ModeFinder.over(t.frequency(), names).pow(2).negate())) {
                return i;
            }
        }
        return -1;
    }

    private static Map<Key, ParamFunction> apply(Domain domain, List<ParamMode> modes, Map<Key, ParamFunction> f) {
        Map<Key, ParamFunction> out = new HashMap<>();
        for (Map.Entry<Key, ParamFunction> e : f.entrySet()) {
            Key k = e.getKey();
            ParamFunction c = e.getValue();
            ParamMode m = modes.get(k.mode());
            if (domain == Domain.DIFFERENTIAL) {
                if (k.power() > 0) {
                    add(out, new Key(k.mode(), k.power() - 1, k.odd()), c.scale(Rational.of(k.power())));
                }
                step(out, m, k.mode(), k.power(), k.odd(), c);
            } else {
                Rational binomial = Rational.ONE;
                for (int i = k.power(); i >= 0; i--) {
                    step(out, m, k.mode(), i, k.odd(), c.scale(binomial));
                    binomial = binomial.multiply(Rational.of(i)).divide(Rational.of(k.power() - i + 1));
                }
            }
        }
        return out;
    }

    /** out += c·v^j·(D or E applied to X). */
    private static void step(Map<Key, ParamFunction> out, ParamMode m, int mode, int j, boolean odd, ParamFunction c) {
        if (!m.pair()) {
            add(out, new Key(mode, j, false), c.multiply(m.centre()));
        } else if (!odd) {
            add(out, new Key(mode, j, false), c.multiply(m.centre()));
            add(out, new Key(mode, j, true), c.multiply(m.square()));
        } else {
            add(out, new Key(mode, j, false), c);
            add(out, new Key(mode, j, true), c.multiply(m.centre()));
        }
    }

    private static ParamFunction derivativeAtZero(List<ParamMode> modes, Map<Key, ParamFunction> y, int order) {
        Map<Key, ParamFunction> f = y;
        for (int i = 0; i < order; i++) {
            f = apply(Domain.DIFFERENTIAL, modes, f);
        }
        ParamFunction sum = null;
        for (Map.Entry<Key, ParamFunction> e : f.entrySet()) {
            if (e.getKey().power() == 0 && !e.getKey().odd()) {
                sum = sum == null ? e.getValue() : sum.add(e.getValue());
            }
        }
        return sum == null ? ParamFunction.zero(modes.get(0).centre().names()) : sum;
    }

    private static ParamFunction valueAt(List<ParamMode> modes, Map<Key, ParamFunction> y, int n) {
        ParamFunction sum = ParamFunction.zero(modes.get(0).centre().names());
        for (Map.Entry<Key, ParamFunction> e : y.entrySet()) {
            ParamMode m = modes.get(e.getKey().mode());
            PairPowers p = new PairPowers(m.centre(), m.square());
            ParamFunction x = e.getKey().odd() ? p.odd(n) : p.even(n);
            sum = sum.add(e.getValue().multiply(x).scale(Rational.of(n).pow(e.getKey().power())));
        }
        return sum;
    }

    private static void add(Map<Key, ParamFunction> map, Key key, ParamFunction value) {
        if (value.isZero()) {
            return;
        }
        ParamFunction sum = map.containsKey(key) ? map.get(key).add(value) : value;
        if (sum.isZero()) {
            map.remove(key);
        } else {
            map.put(key, sum);
        }
    }
}
