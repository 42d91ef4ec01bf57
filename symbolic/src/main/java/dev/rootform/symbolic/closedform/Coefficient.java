package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.sinusoid.CosineSine;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The coefficient of a basis function: an exact real number, an exact number built from cos ω and
 * sin ω of a sampled sinusoid, or a free constant of the general solution.
 *
 * @since 0.1
 */
public sealed interface Coefficient permits Coefficient.Exact, Coefficient.Trig, Coefficient.Free {
    /** An exact real coefficient. */
    record Exact(Surd value) implements Coefficient {
        public Exact {
            Objects.requireNonNull(value, "value");
        }
    }

    /**
     * The exact real number Σ_ω (a_ω + b_ω·√r) with a_ω, b_ω in Q(cos ω)[sin ω] (cos ω and sin ω kept
     * as named exact quantities; see {@link TrigNumber}), for a recurrence forced at the frequencies ω:
     * one part per frequency, each exact in its own field.
     *
     * @param parts the parts, at distinct frequencies, none zero
     * @param radicand r, squarefree, 1 when there is no square root
     */
    record Trig(List<Part> parts, BigInteger radicand) implements Coefficient {
        /**
         * a + b·√r in Q(cos ω)[sin ω](√r).
         *
         * @param frequency ω, a positive rational
         * @param rational a
         * @param radical b (zero when r = 1)
         */
        public record Part(Rational frequency, TrigNumber rational, TrigNumber radical) {
            public Part {
                Objects.requireNonNull(frequency, "frequency");
                Objects.requireNonNull(rational, "rational");
                Objects.requireNonNull(radical, "radical");
            }

            boolean isRational() {
                return rational.isRational() && radical.isRational();
            }
        }

        public Trig {
            parts = List.copyOf(parts);
            Objects.requireNonNull(radicand, "radicand");
        }

        /**
         * The value rounded to {@code context}, from cos ω and sin ω ({@link CosineSine}) at two working
         * precisions 20 digits apart that agree to the digits asked (raised up to 10 times, then the
         * more precise one is returned).
         */
        public BigDecimal toBigDecimal(MathContext context) {
            int digits = context.getPrecision();
            int working = digits + 20;
            BigDecimal high = at(working + 20);
            for (int round = 0; round < 10; round++) {
                BigDecimal low = at(working);
                BigDecimal difference = low.subtract(high).abs();
                if (difference.compareTo(high.abs().movePointLeft(digits + 1)) <= 0 || difference.signum() == 0) {
                    break;
                }
                working += 40;
                high = at(working + 20);
            }
            return high.round(context);
        }

        private BigDecimal at(int working) {
            MathContext mc = new MathContext(working);
            Rational root = Rational.of(Surd.sqrt(Rational.of(radicand)).toBigDecimal(mc));
            Rational sum = Rational.ZERO;
            for (Part p : parts) {
                BigDecimal[] cs = CosineSine.of(p.frequency(), working);
                Rational c = Rational.of(cs[0]);
                Rational s = Rational.of(cs[1]);
                sum = sum.add(p.rational().evaluate(c, s)).add(p.radical().evaluate(c, s).multiply(root));
            }
            return sum.toBigDecimal(mc);
        }

        /**
         * Σ parts, as an {@link Exact} surd when every part is rational (no cos ω, no sin ω); the
         * rational parts are gathered into the first other part, zero parts left out.
         */
        public static Coefficient of(List<Part> parts, BigInteger radicand) {
            Rational a = Rational.ZERO;
            Rational b = Rational.ZERO;
            List<Part> kept = new ArrayList<>();
            for (Part p : parts) {
                if (p.isRational()) {
                    a = a.add(p.rational().toRational());
                    b = b.add(p.radical().toRational());
                } else {
                    kept.add(p);
                }
            }
            if (kept.isEmpty()) {
                return new Exact(b.isZero() ? Surd.of(a) : Surd.of(a, b, Rational.of(radicand)));
            }
            Part first = kept.get(0);
            kept.set(0, new Part(first.frequency(), first.rational().add(TrigNumber.of(a)), first.radical().add(TrigNumber.of(b))));
            boolean root = kept.stream().anyMatch(p -> !p.radical().isZero());
            return new Trig(kept, root ? radicand : BigInteger.ONE);
        }
    }

    /** A free constant such as {@code C1}. */
    record Free(String name) implements Coefficient {
        public Free {
            Objects.requireNonNull(name, "name");
        }
    }

    /** True for an exact zero (a term with this coefficient can be left out). */
    default boolean isZero() {
        return this instanceof Exact e && e.value().isZero();
    }
}
