package dev.rootform.symbolic.claim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The exact field Q(ζ_m)(√p…) of a claim's numbers: identities known by construction. */
class ExactRingTest {
    @Test
    void gaussSumsAreSquareRootsInsideTheCyclotomicField() {
        // (Σ (a/p) ζ_p^a)² = (−1)^{(p−1)/2}·p (Gauss; common practice): √5 and √3 in Q(ζ_60), √2 = ζ_8 + ζ_8⁻¹ in Q(ζ_120)
        ExactRing ring = ExactRing.field(120, List.of());
        for (int p : new int[] {2, 3, 5}) {
            Algebraic root = ring.sqrt(Rational.of(p));
            assertEquals(ring.rational(Rational.of(p)), root.multiply(root), "√" + p);
            assertTrue(root.isReal());
            assertEquals(Optional.of(Surd.sqrt(Rational.of(p))), root.toSurd());
        }
        Algebraic i = ring.imaginaryUnit();
        assertEquals(ring.rational(Rational.MINUS_ONE), i.multiply(i));
        assertEquals(ring.sqrt(Rational.of(-3)), ring.sqrt(Rational.of(3)).multiply(i));
    }

    @Test
    void adjoinedRootsMultiplyAndInvert() {
        ExactRing ring = ExactRing.field(4, List.of(2, 3));
        Algebraic a = ring.one().add(ring.sqrt(Rational.of(2))).add(ring.sqrt(Rational.of(6)).multiply(ring.imaginaryUnit()));
        assertEquals(ring.one(), a.multiply(a.inverse()));
        assertEquals(ring.sqrt(Rational.of(6)), ring.sqrt(Rational.of(2)).multiply(ring.sqrt(Rational.of(3))));
        assertEquals(Optional.of(Surd.of(Rational.of(3), Rational.of(5, 7), Rational.of(6))),
                ring.rational(Rational.of(3)).add(ring.sqrt(Rational.of(6)).multiply(Rational.of(5, 7))).toSurd());
        assertFalse(a.isReal());
    }

    @Test
    void cosinesOfRationalMultiplesOfPiAreExact() {
        // cos(π/5) = (1 + √5)/4 (Abramowitz & Stegun 4.3.46, from memory); cos(π/3) = 1/2
        ExactRing ring = ExactRing.field(20, List.of());
        Algebraic z = ring.expIPi(Rational.of(1, 5));
        assertEquals(Optional.of(Surd.of(Rational.of(1, 4), Rational.of(1, 4), Rational.of(5))), z.realPart().toSurd());
        assertEquals(ring.one(), ring.expIPi(Rational.of(2)));
        ExactRing twelve = ExactRing.field(12, List.of());
        assertEquals(Optional.of(Rational.of(1, 2)), twelve.expIPi(Rational.of(1, 3)).realPart().toRational());
    }

    @Test
    void decimalsOfNumbersWithoutASurdForm() {
        ExactRing ring = ExactRing.field(20, List.of());
        BigDecimal[] z = ring.expIPi(Rational.of(1, 10)).approximate(new MathContext(20));
        // cos(π/10) = 0.95105651629515357212 (common practice)
        assertEquals(new BigDecimal("0.95105651629515357212"), z[0]);
    }

    @Test
    void aRootSumTracesToTheSumOverTheRoots() {
        // λ³ − λ − 1: power sums 3, 0, 2 by Newton's identities (common practice)
        ExactRing k = ExactRing.field(1, List.of()).withRoot(dev.rootform.symbolic.algebra.RationalPolynomial.ofIntegers(-1, -1, 0, 1));
        assertEquals(Optional.of(Rational.of(2)), k.lambda().multiply(k.lambda()).trace().toRational());
        assertEquals(k.one(), k.lambda().multiply(k.lambda().inverse()));
    }

    @Test
    void aMissingNumberGrowsTheField() {
        FieldNeeds needs = new FieldNeeds();
        Algebraic r = needs.run(ring -> ring.sqrt(Rational.of(-7)).multiply(ring.expIPi(Rational.of(1, 3))));
        assertTrue(r.ring().order() % 12 == 0, r.ring().toString());
    }
}
