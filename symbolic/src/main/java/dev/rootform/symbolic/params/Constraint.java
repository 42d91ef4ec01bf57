package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A condition p rel 0 on the parameters, p a polynomial over Q. Written with the positive terms on
 * the left and the negative ones on the right: {@code c^2 > 4·k·m}, {@code k = m·w^2}.
 *
 * @since 0.3
 */
public record Constraint(ParamPolynomial polynomial, Relation relation) {
    public Constraint {
        Objects.requireNonNull(polynomial, "polynomial");
        Objects.requireNonNull(relation, "relation");
    }

    /** Whether the condition holds at rational parameter values. */
    public boolean holdsAt(Map<String, Rational> values) {
        return relation.holdsFor(polynomial.evaluate(values).signum());
    }

    /** The same condition with integer coefficients without a common factor (a positive multiple of p). */
    public Constraint integral() {
        java.math.BigInteger lcm = java.math.BigInteger.ONE;
        java.math.BigInteger gcd = java.math.BigInteger.ZERO;
        for (Map.Entry<int[], Rational> t : polynomial.exponentVectors()) {
            java.math.BigInteger d = t.getValue().denominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
            gcd = gcd.gcd(t.getValue().numerator());
        }
        return gcd.signum() == 0 ? this : new Constraint(polynomial.scale(Rational.of(lcm, gcd)), relation);
    }

    @Override
    public String toString() {
        List<Map.Entry<int[], Rational>> plus = new ArrayList<>();
        List<Map.Entry<int[], Rational>> minus = new ArrayList<>();
        for (Map.Entry<int[], Rational> t : integral().polynomial.exponentVectors()) {
            (t.getValue().signum() > 0 ? plus : minus).add(t.getValue().signum() > 0 ? t : Map.entry(t.getKey(), t.getValue().negate()));
        }
        List<String> names = polynomial.names();
        if (plus.isEmpty() || minus.isEmpty()) {
            return integral().polynomial + " " + relation.symbol() + " 0";
        }
        return ParamPolynomial.fromExponents(names, plus) + " " + relation.symbol() + " " + ParamPolynomial.fromExponents(names, minus);
    }
}
