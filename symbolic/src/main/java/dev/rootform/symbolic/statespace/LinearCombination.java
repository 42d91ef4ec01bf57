package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Σ w_k·s_k for fixed solutions s_k of one homogeneous equation at many rational weight vectors
 * w, in both exact forms: the number-field components (coefficient by coefficient) and the real
 * closed form (like terms added, in the order of the basis of the general solution, zero terms
 * dropped). Both are linear in the solution, so the sums describe the same function. Every
 * rational that a sum combines is prepared once ({@link FixedSummands}), which makes the many sums
 * of a transition matrix cheap.
 *
 * @since 0.3
 */
public final class LinearCombination {
    private final ExactSolution first;
    /** [component][power][coefficient of the number-field polynomial]. */
    private final List<List<List<FixedSummands>>> components;
    private final List<FixedSummands> leading;
    private final ClosedForm firstForm;
    private final List<FixedSummands> formLeading;
    private final List<LikeTerms> terms;

    /** The terms of one shape across the closed forms: per coefficient, the sums of the rational and √ parts. */
    private record LikeTerms(Term shape, BigInteger radicand, List<FixedSummands> rational, List<FixedSummands> root) {
    }

    private LinearCombination(ExactSolution first, List<List<List<FixedSummands>>> components, List<FixedSummands> leading,
            ClosedForm firstForm, List<FixedSummands> formLeading, List<LikeTerms> terms) {
        this.first = first;
        this.components = components;
        this.leading = leading;
        this.firstForm = firstForm;
        this.formLeading = formLeading;
        this.terms = terms;
    }

    /**
     * @param solutions the solutions s_k, sharing the equation's operator, factors and origin
     * @param basis the general solution of the equation, whose terms fix the order of the closed form's terms
     * @param forms the fitted closed forms of the same solutions, in the same order
     */
    public static LinearCombination over(List<ExactSolution> solutions, ClosedForm basis, List<ClosedForm> forms) {
        ExactSolution first = solutions.get(0);
        List<List<List<FixedSummands>>> components = new ArrayList<>();
        for (int c = 0; c < first.components().size(); c++) {
            int component = c;
            List<List<FixedSummands>> powers = new ArrayList<>();
            for (int i = 0; i < first.components().get(c).coefficients().size(); i++) {
                int power = i;
                Function<ExactSolution, RationalPolynomial> at = s -> s.components().get(component).coefficients().get(power);
                int degree = solutions.stream().mapToInt(s -> at.apply(s).degree()).max().orElse(0);
                List<FixedSummands> coefficients = new ArrayList<>();
                for (int l = 0; l <= degree; l++) {
                    int index = l;
                    coefficients.add(new FixedSummands(solutions.stream().map(s -> at.apply(s).coefficient(index)).toList()));
                }
                powers.add(coefficients);
            }
            components.add(powers);
        }
        return new LinearCombination(first, components, leading(solutions.stream().map(ExactSolution::leadingValues).toList()),
                forms.get(0), leading(forms.stream().map(ClosedForm::leadingValues).toList()), likeTerms(basis, forms));
    }

    /** Σ w_k·s_k in number-field form. */
    public ExactSolution exact(List<Rational> weights) {
        List<Component> sum = new ArrayList<>();
        for (int c = 0; c < components.size(); c++) {
            List<RationalPolynomial> coefficients = new ArrayList<>();
            for (List<FixedSummands> power : components.get(c)) {
                coefficients.add(RationalPolynomial.of(power.stream().map(x -> x.dot(weights)).toList()));
            }
            sum.add(new Component(first.components().get(c).factor(), coefficients));
        }
        return new ExactSolution(first.equation(), first.forcingPart(), first.operator(), first.origin(), first.validFrom(),
                dots(leading, weights), sum);
    }

    /** Σ w_k·f_k as a real closed form. */
    public ClosedForm closedForm(List<Rational> weights) {
        List<Term> sum = new ArrayList<>();
        for (LikeTerms like : terms) {
            List<Coefficient> coefficients = new ArrayList<>();
            for (int j = 0; j < like.rational().size(); j++) {
                Rational a = like.rational().get(j).dot(weights);
                Rational b = like.root().get(j).dot(weights);
                coefficients.add(new Coefficient.Exact(b.isZero() ? Surd.of(a) : Surd.of(a, b, Rational.of(like.radicand()))));
            }
            Term term;
            if (like.shape() instanceof Term.ConjugateSum r) {
                while (coefficients.size() > 1 && coefficients.get(coefficients.size() - 1).isZero()) {
                    coefficients.remove(coefficients.size() - 1);
                }
                term = r.withCoefficients(coefficients);
            } else {
                term = like.shape().withCoefficients(coefficients);
            }
            if (!term.vanishes()) {
                sum.add(term);
            }
        }
        return new ClosedForm(firstForm.domain(), firstForm.function(), firstForm.variable(), firstForm.origin(),
                firstForm.validFrom(), dots(formLeading, weights), sum, List.of());
    }

