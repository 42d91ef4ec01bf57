package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Cyclotomic;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
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
 * tree, factor by factor and power by power ({@link RealTerms}).
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
                List<Term> terms = root.isZero() ? RealTerms.of(eq.domain(), c.factor().polynomial(), i, ci)
                        : radicalTerms(eq.domain(), c.factor().polynomial(), i, ci, root, radical.get().radicand());
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

    /**
     * (c(α) + √r·d(α))·v^i·α^v as real terms with surd coefficients a + b√r ({@link #terms(Domain,
     * RationalPolynomial, int, List)}), or as a conjugate sum with surd coefficients where a second
     * square root would be needed.
     */
    private static List<Term> radicalTerms(Domain domain, RationalPolynomial f, int i, RationalPolynomial c,
            RationalPolynomial d, int r) {
        Rational radicand = Rational.of(r);
        List<Surd> cs = new ArrayList<>();
        for (int j = 0; j < f.degree(); j++) {
            cs.add(Surd.of(c.coefficient(j), d.coefficient(j), radicand));
        }
        return RealTerms.of(domain, f, i, cs);
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
                terms.addAll(RealTerms.free(eq.domain(), f.polynomial(), i, next));
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
                RealTerms.Quadratic q = new RealTerms.Quadratic(p);
                if (q.real()) {
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a(), Rational.of(1, 2), q.disc()), Surd.of(Rational.ZERO), m));
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a(), Rational.of(-1, 2), q.disc()), Surd.of(Rational.ZERO), m));
                } else {
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a()), q.omega(), m));
                    roots.add(new ExactRoot.Explicit(Surd.of(q.a()), q.omega().negate(), m));
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
}
