package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.Objects;

/**
 * The decomposition N/D = P + Σ_f Σ_{j=1..m} A_{f,j}/f^j over the monic irreducible factors f^m of D,
 * with deg A_{f,j} &lt; deg f; exact and unique.
 *
 * @param polynomialPart P
 * @param fractions the terms A/f^j with nonzero A, factor by factor, ascending j
 * @since 0.3
 */
public record PartialFractions(RationalPolynomial polynomialPart, List<PartialFractions.Fraction> fractions) {
    public PartialFractions {
        Objects.requireNonNull(polynomialPart, "polynomialPart");
        fractions = List.copyOf(fractions);
    }

    /**
     * One term numerator/factor^power.
     *
     * @param factor monic irreducible f
     * @param power j &ge; 1
     * @param numerator A with deg A &lt; deg f, nonzero
     */
    public record Fraction(RationalPolynomial factor, int power, RationalPolynomial numerator) {
        public Fraction {
            Objects.requireNonNull(factor, "factor");
            Objects.requireNonNull(numerator, "numerator");
        }
    }
}
