package dev.rootform.symbolic.closedform;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.List;
import java.util.Objects;

/**
 * One term of a closed form, in the variable v = t - t0 (differential) or v = n (difference).
 * Every term is real.
 *
 * @since 0.1
 */
public sealed interface Term permits Term.Exponential, Term.Oscillating, Term.ConjugateSum {
    /** The power i of the factor v^i. */
    int power();

    /** The coefficients of the term, in order (cos before sin; α^0, α^1, … for a conjugate sum). */
    List<Coefficient> coefficients();

    /** The same term with other coefficients, in the order of {@link #coefficients()}. */
    Term withCoefficients(List<Coefficient> replacement);

    /** True when every coefficient is an exact zero (the term can be left out). */
    default boolean vanishes() {
        return coefficients().stream().allMatch(Coefficient::isZero);
    }

    /** coefficient·v^power·e^{rate·v} (differential) or coefficient·v^power·rate^v (difference). */
    record Exponential(Coefficient coefficient, int power, Surd rate) implements Term {
        public Exponential {
            Objects.requireNonNull(coefficient, "coefficient");
            Objects.requireNonNull(rate, "rate");
        }

        @Override
        public List<Coefficient> coefficients() {
            return List.of(coefficient);
        }

        @Override
        public Term withCoefficients(List<Coefficient> replacement) {
            return new Exponential(replacement.get(0), power, rate);
        }
    }

    /**
     * v^power·e^{growth·v}·(cosine·cos(ω v) + sine·sin(ω v)) (differential; growth = real part of
     * the root, ω = imaginary part) or v^power·growth^v·(cosine·cos(θ v) + sine·sin(θ v))
     * (difference; growth = modulus of the root, θ = its argument in (0, π)).
     */
    record Oscillating(Coefficient cosine, Coefficient sine, int power, Surd growth, Angle angle) implements Term {
        public Oscillating {
            Objects.requireNonNull(cosine, "cosine");
            Objects.requireNonNull(sine, "sine");
            Objects.requireNonNull(growth, "growth");
            Objects.requireNonNull(angle, "angle");
        }

        @Override
        public List<Coefficient> coefficients() {
            return List.of(cosine, sine);
        }

        @Override
        public Term withCoefficients(List<Coefficient> replacement) {
            return new Oscillating(replacement.get(0), replacement.get(1), power, growth, angle);
        }
    }

    /**
     * A conjugate sum: Σ over the roots α of the irreducible {@code factor} (all conjugates of one
     * algebraic number) of c(α)·v^power·e^{αv} (or α^v), with c(α) = Σ_j coefficients[j]·α^j; real
     * because the sum runs over all conjugates. Used for factors of degree &ge; 3 other than the
     * cyclotomic quartics Φ_8 and Φ_12 (which become cos/sin pairs), and for a quadratic or such
     * quartic factor whose coefficients would need a second square root next to √r from the forcing.
     */
    record ConjugateSum(RationalPolynomial factor, List<Coefficient> coefficients, int power) implements Term {
        public ConjugateSum {
            Objects.requireNonNull(factor, "factor");
            coefficients = List.copyOf(coefficients);
        }

        @Override
        public Term withCoefficients(List<Coefficient> replacement) {
            return new ConjugateSum(factor, replacement, power);
        }

        /**
         * The sum with every exact coefficient a + b√r replaced by its conjugate a − b√r (free ones kept):
         * c'(α) for {@link #vanishesAtSomeRoots}.
         */
        public ConjugateSum conjugated() {
            return new ConjugateSum(factor, coefficients.stream().map(c -> c instanceof Coefficient.Exact e && !e.value().isRational()
                    ? (Coefficient) new Coefficient.Exact(Surd.of(e.value().rational(), e.value().coefficient().negate(),
                            dev.rootform.symbolic.algebra.Rational.of(e.value().radicand())))
                    : c).toList(), power);
        }

        /**
         * Whether c(α) = a(α) + √r·b(α) vanishes exactly at some roots α of the factor (coefficients
         * that carry the √r of a forcing; all exact): then c(α)·c'(α) = a(α)² − r·b(α)² = 0, so the
         * irreducible factor divides a² − r·b²; conversely, when it does, c or c' (of {@link #conjugated})
         * vanishes at each root, and at a root where c' vanishes and c does not,
         * |c(α)| = 2√r·|b(α)| &gt; |c'(α)| = 0. So when this holds, a root with |c(α)| &lt; |c'(α)|
         * (at any precision that tells them apart) has c(α) = 0 exactly, and contributes no mode.
         */
        public boolean vanishesAtSomeRoots() {
            List<dev.rootform.symbolic.algebra.Rational> a = new java.util.ArrayList<>();
            List<dev.rootform.symbolic.algebra.Rational> b = new java.util.ArrayList<>();
            dev.rootform.symbolic.algebra.Rational radicand = dev.rootform.symbolic.algebra.Rational.ONE;
            for (Coefficient c : coefficients) {
                if (!(c instanceof Coefficient.Exact e)) {
                    return false;
                }
                a.add(e.value().rational());
                b.add(e.value().coefficient());
                radicand = e.value().isRational() ? radicand : dev.rootform.symbolic.algebra.Rational.of(e.value().radicand());
            }
            RationalPolynomial pa = RationalPolynomial.of(a);
            RationalPolynomial pb = RationalPolynomial.of(b);
            return !pb.isZero() && pa.multiply(pa).subtract(pb.multiply(pb).multiply(radicand)).mod(factor).isZero();
        }
    }
}
