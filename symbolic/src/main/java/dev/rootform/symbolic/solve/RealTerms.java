package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.Supplier;

/**
 * The real closed-form terms of one factor f of the operator and one power v^i: Σ over the roots α
 * of f of c(α)·v^i·e^{αv} (or α^v) written without i. Linear factors give exponentials or powers;
 * quadratic factors give surd roots or (for complex pairs) cos/sin terms; the cyclotomic quartics
 * Φ_8 and Φ_12, whose roots have surd real and imaginary parts, give one cos/sin pair per conjugate
 * pair; other factors of degree &ge; 3 stay conjugate sums over their roots. For f = x² + bx + c and
 * c(α) = p + qα: real roots (-b ± √D)/2 take coefficients p - qb/2 ± (q/2)√D; complex roots a ± iω
 * combine to 2(p + qa)·cos - 2qω·sin.
 */
final class RealTerms {
    private RealTerms() {
    }

    /** f = x² + bx + c with a = -b/2 and discriminant D = b² - 4c. */
    record Quadratic(Rational a, Rational disc, Rational c) {
        Quadratic(RationalPolynomial f) {
            this(f.coefficient(1).multiply(Rational.of(-1, 2)),
                    f.coefficient(1).multiply(f.coefficient(1)).subtract(f.coefficient(0).multiply(4)), f.coefficient(0));
        }

        boolean real() {
            return disc.signum() > 0;
        }

        /** ω = √(-D)/2 for complex roots a ± iω. */
        Surd omega() {
            return Surd.of(Rational.ZERO, Rational.of(1, 2), disc.negate());
        }
    }

    /** The terms of c(α)·v^i over the roots of f, with c(α) = Σ_j c_j α^j. */
    static List<Term> of(Domain domain, RationalPolynomial f, int i, RationalPolynomial c) {
        List<Surd> cs = new ArrayList<>();
        for (int j = 0; j <= c.degree(); j++) {
            cs.add(Surd.of(c.coefficient(j)));
        }
        return of(domain, f, i, cs);
    }

    /**
     * The terms of c(α)·v^i over the roots of f, with c(α) = Σ_j c_j α^j and surd c_j: an
     * exponential for a linear f; for a quadratic f and for the cyclotomic factors of degree 4 whose
     * roots have surd parts (Φ_8 = λ^4 + 1, Φ_12 = λ^4 - λ^2 + 1) real exponentials or cos/sin pairs
     * with coefficients in the same real quadratic field; otherwise (degree &ge; 3, or coefficients
     * that would need a second square root) a conjugate sum.
     */
    static List<Term> of(Domain domain, RationalPolynomial f, int i, List<Surd> c) {
        if (f.degree() == 1) {
            return List.of(new Term.Exponential(exact(at(c, 0)), i, Surd.of(f.coefficient(0).negate())));
        }
        try {
            if (f.degree() == 2) {
                return quadraticTerms(domain, f, i, c);
            }
            Optional<List<Term>> pairs = cyclotomicPairs(domain, f, i, c);
            if (pairs.isPresent()) {
                return pairs.get();
            }
        } catch (ArithmeticException secondRoot) {
            // a coefficient a + b√r times a root part in Q(√s), s ≠ r: no single surd; keep the sum
        }
        List<Coefficient> cs = c.stream().map(RealTerms::exact).toList();
        return List.of(new Term.ConjugateSum(f, cs, i));
    }

    /**
     * f = x² + bx + c: real roots a ± ½√D take C0 + C1·(a ± ½√D); complex roots a ± iω combine to
     * 2(C0 + C1·a)·cos - 2C1·ω·sin. @throws ArithmeticException if a product needs two radicands
     */
    private static List<Term> quadraticTerms(Domain domain, RationalPolynomial f, int i, List<Surd> c) {
        Quadratic q = new Quadratic(f);
        Surd c0 = at(c, 0);
        Surd c1 = at(c, 1);
        if (q.real()) {
            Surd plus = Surd.of(q.a(), Rational.of(1, 2), q.disc());
            Surd minus = Surd.of(q.a(), Rational.of(-1, 2), q.disc());
            return List.of(new Term.Exponential(exact(c0.add(c1.multiply(plus))), i, plus),
                    new Term.Exponential(exact(c0.add(c1.multiply(minus))), i, minus));
        }
        Coefficient cosine = exact(c0.add(c1.multiply(Surd.of(q.a()))).multiply(Rational.of(2)));
        Coefficient sine = exact(c1.multiply(q.omega()).multiply(Rational.of(-2)));
        return List.of(oscillating(domain, q, cosine, sine, i));
    }

    /**
     * For f = Φ_8 or Φ_12 (degree 4, roots e^{iθ} with cos θ and sin θ in Q(√2) or Q(√3)): per
     * conjugate pair θ = 2πk/N, 0 &lt; k &lt; N/2, the real term 2·Re c(α)·cos - 2·Im c(α)·sin of
     * c(α)α^v + c(ᾱ)ᾱ^v (difference: cos(θv), growth 1; differential: e^{cos θ·v}·cos(sin θ·v));
     * empty for other factors. @throws ArithmeticException if a coefficient has another radicand
     */
    private static Optional<List<Term>> cyclotomicPairs(Domain domain, RationalPolynomial f, int i, List<Surd> c) {
        OptionalInt order = f.degree() == 4 ? Cyclotomic.order(f) : OptionalInt.empty();
        if (order.isEmpty() || (order.getAsInt() != 8 && order.getAsInt() != 12)) {
            return Optional.empty();
        }
        int n = order.getAsInt();
        List<Term> terms = new ArrayList<>();
        for (int k : pairIndices(n)) {
            Rational theta = Rational.of(2L * k, n);
            Surd re = Surd.of(Rational.ZERO);
            Surd im = Surd.of(Rational.ZERO);
            for (int j = 0; j < c.size(); j++) {
                re = re.add(c.get(j).multiply(cosPi(theta.multiply(j))));
                im = im.add(c.get(j).multiply(sinPi(theta.multiply(j))));
            }
            terms.add(pair(domain, theta, exact(re.multiply(Rational.of(2))), exact(im.multiply(Rational.of(-2))), i));
        }
        return Optional.of(terms);
    }

