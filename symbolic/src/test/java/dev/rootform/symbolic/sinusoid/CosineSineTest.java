package dev.rootform.symbolic.sinusoid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

class CosineSineTest {
    /** cos 1 = 0.54030230586813971740093660744297660373231042061792… (a tabulated constant, digits from memory). */
    @Test
    void cosineOfOneMatchesItsTabulatedDigits() {
        BigDecimal[] cs = CosineSine.of(Rational.ONE, 45);
        assertEquals(new BigDecimal("0.540302305868139717400936607442976603732310421"), cs[0]);
    }

    /** cos²ω + sin²ω = 1 to the digits asked, and agreement with the double-precision library, at small and large ω. */
    @Test
    void pythagoreanIdentityAndDoubleLibraryAgree() {
        for (Rational w : new Rational[] {Rational.of(3, 10), Rational.of(-2, 5), Rational.of(3, 2), Rational.of(1000), Rational.of(1, 7)}) {
            BigDecimal[] cs = CosineSine.of(w, 60);
            BigDecimal one = cs[0].multiply(cs[0]).add(cs[1].multiply(cs[1])).round(new MathContext(55));
            assertEquals(0, one.compareTo(BigDecimal.ONE), w + ": " + one);
            assertTrue(Math.abs(cs[0].doubleValue() - Math.cos(w.doubleValue())) < 1e-12, w.toString());
            assertTrue(Math.abs(cs[1].doubleValue() - Math.sin(w.doubleValue())) < 1e-12, w.toString());
        }
    }
}