    /** The like terms of the forms, basis shapes first, then any other in the order met. */
    private static List<LikeTerms> likeTerms(ClosedForm basis, List<ClosedForm> forms) {
        Map<Term, List<Surd[]>> byShape = new LinkedHashMap<>();
        basis.terms().forEach(t -> byShape.put(shape(t), new ArrayList<>()));
        for (ClosedForm f : forms) {
            f.terms().forEach(t -> byShape.putIfAbsent(shape(t), new ArrayList<>()));
        }
        List<LikeTerms> out = new ArrayList<>();
        for (Map.Entry<Term, List<Surd[]>> e : byShape.entrySet()) {
            int size = forms.stream().flatMap(f -> f.terms().stream()).filter(t -> shape(t).equals(e.getKey()))
                    .mapToInt(t -> t.coefficients().size()).max().orElse(0);
            if (size == 0) {
                continue;
            }
            BigInteger radicand = BigInteger.ONE;
            List<List<Rational>> rational = new ArrayList<>();
            List<List<Rational>> root = new ArrayList<>();
            for (int j = 0; j < size; j++) {
                rational.add(new ArrayList<>());
                root.add(new ArrayList<>());
            }
            for (ClosedForm f : forms) {
                Surd[] total = new Surd[size];
                java.util.Arrays.fill(total, Surd.of(Rational.ZERO));
                for (Term t : f.terms()) {
                    if (shape(t).equals(e.getKey())) {
                        for (int j = 0; j < t.coefficients().size(); j++) {
                            total[j] = add(total[j], value(t.coefficients().get(j)));
                        }
                    }
                }
                for (int j = 0; j < size; j++) {
                    if (!total[j].isRational()) {
                        if (!radicand.equals(BigInteger.ONE) && !radicand.equals(total[j].radicand())) {
                            throw new IllegalArgumentException("different radicands in like terms: √" + radicand + ", √"
                                    + total[j].radicand());
                        }
                        radicand = total[j].radicand();
                    }
                    rational.get(j).add(total[j].rational());
                    root.get(j).add(total[j].coefficient());
                }
            }
            out.add(new LikeTerms(e.getKey(), radicand, rational.stream().map(FixedSummands::new).toList(),
                    root.stream().map(FixedSummands::new).toList()));
        }
        return out;
    }

    /** The term with every coefficient cleared: what like terms share. */
    private static Term shape(Term t) {
        if (t instanceof Term.ConjugateSum r) {
            return new Term.ConjugateSum(r.factor(), List.of(), r.power());
        }
        return t.withCoefficients(t.coefficients().stream().map(c -> (Coefficient) new Coefficient.Free("")).toList());
    }

    /** p + q for surds with the same radicand (or rational). */
    static Surd add(Surd p, Surd q) {
        if (p.isRational() && q.isRational()) {
            return Surd.of(p.rational().add(q.rational()));
        }
        if (!p.isRational() && !q.isRational() && !p.radicand().equals(q.radicand())) {
            throw new IllegalArgumentException("different radicands: " + p + " + " + q);
        }
        BigInteger r = p.isRational() ? q.radicand() : p.radicand();
        return Surd.of(p.rational().add(q.rational()), p.coefficient().add(q.coefficient()), Rational.of(r));
    }

    private static Surd value(Coefficient c) {
        if (c instanceof Coefficient.Exact e) {
            return e.value();
        }
        throw new IllegalArgumentException("free constant " + c + " in a fitted closed form");
    }

    private static List<FixedSummands> leading(List<List<Rational>> values) {
        List<FixedSummands> out = new ArrayList<>();
        for (int i = 0; i < values.get(0).size(); i++) {
            int index = i;
            out.add(new FixedSummands(values.stream().map(v -> v.get(index)).toList()));
        }
        return out;
    }

    private static List<Rational> dots(List<FixedSummands> sums, List<Rational> weights) {
        return sums.stream().map(s -> s.dot(weights)).toList();
    }
}
