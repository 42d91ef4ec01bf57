package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.params.ParamFunction;
import dev.rootform.symbolic.params.ParamTerm;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The value of an expression with parameters: Σ c_j·(D^j y or x[n+j]) plus forcing terms. Immutable.
 *
 * @param names the parameter names
 * @param unknown coefficient by derivative order or shift
 * @param forcing terms free of the unknown, like terms merged
 */
record ParamValue(List<String> names, Map<Integer, ParamFunction> unknown, List<ParamTerm> forcing) {
    ParamValue {
        names = List.copyOf(names);
        unknown = Map.copyOf(unknown);
        forcing = List.copyOf(forcing);
    }

    static ParamValue unknown(int offset, List<String> names) {
        return new ParamValue(names, Map.of(offset, ParamFunction.one(names)), List.of());
    }

    static ParamValue term(ParamTerm term) {
        return new ParamValue(term.amplitude().names(), Map.of(), term.amplitude().isZero() ? List.of() : List.of(term));
    }

    /** A constant c: c·v^0 with no growth and no wave. */
    static ParamValue constant(ParamFunction c, Domain domain) {
        return term(new ParamTerm(c, 0, neutralRate(domain, c.names()), ParamFunction.zero(c.names()), ParamTerm.Wave.NONE));
    }

    /** The rate of "no growth": 0 in e^(0·t), 1 in 1^n. */
    static ParamFunction neutralRate(Domain domain, List<String> names) {
        return domain == Domain.DIFFERENTIAL ? ParamFunction.zero(names) : ParamFunction.one(names);
    }

    boolean hasUnknown() {
        return !unknown.isEmpty();
    }

    /** The value as one constant of Q(params), if it is one (no unknown; one term without variable, growth or wave). */
    Optional<ParamFunction> constantValue(Domain domain) {
        if (hasUnknown()) {
            return Optional.empty();
        }
        if (forcing.isEmpty()) {
            return Optional.of(ParamFunction.zero(names));
        }
        if (forcing.size() == 1) {
            ParamTerm t = forcing.get(0);
            if (t.power() == 0 && t.wave() == ParamTerm.Wave.NONE && t.rate().equals(neutralRate(domain, t.rate().names()))) {
                return Optional.of(t.amplitude());
            }
        }
        return Optional.empty();
    }

    ParamValue add(ParamValue other) {
        Map<Integer, ParamFunction> u = new TreeMap<>(unknown);
        other.unknown.forEach((k, c) -> u.merge(k, c, ParamFunction::add));
        u.values().removeIf(ParamFunction::isZero);
        List<ParamTerm> f = new ArrayList<>(forcing);
        for (ParamTerm t : other.forcing) {
            merge(f, t);
        }
        return new ParamValue(names, u, f);
    }

    private static void merge(List<ParamTerm> terms, ParamTerm t) {
        for (int i = 0; i < terms.size(); i++) {
            ParamTerm s = terms.get(i);
            if (s.power() == t.power() && s.rate().equals(t.rate()) && s.frequency().equals(t.frequency()) && s.wave() == t.wave()) {
                ParamFunction sum = s.amplitude().add(t.amplitude());
                if (sum.isZero()) {
                    terms.remove(i);
                } else {
                    terms.set(i, new ParamTerm(sum, s.power(), s.rate(), s.frequency(), s.wave()));
                }
                return;
            }
        }
        terms.add(t);
    }

    ParamValue scale(ParamFunction c) {
        Map<Integer, ParamFunction> u = new TreeMap<>();
        unknown.forEach((k, v) -> u.put(k, v.multiply(c)));
        u.values().removeIf(ParamFunction::isZero);
        List<ParamTerm> f = new ArrayList<>();
        for (ParamTerm t : forcing) {
            ParamFunction a = t.amplitude().multiply(c);
            if (!a.isZero()) {
                f.add(new ParamTerm(a, t.power(), t.rate(), t.frequency(), t.wave()));
            }
        }
        return new ParamValue(names, u, f);
    }

    ParamValue negate() {
        return scale(ParamFunction.constant(names(), dev.rootform.symbolic.algebra.Rational.MINUS_ONE));
    }
}
