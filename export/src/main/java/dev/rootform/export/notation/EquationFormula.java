package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;

/**
 * The problem written in one {@link Notation}: the equation Σ a_j·(j-th derivative or shift) =
 * forcing (highest order first, zero terms left out), its conditions, the unknown at a point, and
 * the characteristic polynomial plain and factored. The forcing and the polynomials go through the
 * same {@link FormulaWriter} walk as the closed form, so every notation writes them as mathematics.
 *
 * @since 0.3
 */
public final class EquationFormula {
    private final Notation n;
    private final boolean marked;

    public EquationFormula(Notation notation) {
        this(notation, false);
    }

    /** @param marked put {@link LineBreaker#MARK} where a line may break */
    EquationFormula(Notation notation, boolean marked) {
        this.n = notation;
        this.marked = marked;
    }

    /** e.g. {@code y'' + 2y' + 5y = 0} or {@code x[n+2] - x[n+1] - x[n] = 0}. */
    public String equation(LinearEquation eq) {
        StringBuilder sb = new StringBuilder();
        for (int j = eq.order(); j >= 0; j--) {
            Rational a = eq.coefficients().get(j);
            if (a.isZero()) {
                continue;
            }
            String unknown = eq.domain() == Domain.DIFFERENTIAL ? n.derivative(n.name(eq.function()), j)
                    : n.indexed(n.name(eq.function()), n.shifted(n.name(eq.variable()), eq.shift() + j));
            Rational m = a.abs();
            String scaled = m.isOne() ? unknown : m.isInteger() ? n.implicit(n.number(m.toString()), unknown)
                    : n.times(n.fraction(n.number(m.numerator().toString()), n.number(m.denominator().toString())), unknown);
            sb.append(sb.length() == 0 ? (a.signum() < 0 ? n.negate(scaled) : scaled) : (marked ? LineBreaker.MARK : "") + (a.signum() < 0 ? n.minus() : n.plus()) + scaled);
        }
        return n.relation(sb.toString(), "=", (marked ? LineBreaker.MARK : "") + forcing(eq, eq.forcing()));
    }

    /** e.g. {@code y'(0) = 1}, {@code y(π/2) = 0} or {@code x[3] = -2}. */
    public String condition(LinearEquation eq, Condition c) {
        String at = c.atTimesPi() ? new FormulaWriter(n, zero(eq)).multiple(c.at(), n.pi()) : point(c.at());
        String lhs = eq.domain() == Domain.DIFFERENTIAL ? n.applied(n.derivative(n.name(eq.function()), c.derivative()), at)
                : n.indexed(n.name(eq.function()), at);
        return n.relation(lhs, "=", new FormulaWriter(n, zero(eq)).signed(c.value()));
    }

    /** The unknown at a point already written: {@code y(t)}, {@code x[n]}. */
    public String unknownAt(ClosedForm f, String point) {
        return f.domain() == Domain.DIFFERENTIAL ? n.applied(n.name(f.function()), point) : n.indexed(n.name(f.function()), point);
    }

    /** One forcing term as written, e.g. {@code 2·sin(3t)}. */
    public String forcingTerm(LinearEquation eq, ForcingTerm term) {
        return forcing(eq, List.of(term));
    }

    /** p in descending powers of λ with line-break marks: {@code λ^2 - λ - 1}. */
    static String polynomial(Notation n, RationalPolynomial p) {
        return new FormulaWriter(n, zeroForm(Domain.DIFFERENCE), true).polynomial(p, n.lambda());
    }

    /** lc·(f1)^m1·(f2)^m2…, e.g. {@code λ·(λ - 2)} or {@code (λ + 1)^2}. */
    public String factorisation(RationalPolynomial characteristic, List<Factor> factors) {
        FormulaWriter w = new FormulaWriter(n, zeroForm(Domain.DIFFERENCE));
        Rational lc = characteristic.leadingCoefficient();
        boolean alone = factors.size() == 1 && factors.get(0).multiplicity() == 1 && lc.isOne();
        String product = lc.isOne() ? "" : w.signed(lc);
        for (Factor f : factors) {
            String p = n == PlainNotation.INSTANCE ? f.polynomial().toString(EquationText.LAMBDA)
                    : w.polynomial(f.polynomial(), n.lambda());
            boolean compound = f.polynomial().coefficients().stream().filter(c -> !c.isZero()).count() > 1;
            String grouped = compound && !alone ? n.parens(p) : p;
            String factor = f.multiplicity() == 1 ? grouped : n.power(grouped, n.number(Integer.toString(f.multiplicity())));
            product = product.isEmpty() ? factor : n.times(product, factor);
        }
        return product;
    }

    /** A point as a number: {@code 10}, {@code 1.5}, or a fraction when its decimal does not end. */
    private String point(Rational at) {
        String written = Numbers.point(at);
        if (written.contains("/")) {
            return new FormulaWriter(n, zeroForm(Domain.DIFFERENTIAL)).signed(at);
        }
        return at.signum() < 0 ? n.negate(n.number(written.substring(1))) : n.number(written);
    }

    /** The forcing terms, written through the formula walk as a closed form with origin 0. */
    private String forcing(LinearEquation eq, List<ForcingTerm> forcing) {
        List<Term> terms = new ArrayList<>();
        for (ForcingTerm t : forcing) {
            Coefficient c = new Coefficient.Exact(Surd.of(t.coefficient()));
            Surd growth = Surd.of(t.exponential());
            if (t.oscillation() == ForcingTerm.Oscillation.NONE) {
                terms.add(new Term.Exponential(c, t.power(), growth));
            } else {
                Angle angle = t.frequencyTimesPi() ? new Angle.PiMultiple(t.frequency()) : new Angle.Value(Surd.of(t.frequency()));
                Coefficient zero = new Coefficient.Exact(Surd.of(Rational.ZERO));
                boolean cos = t.oscillation() == ForcingTerm.Oscillation.COS;
                terms.add(new Term.Oscillating(cos ? c : zero, cos ? zero : c, t.power(), growth, angle));
            }
        }
        return new FormulaWriter(n, new ClosedForm(eq.domain(), eq.function(), eq.variable(), Rational.ZERO, 0,
                List.of(), terms, List.of()), marked).formula();
    }

    private static ClosedForm zero(LinearEquation eq) {
        return new ClosedForm(eq.domain(), eq.function(), eq.variable(), Rational.ZERO, 0, List.of(), List.of(), List.of());
    }

    private static ClosedForm zeroForm(Domain domain) {
        return new ClosedForm(domain, "y", "t", Rational.ZERO, 0, List.of(), List.of(), List.of());
    }
}
