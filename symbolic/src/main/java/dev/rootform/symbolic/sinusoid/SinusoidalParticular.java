package dev.rootform.symbolic.sinusoid;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.Objects;

/**
 * A particular solution Σ_j n^j·r^n·(A_j·cos(ωn) + B_j·sin(ωn)) of a recurrence, with exact
 * constants A_j, B_j in Q(c)[s] (c = cos ω, s = sin ω).
 *
 * @param frequency ω &gt; 0, a rational
 * @param base r, the nonzero base of the exponential factor (1 when there is none)
 * @param cosine A_0..A_m
 * @param sine B_0..B_m
 * @since 0.1
 */
public record SinusoidalParticular(Rational frequency, Rational base, List<TrigNumber> cosine, List<TrigNumber> sine) {
    public SinusoidalParticular {
        Objects.requireNonNull(frequency, "frequency");
        Objects.requireNonNull(base, "base");
        cosine = List.copyOf(cosine);
        sine = List.copyOf(sine);
        if (cosine.size() != sine.size()) {
            throw new IllegalArgumentException("as many cosine as sine constants are needed");
        }
        if (frequency.signum() <= 0) {
            throw new IllegalArgumentException("the frequency must be positive");
        }
    }

    /** m, the highest power of n. */
    public int degree() {
        return cosine.size() - 1;
    }

    /** The exact value at n in Q(c)[s], with cos(ωn) = T_n(c) and sin(ωn) = s·U_{n−1}(c). */
    public TrigNumber valueAt(long n) {
        TrigNumber cosAtN = TrigNumber.cosineOfMultiple(n);
        TrigNumber sinAtN = TrigNumber.sineOfMultiple(n);
        TrigNumber sum = TrigNumber.ZERO;
        Rational power = Rational.ONE;
        for (int j = 0; j <= degree(); j++) {
            sum = sum.add(cosine.get(j).multiply(cosAtN).add(sine.get(j).multiply(sinAtN)).multiply(power));
            power = power.multiply(Rational.of(n));
        }
        return sum.multiply(base.pow(Math.toIntExact(n)));
    }

    /**
     * The value at n, exact at a point (c, s) = (cos ω, sin ω) given with cos(ωn), sin(ωn).
     *
     * @param cosOmega c at the point
     * @param sinOmega s at the point
     * @param cosAtN cos(ωn) at the point
     * @param sinAtN sin(ωn) at the point
     */
    public Rational value(long n, Rational cosOmega, Rational sinOmega, Rational cosAtN, Rational sinAtN) {
        Rational sum = Rational.ZERO;
        Rational power = Rational.ONE;
        for (int j = 0; j <= degree(); j++) {
            sum = sum.add(power.multiply(cosine.get(j).evaluate(cosOmega, sinOmega).multiply(cosAtN)
                    .add(sine.get(j).evaluate(cosOmega, sinOmega).multiply(sinAtN))));
            power = power.multiply(n);
        }
        return sum.multiply(base.pow(Math.toIntExact(n)));
    }
}
