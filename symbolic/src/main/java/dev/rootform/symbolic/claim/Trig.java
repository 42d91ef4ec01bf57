package dev.rootform.symbolic.claim;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * cos and sin of 2πj/m in decimal, for showing an exact number that has no shorter exact form:
 * π by Machin's formula π/4 = 4·arctan(1/5) − arctan(1/239), then the Taylor series of cos and sin
 * after reducing the angle to [0, π/4] by symmetry (common practice).
 */
final class Trig {
    private Trig() {
    }

    /** {cos(2πj/m), sin(2πj/m)}. */
    static BigDecimal[] cosSinTwoPi(int j, int m, MathContext mc) {
        MathContext wide = new MathContext(mc.getPrecision() + 10);
        // reduce to an eighth of a turn: 8j/m = octant + fraction
        int k = Math.floorMod(j, m);
        int octant = (int) ((8L * k) / m);
        BigDecimal rest = BigDecimal.valueOf(8L * k - (long) octant * m).divide(BigDecimal.valueOf(m), wide);
        BigDecimal quarterPi = pi(wide).divide(BigDecimal.valueOf(4), wide);
        boolean mirrored = octant % 2 == 1;
        BigDecimal x = (mirrored ? BigDecimal.ONE.subtract(rest) : rest).multiply(quarterPi, wide);
        BigDecimal c = series(x, 0, wide);
        BigDecimal s = series(x, 1, wide);
        // within the quarter turn: octant 0: (c, s); octant 1: (s, c) mirrored about π/4
        BigDecimal cos = mirrored ? s : c;
        BigDecimal sin = mirrored ? c : s;
        for (int q = 0; q < octant / 2; q++) {
            BigDecimal turned = sin.negate();
            sin = cos;
            cos = turned;
        }
        return new BigDecimal[] {cos.round(mc), sin.round(mc)};
    }

    /** Σ (−1)^i x^(2i+start)/(2i+start)!: cos for start 0, sin for start 1. */
    private static BigDecimal series(BigDecimal x, int start, MathContext mc) {
        BigDecimal term = start == 0 ? BigDecimal.ONE : x;
        BigDecimal sum = term;
        BigDecimal x2 = x.multiply(x, mc);
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(mc.getPrecision() + 2);
        for (int n = start + 2; term.abs().compareTo(tiny) > 0; n += 2) {
            term = term.multiply(x2, mc).divide(BigDecimal.valueOf((long) n * (n - 1)), mc).negate();
            sum = sum.add(term, mc);
        }
        return sum;
    }

    static BigDecimal pi(MathContext mc) {
        MathContext wide = new MathContext(mc.getPrecision() + 5);
        BigDecimal a = arctanInverse(5, wide).multiply(BigDecimal.valueOf(16), wide);
        BigDecimal b = arctanInverse(239, wide).multiply(BigDecimal.valueOf(4), wide);
        return a.subtract(b, wide).round(mc);
    }

    /** arctan(1/x) = Σ (−1)^i/((2i+1)·x^(2i+1)). */
    private static BigDecimal arctanInverse(int x, MathContext mc) {
        BigDecimal power = BigDecimal.ONE.divide(BigDecimal.valueOf(x), mc);
        BigDecimal x2 = BigDecimal.valueOf((long) x * x);
        BigDecimal sum = power;
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(mc.getPrecision() + 2);
        for (int n = 3; power.compareTo(tiny) > 0; n += 2) {
            power = power.divide(x2, mc);
            BigDecimal term = power.divide(BigDecimal.valueOf(n), mc);
            sum = ((n / 2) % 2 == 1) ? sum.subtract(term, mc) : sum.add(term, mc);
        }
        return sum;
    }
}
