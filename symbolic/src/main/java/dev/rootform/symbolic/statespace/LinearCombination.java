package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Σ w_k·s_k for solutions s_k of one homogeneous equation, with rational weights, in both exact
 * forms: the number-field components (coefficient by coefficient) and the real closed form (like
 * terms added, in the order of the basis of the general solution, zero terms dropped). Both are
 * linear in the solution, so the sums describe the same function.
 *
 * @since 0.3
 */
public final class LinearCombination {
    private LinearCombination() {
    }

    /** Σ w_k·s_k; the solutions share the equation's operator, factors and origin. */
    public static ExactSolution of(List<ExactSolution> solutions, List<Rational> weights) {
        ExactSolution first = solutions.get(0);
        List<Component> components = new ArrayList<>();
        for (int c = 0; c < first.components().size(); c++) {
            Component base = first.components().get(c);
            List<RationalPolynomial> sum = new ArrayList<>();
            for (int i = 0; i < base.coefficients().size(); i++) {
                RationalPolynomial s = RationalPolynomial.ZERO;
                for (int k = 0; k < solutions.size(); k++) {
                    s = s.add(solutions.get(k).components().get(c).coefficients().get(i).multiply(weights.get(k)));
                }
                sum.add(s);
            }
            components.add(new Component(base.factor(), sum));
        }
        return new ExactSolution(first.equation(), first.forcingPart(), first.operator(), first.origin(), first.validFrom(),
                leading(solutions.stream().map(ExactSolution::leadingValues).toList(), weights), components);
    }

    /**
     * Σ w_k·f_k for fitted closed forms of one homogeneous equation.
     *
     * @param basis the general solution of the equation, whose terms fix the order
     */
    public static ClosedForm of(ClosedForm basis, List<ClosedForm> forms, List<Rational> weights) {
        Map<Term, Term> sums = new LinkedHashMap<>();
        basis.terms().forEach(t -> sums.put(shape(t), null));
        for (int k = 0; k < forms.size(); k++) {
            Rational w = weights.get(k);
            if (w.isZero()) {
                continue;
            }
            for (Term t : forms.get(k).terms()) {
                Term scaled = scale(t, w);
                sums.merge(shape(t), scaled, LinearCombination::add);
            }
        }
        List<Term> terms = sums.values().stream().filter(t -> t != null && !t.vanishes()).toList();
        ClosedForm first = forms.get(0);
        return new ClosedForm(first.domain(), first.function(), first.variable(), first.origin(), first.validFrom(),
                leading(forms.stream().map(ClosedForm::leadingValues).toList(), weights), terms, List.of());
    }

    /** The term with every coefficient cleared: what like terms share. */
    private static Term shape(Term t) {
        if (t instanceof Term.ConjugateSum r) {
            return new Term.ConjugateSum(r.factor(), List.of(), r.power());
        }
        return t.withCoefficients(t.coefficients().stream().map(c -> (Coefficient) new Coefficient.Free("")).toList());
    }

    private static Term scale(Term t, Rational w) {
        return t.withCoefficients(t.coefficients().stream().map(c -> (Coefficient) new Coefficient.Exact(value(c).multiply(w)))
                .toList());
    }

    private static Term add(Term a, Term b) {
        List<Coefficient> x = a.coefficients();
        List<Coefficient> y = b.coefficients();
        List<Coefficient> sum = new ArrayList<>();
        for (int i = 0; i < Math.max(x.size(), y.size()); i++) {
            Surd p = i < x.size() ? value(x.get(i)) : Surd.of(Rational.ZERO);
            Surd q = i < y.size() ? value(y.get(i)) : Surd.of(Rational.ZERO);
            sum.add(new Coefficient.Exact(add(p, q)));
        }
        if (a instanceof Term.ConjugateSum) {
            while (sum.size() > 1 && sum.get(sum.size() - 1).isZero()) {
                sum.remove(sum.size() - 1);
            }
            return ((Term.ConjugateSum) a).withCoefficients(sum);
        }
        return a.withCoefficients(sum);
    }

    /** p + q for surds with the same radicand (or rational). */
    static Surd add(Surd p, Surd q) {
        if (p.isRational() && q.isRational()) {
            return Surd.of(p.rational().add(q.rational()));
        }
        if (!p.isRational() && !q.isRational() && !p.radicand().equals(q.radicand())) {
            throw new IllegalArgumentException("different radicands: " + p + " + " + q);
        }
        java.math.BigInteger r = p.isRational() ? q.radicand() : p.radicand();
        return Surd.of(p.rational().add(q.rational()), p.coefficient().add(q.coefficient()), Rational.of(r));
    }

    private static Surd value(Coefficient c) {
        if (c instanceof Coefficient.Exact e) {
            return e.value();
        }
        throw new IllegalArgumentException("free constant " + c + " in a fitted closed form");
    }

    private static List<Rational> leading(List<List<Rational>> values, List<Rational> weights) {
        List<Rational> sum = new ArrayList<>();
        for (int i = 0; i < values.get(0).size(); i++) {
            Rational s = Rational.ZERO;
            for (int k = 0; k < values.size(); k++) {
                s = s.add(values.get(k).get(i).multiply(weights.get(k)));
            }
            sum.add(s);
        }
        return sum;
    }
}
