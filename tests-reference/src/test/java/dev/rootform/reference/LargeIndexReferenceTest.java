package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Report;
import dev.rootform.export.document.JsonRenderer;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * Values at large indices, certified to the digits asked, against apfloat evaluations of
 * hand-derived closed forms; and how long fractions read (decimals in text, the fraction in JSON).
 */
class LargeIndexReferenceTest {
    private static final int DIGITS = 25;
    private static final long PRECISION = 60;

    /**
     * x[n+1] = (241/240)·x[n] − 1, x[0] = 100: the fixed point is 240, so x[n] = 240 − 140·(241/240)^n
     * (by hand). At n = 10^5 and 10^6 the exact fraction has about 480,000 and 4.8 million digits; the
     * value is certified to 25 digits instead.
     */
    @Test
    void rationalRootAtTenToTheFiveAndSix() {
        Report r = Answers.report("x[n+1] = 241/240 x[n] - 1; x[0] = 100", DIGITS, List.of(Rational.of(100_000), Rational.of(1_000_000)));
        for (PointValue v : r.values()) {
            long n = v.at().toBigInteger().longValueExact();
            Apfloat growth = ApfloatMath.pow(new Apfloat(241, PRECISION).divide(new Apfloat(240, PRECISION)), n);
            Apfloat expected = new Apfloat(240, PRECISION).subtract(new Apfloat(140, PRECISION).multiply(growth));
            assertDigits(expected, v, "x[" + n + "]");
            assertTrue(v.exact().isEmpty(), "the exact fraction was computed at n = " + n);
        }
    }

    /**
     * x[n+2] = 2x[n+1] + x[n], x[0] = 1, x[1] = 2 (roots 1 ± √2): x[n] = ((1 + √2)^(n+1) − (1 − √2)^(n+1))/(2√2)
     * (by hand: the Pell numbers P(n+1), OEIS A000129, shifted by one).
     */
    @Test
    void surdRootsAtTenToTheFive() {
        Report r = Answers.report("x[n+2] = 2x[n+1] + x[n]; x[0] = 1; x[1] = 2", DIGITS, List.of(Rational.of(100_000), Rational.of(12)));
        Apfloat root2 = ApfloatMath.sqrt(new Apfloat(2, PRECISION));
        Apfloat one = new Apfloat(1, PRECISION);
        for (PointValue v : r.values()) {
            long n = v.at().toBigInteger().longValueExact();
            Apfloat expected = ApfloatMath.pow(one.add(root2), n + 1).subtract(ApfloatMath.pow(one.subtract(root2), n + 1))
                    .divide(root2.multiply(new Apfloat(2, PRECISION)));
            assertDigits(expected, v, "x[" + n + "]");
        }
        // P(13) = 33461 (OEIS A000129), exact at a small index
        assertEquals(Rational.of(33461), r.values().get(1).exact().orElseThrow());
    }

    /**
     * A savings balance b[n] = 1.004·b[n−1] − 900, b[0] = 60000: exact rational iteration gives b[12];
     * the text shows it as a decimal to the digits asked, JSON keeps the exact fraction; at n = 10^5 the
     * value against 225000 − 165000·1.004^n (by hand) in apfloat.
     */
    @Test
    void savingsBalanceReadsAsDecimalsWithTheFractionInJson() {
        Report r = Answers.report("b[n] = 1.004 b[n-1] - 900; b[0] = 60000", 20, List.of(Rational.of(12), Rational.of(100_000)));
        List<Rational> iterated = ExactIteration.values(List.of(Rational.of(-251, 250), Rational.ONE),
                List.of(new dev.rootform.symbolic.model.ForcingTerm(Rational.of(-900), 0, Rational.ONE,
                        dev.rootform.symbolic.model.ForcingTerm.Oscillation.NONE, Rational.ZERO, false)), 0, List.of(Rational.of(60000)), 13);
        Rational b12 = iterated.get(12);
        assertEquals(b12, r.values().get(0).exact().orElseThrow());
        String text = TextRenderer.render(r);
        assertTrue(text.contains("b[12] ≈ 51903.41575675705741"), text);
        assertTrue(JsonRenderer.render(r).contains(b12.toString()), "JSON lacks the exact fraction " + b12);
        Apfloat expected = new Apfloat(225000, PRECISION).subtract(new Apfloat(165000, PRECISION)
                .multiply(ApfloatMath.pow(new Apfloat("1.004", PRECISION), 100_000)));
        assertEquals(0, new BigDecimal(expected.toString(false)).round(new MathContext(20)).compareTo(r.values().get(1).value()),
                "b[100000] = " + r.values().get(1).value() + ", expected " + expected);
    }

    private static void assertDigits(Apfloat expected, PointValue v, String what) {
        BigDecimal e = new BigDecimal(expected.toString(false)).round(new MathContext(DIGITS));
        assertEquals(0, e.compareTo(v.value()), what + " = " + v.value() + ", expected " + e);
    }
}
