package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Σ_k w_k·x_k for fixed rationals x_k at many weight vectors w. The x_k are brought once to their
 * least common denominator L (x_k = N_k/L), so that for integer weights each sum is integer
 * products and one reduction, (Σ w_k·N_k)/L, instead of a reduction per product and per partial
 * sum; other weights take the plain exact sum. Exact either way.
 */
final class FixedSummands {
    private final List<Rational> values;
    private final BigInteger denominator;
    private final List<BigInteger> numerators;

    FixedSummands(List<Rational> values) {
        this.values = List.copyOf(values);
        BigInteger lcm = BigInteger.ONE;
        for (Rational x : values) {
            BigInteger d = x.denominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
        }
        this.denominator = lcm;
        List<BigInteger> scaled = new ArrayList<>();
        for (Rational x : values) {
            scaled.add(x.numerator().multiply(lcm.divide(x.denominator())));
        }
        this.numerators = List.copyOf(scaled);
    }

    /** Σ_k w_k·x_k, exactly. */
    Rational dot(List<Rational> weights) {
        if (weights.stream().allMatch(Rational::isInteger)) {
            BigInteger sum = BigInteger.ZERO;
            for (int k = 0; k < numerators.size(); k++) {
                BigInteger w = weights.get(k).numerator();
                if (w.signum() != 0 && numerators.get(k).signum() != 0) {
                    sum = sum.add(w.multiply(numerators.get(k)));
                }
            }
            return Rational.of(sum, denominator);
        }
        Rational sum = Rational.ZERO;
        for (int k = 0; k < values.size(); k++) {
            sum = sum.add(weights.get(k).multiply(values.get(k)));
        }
        return sum;
    }
}
