package dev.rootform.symbolic.sinusoid;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Decimal values of cos ω and sin ω for a rational ω: the Taylor series at x = ω/2^k, |x| &lt; 1/256,
 * then k doublings sin 2x = 2 sin x cos x, cos 2x = cos²x − sin²x (handbook identities), with
 * guard digits for the error growth of the doublings. Approximate: correct to about the digits asked.
 *
 * @since 0.1
 */
public final class CosineSine {
    private CosineSine() {
    }

    /** {cos ω, sin ω} to about {@code digits} significant digits. */
    public static BigDecimal[] of(Rational omega, int digits) {
        int k = 8;
        double size = Math.abs(omega.doubleValue());
        while (size >= 1.0 / 256) {
            size /= 2;
            k++;
        }
        MathContext mc = new MathContext(digits + k / 3 + 10);
        BigDecimal x = omega.toBigDecimal(mc).divide(BigDecimal.valueOf(2).pow(k), mc);
        BigDecimal x2 = x.multiply(x, mc);
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(mc.getPrecision() + 2);
        BigDecimal cos = BigDecimal.ONE;
        BigDecimal sin = x;
        BigDecimal termCos = BigDecimal.ONE;
        BigDecimal termSin = x;
        for (int i = 1; termCos.abs().compareTo(tiny) > 0 || termSin.abs().compareTo(tiny) > 0; i++) {
            termCos = termCos.multiply(x2, mc).divide(BigDecimal.valueOf(-(2L * i - 1) * (2L * i)), mc);
            termSin = termSin.multiply(x2, mc).divide(BigDecimal.valueOf(-(2L * i) * (2L * i + 1)), mc);
            cos = cos.add(termCos, mc);
            sin = sin.add(termSin, mc);
        }
        for (int i = 0; i < k; i++) {
            BigDecimal nextSin = sin.multiply(cos, mc).multiply(BigDecimal.valueOf(2), mc);
            cos = cos.multiply(cos, mc).subtract(sin.multiply(sin, mc), mc);
            sin = nextSin;
        }
        return new BigDecimal[] {cos.round(new MathContext(digits)), sin.round(new MathContext(digits))};
    }
}
