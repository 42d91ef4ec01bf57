package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import org.junit.jupiter.api.Test;

class ResiduesTest {

    @Test
    void newtonLiftedInverseEqualsEuclidsInverseModuloThePower() {
        // the inverse mod f^m is unique: Newton lifting must give exactly the extended Euclidean
        // algorithm's residue (common practice), here for the factors of an order-64 operator
        RationalPolynomial g = RationalPolynomial.ofIntegers(1, 1).pow(8).multiply(RationalPolynomial.ofIntegers(5, 2, 1).pow(6));
        for (long[] f : new long[][] {{-1, -1, 0, 1}, {-1, -1, 0, 0, 0, 1}, {1, 1, 0, 0, 1}, {3, 0, 2}}) {
            RationalPolynomial factor = RationalPolynomial.ofIntegers(f);
            for (int m = 1; m <= 5; m++) {
                assertEquals(g.inverseModulo(factor.pow(m)), Residues.inverseModuloPower(g, factor, m), factor + "^" + m);
            }
        }
    }
}
