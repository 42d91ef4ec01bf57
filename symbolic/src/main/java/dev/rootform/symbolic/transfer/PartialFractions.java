package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.ArrayList;
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

    /**
     * The decomposition of f: for each factor g^m of D, B = N·(D/g^m)^(-1) mod g^m (Chinese
     * remainder theorem), then B written in powers of g by repeated division.
     */
    static PartialFractions of(RationalFunction f) {
        RationalPolynomial n = f.numerator();
        RationalPolynomial d = f.denominator();
        List<Fraction> fractions = new ArrayList<>();
        for (Factor g : f.poles()) {
            RationalPolynomial q = g.polynomial().pow(g.multiplicity());
            RationalPolynomial rest = d.divide(q);
            RationalPolynomial b = n.multiply(rest.inverseModulo(q)).mod(q);
            // b = Σ_{j=1..m} A_j g^(m-j): the remainders of repeated division by g give A_m, A_{m-1}, …
            List<Fraction> ofFactor = new ArrayList<>();
            for (int j = g.multiplicity(); j >= 1; j--) {
                RationalPolynomial[] qr = b.divideAndRemainder(g.polynomial());
                if (!qr[1].isZero()) {
                    ofFactor.add(0, new Fraction(g.polynomial(), j, qr[1]));
                }
                b = qr[0];
            }
            fractions.addAll(ofFactor);
        }
        return new PartialFractions(f.polynomialPart(), fractions);
    }
}