    /** k with 0 &lt; k &lt; N/2 and gcd(k, N) = 1: one root e^{2πik/N} of each conjugate pair of Φ_N. */
    private static List<Integer> pairIndices(int n) {
        List<Integer> ks = new ArrayList<>();
        for (int k = 1; 2 * k < n; k++) {
            if (java.math.BigInteger.valueOf(k).gcd(java.math.BigInteger.valueOf(n)).intValue() == 1) {
                ks.add(k);
            }
        }
        return ks;
    }

    /** The real term of the pair e^{±iθπ}: cos/sin(θπ·v) (difference) or e^{cos(θπ)v}·cos/sin(sin(θπ)·v) (differential). */
    private static Term pair(Domain domain, Rational theta, Coefficient cosine, Coefficient sine, int i) {
        if (domain == Domain.DIFFERENCE) {
            return new Term.Oscillating(cosine, sine, i, Surd.of(Rational.ONE), new Angle.PiMultiple(theta));
        }
        return new Term.Oscillating(cosine, sine, i, cosPi(theta), new Angle.Value(sinPi(theta)));
    }

    private static Surd cosPi(Rational q) {
        CosineTable.Value v = CosineTable.cosPi(q).orElseThrow(() -> new ArithmeticException("cos(" + q + "π) is not a surd"));
        return Surd.of(v.rational(), v.radical(), Rational.of(v.radicand()));
    }

    private static Surd sinPi(Rational q) {
        return cosPi(q.subtract(Rational.of(1, 2)));
    }

    private static Surd at(List<Surd> c, int j) {
        return j < c.size() ? c.get(j) : Surd.of(Rational.ZERO);
    }

    /** The basis terms v^i·(root terms) of f, each with the next free constant. */
    static List<Term> free(Domain domain, RationalPolynomial f, int i, Supplier<Coefficient> next) {
        if (f.degree() == 1) {
            return List.of(new Term.Exponential(next.get(), i, Surd.of(f.coefficient(0).negate())));
        }
        OptionalInt order = f.degree() == 4 ? Cyclotomic.order(f) : OptionalInt.empty();
        if (order.isPresent() && (order.getAsInt() == 8 || order.getAsInt() == 12)) {
            List<Term> pairs = new ArrayList<>();
            for (int k : pairIndices(order.getAsInt())) {
                Coefficient cosine = next.get();
                pairs.add(pair(domain, Rational.of(2L * k, order.getAsInt()), cosine, next.get(), i));
            }
            return pairs;
        }
        if (f.degree() > 2) {
            List<Coefficient> cs = new ArrayList<>();
            for (int j = 0; j < f.degree(); j++) {
                cs.add(next.get());
            }
            return List.of(new Term.ConjugateSum(f, cs, i));
        }
        Quadratic q = new Quadratic(f);
        if (q.real()) {
            return List.of(new Term.Exponential(next.get(), i, Surd.of(q.a(), Rational.of(1, 2), q.disc())),
                    new Term.Exponential(next.get(), i, Surd.of(q.a(), Rational.of(-1, 2), q.disc())));
        }
        Coefficient cosine = next.get();
        return List.of(oscillating(domain, q, cosine, next.get(), i));
    }

    private static Term oscillating(Domain domain, Quadratic q, Coefficient cosine, Coefficient sine, int i) {
        if (domain == Domain.DIFFERENTIAL) {
            return new Term.Oscillating(cosine, sine, i, Surd.of(q.a()), new Angle.Value(q.omega()));
        }
        return new Term.Oscillating(cosine, sine, i, Surd.sqrt(q.c()), argument(q.a(), q.c()));
    }

    /** arg(a + iω) in (0, π) for |a + iω|² = c: a rational multiple of π when cos² is 0, 1/4, 1/2 or 3/4. */
    private static Angle argument(Rational a, Rational c) {
        Rational cos2 = a.multiply(a).divide(c);
        int sign = a.signum();
        Rational[][] table = {
            {Rational.ZERO, Rational.of(1, 2), Rational.of(1, 2)},
            {Rational.of(1, 4), Rational.of(1, 3), Rational.of(2, 3)},
            {Rational.of(1, 2), Rational.of(1, 4), Rational.of(3, 4)},
            {Rational.of(3, 4), Rational.of(1, 6), Rational.of(5, 6)},
        };
        for (Rational[] row : table) {
            if (row[0].equals(cos2)) {
                return new Angle.PiMultiple(sign >= 0 ? row[1] : row[2]);
            }
        }
        return new Angle.ArcCos(Surd.of(Rational.ZERO, a.divide(c), c));
    }

    private static Coefficient exact(Surd s) {
        return new Coefficient.Exact(s);
    }
}
