package dev.rootform.symbolic.algebra;

import java.util.ArrayList;
import java.util.List;

/**
 * The linear form β ↦ Tr(c·β) on a number field K = Q(α) of degree d, for a fixed c in K, kept as
 * its values w_l = Tr(c·α^l), l &lt; d; then Tr(c·β) = Σ_l β_l·w_l exactly, d rational products
 * instead of a product in K, its reduction and a trace. Immutable.
 *
 * @since 0.4
 */
public final class TraceForm {
    private final List<Rational> weights;

    private TraceForm(List<Rational> weights) {
        this.weights = List.copyOf(weights);
    }

    /** The form of c in k: O(d²) rational operations, once. */
    public static TraceForm of(NumberField k, RationalPolynomial c) {
        List<Rational> w = new ArrayList<>(k.degree());
        RationalPolynomial power = k.reduce(c);
        for (int l = 0; l < k.degree(); l++) {
            w.add(k.trace(power));
            if (l + 1 < k.degree()) {
                power = k.timesGenerator(power);
            }
        }
        return new TraceForm(w);
    }

    /** Tr(c·β) for β given by its residue (degree below d). */
    public Rational at(RationalPolynomial beta) {
        Rational sum = Rational.ZERO;
        for (int l = 0; l <= beta.degree(); l++) {
            Rational b = beta.coefficient(l);
            if (!b.isZero()) {
                sum = sum.add(b.multiply(weights.get(l)));
            }
        }
        return sum;
    }
}
