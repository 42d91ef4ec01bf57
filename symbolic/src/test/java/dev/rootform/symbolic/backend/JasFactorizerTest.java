package dev.rootform.symbolic.backend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import org.junit.jupiter.api.Test;

class JasFactorizerTest {
    private static RationalPolynomial product(Rational lead, List<Factor> factors) {
        RationalPolynomial p = RationalPolynomial.constant(lead);
        for (Factor f : factors) {
            p = p.multiply(f.polynomial().pow(f.multiplicity()));
        }
        return p;
    }

    @Test
    void scaledBinomialSplitsIntoScaledCyclotomicFactors() {
        // x^96 - 2^96 = Π_{d | 96} 2^φ(d)·Φ_d(x/2): one factor per divisor of 96, and 96 has 12
        // (x^n - 1 = Π_{d|n} Φ_d(x), a handbook identity)
        RationalPolynomial p = RationalPolynomial.monomial(Rational.ONE, 96)
                .subtract(RationalPolynomial.constant(Rational.of(2).pow(96)));
        List<Factor> factors = JasFactorizer.factor(p);
        assertEquals(12, factors.size());
        assertEquals(p, product(Rational.ONE, factors));
    }

    @Test
    void binomialWithRootAtZeroAndNegativeConstant() {
        // 3x^5 + 3·(8/27)·x^2 = 3x^2(x^3 + 8/27) = 3x^2(x + 2/3)(x^2 - 2x/3 + 4/9) (sum of cubes)
        RationalPolynomial p = RationalPolynomial.of(Rational.ZERO, Rational.ZERO, Rational.of(8, 9), Rational.ZERO,
                Rational.ZERO, Rational.of(3));
        List<Factor> factors = JasFactorizer.factor(p);
        assertEquals(List.of(new Factor(RationalPolynomial.X, 2),
                new Factor(RationalPolynomial.of(Rational.of(2, 3), Rational.ONE), 1),
                new Factor(RationalPolynomial.of(Rational.of(4, 9), Rational.of(-2, 3), Rational.ONE), 1)), factors);
        assertEquals(p, product(Rational.of(3), factors));
    }

    @Test
    void genericPolynomialWithRepeatedFactors() {
        // (x - 1/2)^3 (x^2 + x + 1)^2 (x^3 - x - 1): multiplicities are exact
        RationalPolynomial p = RationalPolynomial.of(Rational.of(-1, 2), Rational.ONE).pow(3)
                .multiply(RationalPolynomial.ofIntegers(1, 1, 1).pow(2)).multiply(RationalPolynomial.ofIntegers(-1, -1, 0, 1));
        List<Factor> factors = JasFactorizer.factor(p);
        assertEquals(3, factors.size());
        assertTrue(factors.contains(new Factor(RationalPolynomial.ofIntegers(1, 1, 1), 2)));
        assertEquals(p, product(Rational.ONE, factors));
    }
}
