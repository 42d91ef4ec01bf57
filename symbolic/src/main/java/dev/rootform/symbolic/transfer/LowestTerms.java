package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.Factor;
import java.util.List;
import java.util.Objects;

/**
 * A quotient brought to lowest terms, with the factors that numerator and denominator had in
 * common: each cancelled factor f^m is a pole–zero pair (m of each) at the roots of f.
 *
 * @param value the reduced function
 * @param cancelled monic irreducible common factors with their multiplicities, in the factoriser's order
 * @since 0.3
 */
public record LowestTerms(RationalFunction value, List<Factor> cancelled) {
    public LowestTerms {
        Objects.requireNonNull(value, "value");
        cancelled = List.copyOf(cancelled);
    }
}
