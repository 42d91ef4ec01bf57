package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * Builds the real closed forms of a solve (fitted, general with free constants, general plus a
 * particular solution) and lists the exact roots. Exact components become the real closed-form
 * tree: linear factors give exponentials or powers, quadratic factors give surd roots or (for
 * complex pairs) cos/sin terms with no i, and factors of degree &ge; 3 stay as conjugate sums over
 * their roots. For f = x² + bx + c and
 * c(α) = p + qα: real roots (-b ± √D)/2 take coefficients p - qb/2 ± (q/2)√D; complex roots a ± iω
 * combine to 2(p + qa)·cos - 2qω·sin.
 *
 * @since 0.1
 */
final class ClosedFormBuilder {
    private ClosedFormBuilder() {
    }

    /**
     * The fitted solution; {@code characteristic} (the factors of χ) decides which terms are
     * transient (power below the factor's multiplicity in χ) and which are particular.
     */
    static ClosedForm fitted(ExactSolution s, List<Factor> characteristic) {
        return fitted(s, Optional.empty(), characteristic);
    }

    /**
     * The fitted solution x = s + √r·radical (for a forcing with values in Q(√r)); a coefficient
     * with a √r part is written as a surd a + b√r on an exponential, or as a conjugate sum with surd
     * coefficients for a factor of degree &ge; 2 (whose own surds would otherwise mix with √r).
     */
    static ClosedForm fitted(ExactSolution s, Optional<RadicalSolution> radical, List<Factor> characteristic) {
        LinearEquation eq = s.equation();
        List<Term> transients = new ArrayList<>();
        List<Term> particular = new ArrayList<>();
        for (int k = 0; k < s.components().size(); k++) {
            Component c = s.components().get(k);
            int homogeneous = multiplicity(characteristic, c.factor().polynomial());
            for (int i = 0; i < c.coefficients().size(); i++) {
                RationalPolynomial ci = c.coefficients().get(i);
                int index = k;
                int power = i;
                RationalPolynomial root = radical.map(r -> r.radical().components().get(index).coefficients().get(power))
                        .orElse(RationalPolynomial.ZERO);
                List<Term> terms = root.isZero() ? terms(eq.domain(), c.factor().polynomial(), i, ci)
                        : List.of(radicalTerm(c.factor().polynomial(), i, ci, root, radical.get().radicand()));
                (i < homogeneous ? transients : particular).addAll(terms);
            }
        }
        transients.removeIf(Term::vanishes);
        particular.removeIf(Term::vanishes);
        List<Term> all = new ArrayList<>(transients);
        all.addAll(particular);
        return new ClosedForm(eq.domain(), eq.function(), eq.variable(), s.origin(), s.validFrom(),
                s.leadingValues(), all, List.of(), transients.size());
    }

    /** (c(α) + √r·d(α))·v^i·α^v as an exponential (linear f) or a conjugate sum with surd coefficients. */
    private static Term radicalTerm(RationalPolynomial f, int i, RationalPolynomial c, RationalPolynomial d, int r) {
        Rational radicand = Rational.of(r);
        if (f.degree() == 1) {
            return new Term.Exponential(exact(Surd.of(c.coefficient(0), d.coefficient(0), radicand)), i,
                    Surd.of(f.coefficient(0).negate()));
        }
        List<Coefficient> cs = new ArrayList<>();
        for (int j = 0; j < f.degree(); j++) {
            cs.add(exact(Surd.of(c.coefficient(j), d.coefficient(j), radicand)));
        }
        return new Term.ConjugateSum(f, cs, i);
    }

    /** The general solution: basis terms with free constants, followed by a particular solution's terms. */
    static ClosedForm withParticular(ClosedForm general, ClosedForm particular) {
        List<Term> all = new ArrayList<>(general.terms());
        all.addAll(particular.particularTerms());
        return new ClosedForm(general.domain(), general.function(), general.variable(), particular.origin(),
                general.validFrom(), general.leadingValues(), all, general.freeConstants(), general.terms().size());
    }

    static int multiplicity(List<Factor> factors, RationalPolynomial f) {
        return factors.stream().filter(x -> x.polynomial().equals(f)).mapToInt(Factor::multiplicity).findFirst().orElse(0);
    }

    static ClosedForm general(LinearEquation eq, List<Factor> factors) {
        List<Term> terms = new ArrayList<>();
        List<String> names = new ArrayList<>();
        Supplier<Coefficient> next = () -> {
            names.add("C" + (names.size() + 1));
            return new Coefficient.Free(names.get(names.size() - 1));
        };
        boolean difference = eq.domain() == Domain.DIFFERENCE;
        int zeros = difference ? eq.characteristicPolynomial().zeroRootMultiplicity() : 0;
        for (Factor f : factors) {
            if (difference && f.polynomial().equals(RationalPolynomial.X)) {
                continue;
            }
            for (int i = 0; i < f.multiplicity(); i++) {
                terms.addAll(freeTerms(eq.domain(), f.polynomial(), i, next));
            }
        }
        return new ClosedForm(eq.domain(), eq.function(), eq.variable(), Rational.ZERO, zeros, List.of(), terms, names);
    }

