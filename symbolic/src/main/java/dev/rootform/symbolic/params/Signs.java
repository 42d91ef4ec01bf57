package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamFactor;
import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.backend.JasMultivariate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Decides signs of polynomials in the parameters under the {@code --where} assumptions and the
 * conditions already imposed, and simplifies conditions with them. Sound but incomplete: a sign it
 * cannot prove is left open, never guessed.
 *
 * <p>A polynomial's sign is proved termwise (common practice): after x → −x for parameters assumed
 * negative, a polynomial whose coefficients all have one sign, in parameters that are ≥ 0 or occur
 * only to even powers, has that sign; strictly so when some term has only parameters that are
 * strictly positive (or nonzero to even powers), or is a constant. A condition is factored over Q
 * first, and each factor is decided on its own.
 */
final class Signs {
    /** Outcome of simplifying a condition. */
    sealed interface Outcome permits Always, Never, Open { }

    /** The condition holds wherever the assumptions and the known conditions do. */
    record Always() implements Outcome { }

    /** The condition can never hold together with them. */
    record Never() implements Outcome { }

    /** The condition reduced to the factors left undecided. */
    record Open(Constraint constraint) implements Outcome { }

    private final Assumptions assumptions;
    /** Relations to zero of irreducible monic factors known from conditions imposed before. */
    private final Map<ParamPolynomial, Relation> known = new HashMap<>();

    Signs(Assumptions assumptions) {
        this.assumptions = assumptions;
    }

    /** A copy with the same assumptions and facts (to explore one case without changing this one). */
    Signs copy() {
        Signs s = new Signs(assumptions);
        s.known.putAll(known);
        return s;
    }

    /** Simplifies {@code c} and, when it stays open, records what it implies about its factors. */
    Outcome impose(Constraint c) {
        Outcome o = simplify(c);
        if (o instanceof Open open) {
            learn(open.constraint());
        }
        return o;
    }

    /** {@code c} simplified under the assumptions and the facts known so far. */
    Outcome simplify(Constraint c) {
        ParamPolynomial p = c.polynomial();
        if (p.isConstant()) {
            return c.relation().holdsFor(p.constantValue().signum()) ? new Always() : new Never();
        }
        List<ParamFactor> factors = JasMultivariate.factor(p);
        int unit = factors.get(0).polynomial().constantValue().signum();
        Relation relation = c.relation();
        ParamPolynomial rest = ParamPolynomial.constant(p.names(), Rational.ONE);
        boolean strict = relation == Relation.POSITIVE || relation == Relation.NEGATIVE;
        for (ParamFactor f : factors.subList(1, factors.size())) {
            Relation r = signOf(f.polynomial());
            boolean nonzero = r != null && (r == Relation.POSITIVE || r == Relation.NEGATIVE || r == Relation.NONZERO);
            if (strict && (r == Relation.POSITIVE || r == Relation.NEGATIVE)) {
                unit *= r == Relation.NEGATIVE && f.multiplicity() % 2 == 1 ? -1 : 1;
            } else if (strict && f.multiplicity() % 2 == 0 && nonzero) {
                continue;
            } else if (!strict && nonzero && (relation == Relation.NONZERO || relation == Relation.ZERO)) {
                continue;
            } else if (relation == Relation.NONZERO || relation == Relation.ZERO) {
                rest = rest.multiply(f.polynomial());
            } else {
                rest = rest.multiply(f.polynomial().pow(f.multiplicity()));
            }
        }
        if (unit < 0) {
            relation = relation.negated();
        }
        if (rest.isConstant()) {
            return relation.holdsFor(1) ? new Always() : new Never();
        }
        Relation whole = signOf(rest);
        if (whole != null) {
            if (relation.follows(whole)) {
                return new Always();
            }
            if (relation.excludes(whole)) {
                return new Never();
            }
        }
        return new Open(new Constraint(rest, relation));
    }

    private void learn(Constraint c) {
        List<ParamFactor> factors = JasMultivariate.factor(c.polynomial());
        boolean single = factors.size() == 2 && factors.get(1).multiplicity() == 1;
        Relation r = factors.get(0).polynomial().constantValue().signum() < 0 ? c.relation().negated() : c.relation();
        for (ParamFactor f : factors.subList(1, factors.size())) {
            if (single) {
                known.put(f.polynomial(), r);
            } else if (c.relation() != Relation.ZERO && !c.relation().holdsFor(0)) {
                known.putIfAbsent(f.polynomial(), Relation.NONZERO);
            }
        }
    }

    /** The relation to zero proved for an irreducible factor (or any polynomial), or null. */
    Relation signOf(ParamPolynomial f) {
        Relation k = known.get(monic(f));
        if (k != null) {
            Rational lead = f.leadingCoefficient();
            return lead.signum() < 0 ? k.negated() : k;
        }
        return termwise(f).orElse(null);
    }

    private static ParamPolynomial monic(ParamPolynomial f) {
        return f.scale(f.leadingCoefficient().inverse());
    }

    private Optional<Relation> termwise(ParamPolynomial p) {
        List<String> names = p.names();
        int positive = 0;
        int negative = 0;
        boolean strictTerm = false;
        for (Map.Entry<int[], Rational> t : p.exponentVectors()) {
            int sign = t.getValue().signum();
            boolean strict = true;
            for (int i = 0; i < names.size(); i++) {
                int e = t.getKey()[i];
                if (e == 0) {
                    continue;
                }
                Relation a = assumptions.of(names.get(i));
                if (e % 2 == 0) {
                    strict &= a != null && !a.holdsFor(0);
                } else if (a == Relation.POSITIVE || a == Relation.NONNEGATIVE) {
                    strict &= a == Relation.POSITIVE;
                } else if (a == Relation.NEGATIVE || a == Relation.NONPOSITIVE) {
                    sign = -sign;
                    strict &= a == Relation.NEGATIVE;
                } else {
                    return Optional.empty();
                }
            }
            if (sign > 0) {
                positive++;
            } else {
                negative++;
            }
            strictTerm |= strict;
        }
        if (positive > 0 && negative > 0) {
            return Optional.empty();
        }
        if (positive > 0) {
            return Optional.of(strictTerm ? Relation.POSITIVE : Relation.NONNEGATIVE);
        }
        return negative > 0 ? Optional.of(strictTerm ? Relation.NEGATIVE : Relation.NONPOSITIVE) : Optional.of(Relation.ZERO);
    }
}
