package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import java.util.ArrayList;
import java.util.List;

/**
 * What a rational function f = N/D (lowest terms, D monic) needs the exact factorisation for:
 * its poles and zeros as monic irreducible factors with multiplicities, the factors a quotient
 * loses when brought to lowest terms, and the partial-fraction decomposition over Q.
 *
 * @since 0.3
 */
public final class RationalFunctions {
    private RationalFunctions() {
    }

    /** The monic irreducible factors of the denominator with multiplicities (empty for a polynomial). */
    public static List<Factor> poles(RationalFunction f) {
        return f.denominator().degree() < 1 ? List.of() : JasFactorizer.factor(f.denominator());
    }

    /** The monic irreducible factors of the numerator with multiplicities (empty for a constant). */
    public static List<Factor> zeros(RationalFunction f) {
        return f.numerator().degree() < 1 ? List.of() : JasFactorizer.factor(f.numerator());
    }

    /**
     * num/den in lowest terms together with the monic irreducible factors (with multiplicities)
     * that num and den had in common and that were cancelled.
     *
     * @throws ArithmeticException if {@code den} is the zero polynomial
     */
    public static LowestTerms lowestTerms(RationalPolynomial num, RationalPolynomial den) {
        RationalFunction value = new RationalFunction(num, den);
        if (num.isZero()) {
            return new LowestTerms(value, List.of());
        }
        RationalPolynomial g = num.gcd(den);
        return new LowestTerms(value, g.degree() < 1 ? List.of() : JasFactorizer.factor(g));
    }

    /**
     * The decomposition of f: for each factor g^m of D, B = N·(D/g^m)^(-1) mod g^m (Chinese
     * remainder theorem), then B written in powers of g by repeated division.
     */
    public static PartialFractions partialFractions(RationalFunction f) {
        RationalPolynomial n = f.numerator();
        RationalPolynomial d = f.denominator();
        List<PartialFractions.Fraction> fractions = new ArrayList<>();
        for (Factor g : poles(f)) {
            RationalPolynomial q = g.polynomial().pow(g.multiplicity());
            RationalPolynomial b = n.multiply(d.divide(q).inverseModulo(q)).mod(q);
            // b = Σ_{j=1..m} A_j g^(m-j): the remainders of repeated division by g give A_m, A_{m-1}, …
            List<PartialFractions.Fraction> ofFactor = new ArrayList<>();
            for (int j = g.multiplicity(); j >= 1; j--) {
                RationalPolynomial[] qr = b.divideAndRemainder(g.polynomial());
                if (!qr[1].isZero()) {
                    ofFactor.add(0, new PartialFractions.Fraction(g.polynomial(), j, qr[1]));
                }
                b = qr[0];
            }
            fractions.addAll(ofFactor);
        }
        return new PartialFractions(f.polynomialPart(), fractions);
    }
}
