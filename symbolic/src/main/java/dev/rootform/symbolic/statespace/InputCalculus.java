package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.model.InputException;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Exact operations on an input written as forcing terms c·v^p·(e^{rt} or r^n)·(1, cos ωv, sin ωv):
 * the derivative d/dt (continuous), the forward shift u[n] → u[n+1] (discrete), sums with rational
 * weights, and values at a point. Each result is again such a sum, with like terms merged and zero
 * terms dropped.
 *
 * @since 0.3
 */
public final class InputCalculus {
    private InputCalculus() {
    }

    /** The constant c: rate 0 (continuous) or base 1 (discrete). */
    public static ForcingTerm constant(Domain domain, Rational c) {
        Rational exponential = domain == Domain.DIFFERENTIAL ? Rational.ZERO : Rational.ONE;
        return new ForcingTerm(c, 0, exponential, Oscillation.NONE, Rational.ZERO, false);
    }

    /**
     * The derivative (continuous) or the forward shift (discrete) of an input.
     *
     * @throws InputException when the result has no exact form here: a continuous input at a
     *     frequency qπ (its derivative brings in π), or a discrete input at a frequency qπ other
     *     than a multiple of π/2 (its shift needs cos qπ and sin qπ as rationals)
     */
    public static List<ForcingTerm> next(Domain domain, List<ForcingTerm> u) {
        List<ForcingTerm> out = new ArrayList<>();
        for (ForcingTerm t : u) {
            if (domain == Domain.DIFFERENTIAL) {
                derivative(t, out);
            } else {
                shift(t, out);
            }
        }
        return merged(out);
    }

    /** Σ weights[l]·u_l. */
    public static List<ForcingTerm> combination(List<Rational> weights, List<List<ForcingTerm>> inputs) {
        List<ForcingTerm> out = new ArrayList<>();
        for (int l = 0; l < weights.size(); l++) {
            Rational w = weights.get(l);
            if (!w.isZero()) {
                inputs.get(l).forEach(t -> out.add(scaled(t, w)));
            }
        }
        return merged(out);
    }

    /**
     * The value at t = 0 (continuous) or at the index n (discrete).
     *
     * @throws InputException for a discrete oscillation at a frequency that is not a multiple of π/2
     */
    public static Rational valueAt(Domain domain, List<ForcingTerm> u, long n) {
        Rational sum = Rational.ZERO;
        for (ForcingTerm t : u) {
            if (domain == Domain.DIFFERENTIAL) {
                boolean survives = t.power() == 0 && t.oscillation() != Oscillation.SIN;
                sum = sum.add(survives ? t.coefficient() : Rational.ZERO);
                continue;
            }
            Rational nn = Rational.of(n);
            Rational v = t.coefficient().multiply(t.power() == 0 ? Rational.ONE : nn.pow(t.power()))
                    .multiply(t.exponential().pow(Math.toIntExact(n)));
            if (t.oscillation() != Oscillation.NONE) {
                int[] cs = quarterTurns(t, n);
                v = v.multiply(Rational.of(t.oscillation() == Oscillation.COS ? cs[0] : cs[1]));
            }
            sum = sum.add(v);
        }
        return sum;
    }

    /** d/dt of c·t^p·e^{rt}·osc(ωt), ω rational. */
    private static void derivative(ForcingTerm t, List<ForcingTerm> out) {
        if (t.oscillation() != Oscillation.NONE && t.frequencyTimesPi()) {
            throw new InputException("a continuous input at a frequency that is a multiple of π is out of scope of"
                    + " system (the state equations need its derivatives, which bring in π)", "", -1);
        }
        if (t.power() > 0) {
            out.add(with(t, t.coefficient().multiply(t.power()), t.power() - 1, t.oscillation()));
        }
        if (!t.exponential().isZero()) {
            out.add(with(t, t.coefficient().multiply(t.exponential()), t.power(), t.oscillation()));
        }
        if (t.oscillation() == Oscillation.COS) {
            out.add(with(t, t.coefficient().multiply(t.frequency()).negate(), t.power(), Oscillation.SIN));
        } else if (t.oscillation() == Oscillation.SIN) {
            out.add(with(t, t.coefficient().multiply(t.frequency()), t.power(), Oscillation.COS));
        }
    }

    /** c·(n+1)^p·r^{n+1}·osc(θ(n+1)) expanded, θ a multiple of π/2. */
    private static void shift(ForcingTerm t, List<ForcingTerm> out) {
        int cos = 1;
        int sin = 0;
        if (t.oscillation() != Oscillation.NONE) {
            int[] cs = quarterTurns(t, 1);
            cos = cs[0];
            sin = cs[1];
        }
        BigInteger binomial = BigInteger.ONE;
        for (int q = t.power(); q >= 0; q--) {
            Rational c = t.coefficient().multiply(Rational.of(binomial)).multiply(t.exponential());
            if (t.oscillation() == Oscillation.NONE) {
                out.add(with(t, c, q, Oscillation.NONE));
            } else {
                // cos(θn + θ) = cosθ·cos θn − sinθ·sin θn; sin(θn + θ) = sinθ·cos θn + cosθ·sin θn
                boolean isCos = t.oscillation() == Oscillation.COS;
                out.add(with(t, c.multiply(isCos ? cos : sin), q, Oscillation.COS));
                out.add(with(t, c.multiply(isCos ? -sin : cos), q, Oscillation.SIN));
            }
            binomial = binomial.multiply(BigInteger.valueOf(q)).divide(BigInteger.valueOf(t.power() - q + 1));
        }
    }

    /**
     * (cos θn, sin θn) for θ = qπ with 2q an integer: each is -1, 0 or 1.
     *
     * @throws InputException for other frequencies
     */
    private static int[] quarterTurns(ForcingTerm t, long n) {
        Rational twice = t.frequency().multiply(2);
        if (!t.frequencyTimesPi() || !twice.isInteger()) {
            throw new InputException("a discrete input with cos or sin at frequency " + t.frequency()
                    + (t.frequencyTimesPi() ? "π" : "") + " is out of scope of system (frequencies that are multiples"
                    + " of π/2 only: the state recurrences shift the input, which needs cos and sin of the frequency"
                    + " as rationals)", "", -1);
        }
        int turns = Math.floorMod(twice.toBigInteger().multiply(BigInteger.valueOf(n)).intValue(), 4);
        int[][] table = {{1, 0}, {0, 1}, {-1, 0}, {0, -1}};
        return table[turns];
    }

    private static ForcingTerm with(ForcingTerm t, Rational c, int power, Oscillation oscillation) {
        boolean none = oscillation == Oscillation.NONE;
        return new ForcingTerm(c, power, t.exponential(), oscillation, none ? Rational.ZERO : t.frequency(),
                !none && t.frequencyTimesPi());
    }

    private static ForcingTerm scaled(ForcingTerm t, Rational w) {
        return with(t, t.coefficient().multiply(w), t.power(), t.oscillation());
    }

    /** Like terms (same power, exponential and oscillation) added; zero terms dropped. */
    private static List<ForcingTerm> merged(List<ForcingTerm> terms) {
        Map<ForcingTerm, Rational> sums = new LinkedHashMap<>();
        for (ForcingTerm t : terms) {
            sums.merge(with(t, Rational.ONE, t.power(), t.oscillation()), t.coefficient(), Rational::add);
        }
        List<ForcingTerm> out = new ArrayList<>();
        sums.forEach((shape, c) -> {
            if (!c.isZero()) {
                out.add(with(shape, c, shape.power(), shape.oscillation()));
            }
        });
        return List.copyOf(out);
    }
}
