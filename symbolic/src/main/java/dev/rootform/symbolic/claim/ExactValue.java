package dev.rootform.symbolic.claim;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * An exact number Σ c·e^E with algebraic c and pairwise different algebraic exponents E, such as
 * the value of y(1) for a claim 3e^(-2t): 3·e^(-2). By the Lindemann–Weierstrass theorem the
 * numbers e^E for distinct algebraic E are linearly independent over the algebraic numbers (A.
 * Baker, Transcendental Number Theory, Cambridge University Press, 1975, Theorem 1.4 — theorem
 * number from memory), so such a sum is zero exactly when every c is, and it equals an algebraic
 * number a exactly when c = a for E = 0 and every other c is zero.
 */
final class ExactValue {
    private final ExactRing field;
    private final Map<Algebraic, Algebraic> terms;

    private ExactValue(ExactRing field, Map<Algebraic, Algebraic> terms) {
        this.field = field;
        this.terms = terms;
    }

    static ExactValue zero(ExactRing field) {
        return new ExactValue(field, Map.of());
    }

    /** The algebraic number a (exponent 0). */
    static ExactValue of(Algebraic a) {
        return zero(a.ring()).plus(a.ring().zero(), a);
    }

    /** This plus c·e^exponent. */
    ExactValue plus(Algebraic exponent, Algebraic c) {
        Map<Algebraic, Algebraic> sum = new LinkedHashMap<>(terms);
        Algebraic total = sum.containsKey(exponent) ? sum.get(exponent).add(c) : c;
        if (total.isZero()) {
            sum.remove(exponent);
        } else {
            sum.put(exponent, total);
        }
        return new ExactValue(field, sum);
    }

    ExactValue add(ExactValue other) {
        ExactValue sum = this;
        for (Map.Entry<Algebraic, Algebraic> e : other.terms.entrySet()) {
            sum = sum.plus(e.getKey(), e.getValue());
        }
        return sum;
    }

    ExactValue negate() {
        ExactValue r = zero(field);
        for (Map.Entry<Algebraic, Algebraic> e : terms.entrySet()) {
            r = r.plus(e.getKey(), e.getValue().negate());
        }
        return r;
    }

    ExactValue subtract(ExactValue other) {
        return add(other.negate());
    }

    boolean isZero() {
        return terms.isEmpty();
    }

    /** The algebraic value when there is no transcendental part (every exponent 0). */
    java.util.Optional<Algebraic> algebraic() {
        if (terms.isEmpty()) {
            return java.util.Optional.of(field.zero());
        }
        if (terms.size() == 1 && terms.containsKey(field.zero())) {
            return java.util.Optional.of(terms.get(field.zero()));
        }
        return java.util.Optional.empty();
    }

    /** exponent → coefficient, in the order the terms arose. */
    Map<Algebraic, Algebraic> terms() {
        return Collections.unmodifiableMap(terms);
    }

    ExactRing field() {
        return field;
    }
}