    /** The exact roots of each factor, in factor order. */
    static List<ExactRoot> roots(List<Factor> factors) {
        List<ExactRoot> roots = new ArrayList<>();
        for (Factor f : factors) {
            RationalPolynomial p = f.polynomial();
            int m = f.multiplicity();
            if (p.degree() == 1) {
                roots.add(new ExactRoot.Explicit(Surd.of(p.coefficient(0).negate()), Surd.of(Rational.ZERO), m));
            } else if (p.degree() == 2) {
                Quadratic q = new Quadratic(p);
                if (q.real()) {
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a, Rational.of(1, 2), q.disc), Surd.of(Rational.ZERO), m));
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a, Rational.of(-1, 2), q.disc), Surd.of(Rational.ZERO), m));
                } else {
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a), q.omega(), m));
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a), q.omega().negate(), m));
                }
            } else if (Cyclotomic.order(p).isPresent()) {
                int order = Cyclotomic.order(p).getAsInt();
                for (int k = 1; k < order; k++) {
                    if (java.math.BigInteger.valueOf(k).gcd(java.math.BigInteger.valueOf(order)).intValue() == 1) {
                        roots.add(new ExactRoot.OfUnity(order, k, m));
                    }
                }
            } else {
                for (int j = 1; j <= p.degree(); j++) {
                    roots.add(new ExactRoot.Implicit(p, j, m));
                }
            }
        }
        return roots;
    }

    /** f = x² + bx + c with a = -b/2 and discriminant D = b² - 4c. */
    private static final class Quadratic {
        final Rational a;
        final Rational disc;
        final Rational c;

        Quadratic(RationalPolynomial f) {
            Rational b = f.coefficient(1);
            c = f.coefficient(0);
            a = b.multiply(Rational.of(-1, 2));
            disc = b.multiply(b).subtract(c.multiply(4));
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
    private static List<Term> terms(Domain domain, RationalPolynomial f, int i, RationalPolynomial c) {
        if (f.degree() == 1) {
            return List.of(new Term.Exponential(exact(Surd.of(c.coefficient(0))), i, Surd.of(f.coefficient(0).negate())));
        }
        if (f.degree() > 2) {
            List<Coefficient> cs = new ArrayList<>();
            for (int j = 0; j <= c.degree(); j++) {
                cs.add(exact(Surd.of(c.coefficient(j))));
            }
            return List.of(new Term.ConjugateSum(f, cs, i));
        }
        Quadratic q = new Quadratic(f);
        Rational half = c.coefficient(1).multiply(Rational.of(1, 2));
        Rational center = c.coefficient(0).add(c.coefficient(1).multiply(q.a));
        if (q.real()) {
            return List.of(
                    new Term.Exponential(exact(Surd.of(center, half, q.disc)), i, Surd.of(q.a, Rational.of(1, 2), q.disc)),
                    new Term.Exponential(exact(Surd.of(center, half.negate(), q.disc)), i, Surd.of(q.a, Rational.of(-1, 2), q.disc)));
        }
        Coefficient cosine = exact(Surd.of(center.multiply(2)));
        Coefficient sine = exact(Surd.of(Rational.ZERO, c.coefficient(1).negate(), q.disc.negate()));
        return List.of(oscillating(domain, q, cosine, sine, i));
    }

    private static List<Term> freeTerms(Domain domain, RationalPolynomial f, int i, Supplier<Coefficient> next) {
        if (f.degree() == 1) {
            return List.of(new Term.Exponential(next.get(), i, Surd.of(f.coefficient(0).negate())));
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
            return List.of(new Term.Exponential(next.get(), i, Surd.of(q.a, Rational.of(1, 2), q.disc)),
                    new Term.Exponential(next.get(), i, Surd.of(q.a, Rational.of(-1, 2), q.disc)));
        }
        Coefficient cosine = next.get();
        return List.of(oscillating(domain, q, cosine, next.get(), i));
    }

    private static Term oscillating(Domain domain, Quadratic q, Coefficient cosine, Coefficient sine, int i) {
        if (domain == Domain.DIFFERENTIAL) {
            return new Term.Oscillating(cosine, sine, i, Surd.of(q.a), new Angle.Value(q.omega()));
        }
        return new Term.Oscillating(cosine, sine, i, Surd.sqrt(q.c), argument(q.a, q.c));
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
