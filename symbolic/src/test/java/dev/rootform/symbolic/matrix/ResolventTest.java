package dev.rootform.symbolic.matrix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.InputException;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ResolventTest {
    @Test
    void characteristicPolynomialOfCompanionMatrix() {
        // companion form of s^2 + 2s + 5: det(sI − A) = s^2 + 2s + 5 (common practice)
        Resolvent r = Resolvent.of(MatrixText.matrix("A", "[[0,1],[-5,-2]]"));
        assertEquals(RationalPolynomial.ofIntegers(5, 2, 1), r.characteristic());
        assertTrue(r.adjugateIdentityHolds());
        // adj(sI − A) = [[s + 2, 1], [-5, s]] (2×2 adjugate by hand, common practice)
        assertEquals(RationalPolynomial.ofIntegers(2, 1), r.adjugateEntry(0, 0));
        assertEquals(RationalPolynomial.ofIntegers(-5), r.adjugateEntry(1, 0));
    }

    @Test
    void minimalPolynomialOfScalarAndJordanMatrices() {
        // 3I has minimal polynomial s − 3; a Jordan block J_2(3) has (s − 3)^2 (textbook identity, from memory)
        assertEquals(RationalPolynomial.ofIntegers(-3, 1), Resolvent.of(MatrixText.matrix("A", "[[3,0],[0,3]]")).minimalPolynomial());
        assertEquals(RationalPolynomial.ofIntegers(9, -6, 1), Resolvent.of(MatrixText.matrix("A", "[[3,1],[0,3]]")).minimalPolynomial());
    }

    @Test
    void randomMatricesSatisfyCayleyHamiltonAndTheAdjugateIdentity() {
        long seed = 77;
        Random random = new Random(seed);
        for (int trial = 0; trial < 20; trial++) {
            int n = 1 + random.nextInt(6);
            long[][] e = new long[n][n];
            for (long[] row : e) {
                for (int j = 0; j < n; j++) {
                    row[j] = random.nextInt(7) - 3;
                }
            }
            RationalMatrix a = RationalMatrix.ofIntegers(e);
            Resolvent r = Resolvent.of(a);
            // Cayley–Hamilton: χ(A) = 0, and μ divides χ with μ(A) = 0 (textbook identities)
            assertTrue(Resolvent.evaluate(r.characteristic(), a).isZero(), "seed " + seed + " trial " + trial);
            assertTrue(Resolvent.evaluate(r.minimalPolynomial(), a).isZero(), "seed " + seed + " trial " + trial);
            assertTrue(r.characteristic().mod(r.minimalPolynomial()).isZero());
            assertTrue(r.adjugateIdentityHolds());
            // tr(A) = −c_{n−1}, det(A) = (−1)^n c_0
            assertEquals(a.trace().negate(), r.characteristic().coefficient(n - 1));
        }
    }

    @Test
    void ranks() {
        assertEquals(2, MatrixText.matrix("M", "[[1,2],[3,4]]").rank());
        assertEquals(1, MatrixText.matrix("M", "[[1,2],[2,4]]").rank());
        assertEquals(0, RationalMatrix.zero(3, 2).rank());
        assertEquals(Rational.of(3, 4), MatrixText.vector("x0", "[\"3/4\", 0.5]").get(0));
        assertEquals(Rational.of(1, 2), MatrixText.vector("x0", "[\"3/4\", 0.5]").get(1));
    }

    @Test
    void badMatricesNameTheMatrixAndEntry() {
        InputException e = assertThrows(InputException.class, () -> MatrixText.matrix("B", "[[0],[x]]"));
        assertTrue(e.getMessage().startsWith("B: entry (2, 1) 'x'"), e.getMessage());
        assertEquals(6, e.position());
        e = assertThrows(InputException.class, () -> MatrixText.matrix("A", "[[1,2],[3]]"));
        assertTrue(e.getMessage().contains("row 2 has 1 entries, row 1 has 2"), e.getMessage());
        e = assertThrows(InputException.class, () -> MatrixText.matrix("A", "[1,2]"));
        assertTrue(e.getMessage().contains("not a matrix"), e.getMessage());
        assertThrows(InputException.class, () -> MatrixText.matrix("A", "[[1,2]] x"));
        assertThrows(InputException.class, () -> MatrixText.matrix("A", "[[1e99999]]"));
        assertEquals(List.of(Rational.of(1, 10)), MatrixText.matrix("A", "[[0.1]]").row(0));
    }
}
