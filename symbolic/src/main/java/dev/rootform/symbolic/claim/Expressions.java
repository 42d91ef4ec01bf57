package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.util.List;

/**
 * Expression trees of the formulas a check compares with a claim: a closed form's terms and an
 * equation's right-hand side, written as a claim would write them, so one evaluator (exact or
 * numeric) reads all three the same way.
 *
 * @since 0.3
 */
public final class Expressions {
    private static final int NOWHERE = -1;

    private Expressions() {
    }

    /**
     * The sum of a closed form's terms (its formula for n ≥ validFrom).
     *
     * @throws IllegalArgumentException if a coefficient is a free constant
     */
    public static Expr of(ClosedForm form) {
        boolean sequence = form.domain() == Domain.DIFFERENCE;
        Expr u = sequence || form.origin().isZero() ? variable(form.variable())
                : new Expr.Binary(Expr.Binary.Op.SUBTRACT, variable(form.variable()), number(form.origin()), NOWHERE);
        Expr sum = number(Rational.ZERO);
        for (Term t : form.terms()) {
            sum = plus(sum, term(t, u, sequence));
        }
        return sum;
    }

    /** The right-hand side g of an equation, in its own variable (0 for a homogeneous equation). */
    public static Expr forcing(LinearEquation eq) {
        boolean sequence = eq.domain() == Domain.DIFFERENCE;
        Expr v = variable(eq.variable());
        Expr sum = number(Rational.ZERO);
        for (ForcingTerm t : eq.forcing()) {
            Expr product = times(number(t.coefficient()), power(v, t.power()));
            product = times(product, sequence ? new Expr.Binary(Expr.Binary.Op.POWER, number(t.exponential()), v, NOWHERE)
                    : exp(times(number(t.exponential()), v)));
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                Expr frequency = t.frequencyTimesPi() ? times(number(t.frequency()), new Expr.Constant(Expr.Constant.Kind.PI, NOWHERE))
                        : number(t.frequency());
                Expr.Call.Function f = t.oscillation() == ForcingTerm.Oscillation.COS ? Expr.Call.Function.COS : Expr.Call.Function.SIN;
                product = times(product, new Expr.Call(f, times(frequency, v), NOWHERE));
            }
            sum = plus(sum, product);
        }
        return sum;
    }

    private static Expr term(Term t, Expr u, boolean sequence) {
        if (t instanceof Term.Exponential e) {
            return times(times(coefficient(e.coefficient()), power(u, e.power())), growth(surd(e.rate()), u, sequence));
        }
        if (t instanceof Term.Oscillating o) {
            Expr angle = times(angle(o.angle()), u);
            Expr wave = plus(times(coefficient(o.cosine()), new Expr.Call(Expr.Call.Function.COS, angle, NOWHERE)),
                    times(coefficient(o.sine()), new Expr.Call(Expr.Call.Function.SIN, angle, NOWHERE)));
            return times(times(wave, power(u, o.power())), growth(surd(o.growth()), u, sequence));
        }
        Term.ConjugateSum r = (Term.ConjugateSum) t;
        Expr lambda = new Expr.Constant(Expr.Constant.Kind.LAMBDA, NOWHERE);
        Expr c = number(Rational.ZERO);
        List<Coefficient> cs = r.coefficients();
        for (int j = 0; j < cs.size(); j++) {
            c = plus(c, times(coefficient(cs.get(j)), power(lambda, j)));
        }
        Expr summand = times(times(c, power(u, r.power())), growth(lambda, u, sequence));
        return new Expr.RootSum(r.factor(), summand, NOWHERE);
    }

    /** rate^u (sequences) or e^(rate·u) (functions). */
    private static Expr growth(Expr rate, Expr u, boolean sequence) {
        return sequence ? new Expr.Binary(Expr.Binary.Op.POWER, rate, u, NOWHERE) : exp(times(rate, u));
    }

    private static Expr angle(Angle a) {
        if (a instanceof Angle.PiMultiple p) {
            return times(number(p.multiple()), new Expr.Constant(Expr.Constant.Kind.PI, NOWHERE));
        }
        if (a instanceof Angle.Value v) {
            return surd(v.value());
        }
        return new Expr.Call(Expr.Call.Function.ARCCOS, surd(((Angle.ArcCos) a).cosine()), NOWHERE);
    }

    private static Expr coefficient(Coefficient c) {
        if (c instanceof Coefficient.Exact e) {
            return surd(e.value());
        }
        if (c instanceof Coefficient.Trig t) {
            Expr root = new Expr.Call(Expr.Call.Function.SQRT, number(Rational.of(t.radicand())), NOWHERE);
            Expr sum = number(Rational.ZERO);
            for (Coefficient.Trig.Part p : t.parts()) {
                sum = plus(sum, plus(trig(p.rational(), p.frequency()), times(trig(p.radical(), p.frequency()), root)));
            }
            return sum;
        }
        throw new IllegalArgumentException("free constant " + ((Coefficient.Free) c).name());
    }

    /** a(c) + b(c)·s with c = cos ω, s = sin ω written as calls, a and b as quotients of polynomials. */
    private static Expr trig(TrigNumber x, Rational frequency) {
        Expr cos = new Expr.Call(Expr.Call.Function.COS, number(frequency), NOWHERE);
        Expr sin = new Expr.Call(Expr.Call.Function.SIN, number(frequency), NOWHERE);
        return plus(quotient(x.rational(), cos), times(quotient(x.sine(), cos), sin));
    }

    private static Expr quotient(RationalFunction f, Expr x) {
        return new Expr.Binary(Expr.Binary.Op.DIVIDE, polynomial(f.numerator(), x), polynomial(f.denominator(), x), NOWHERE);
    }

    private static Expr polynomial(RationalPolynomial p, Expr x) {
        Expr sum = number(Rational.ZERO);
        for (int i = 0; i <= p.degree(); i++) {
            sum = plus(sum, times(number(p.coefficient(i)), power(x, i)));
        }
        return sum;
    }

    private static Expr surd(Surd s) {
        Expr a = number(s.rational());
        if (s.isRational()) {
            return a;
        }
        Expr root = new Expr.Call(Expr.Call.Function.SQRT, number(Rational.of(s.radicand())), NOWHERE);
        return plus(a, times(number(s.coefficient()), root));
    }

    private static Expr exp(Expr argument) {
        return new Expr.Binary(Expr.Binary.Op.POWER, new Expr.Constant(Expr.Constant.Kind.E, NOWHERE), argument, NOWHERE);
    }

    private static Expr power(Expr base, int k) {
        return k == 0 ? number(Rational.ONE) : k == 1 ? base
                : new Expr.Binary(Expr.Binary.Op.POWER, base, number(Rational.of(k)), NOWHERE);
    }

    private static Expr variable(String name) {
        return new Expr.Variable(name, NOWHERE);
    }

    private static Expr number(Rational q) {
        return new Expr.Number(q, NOWHERE);
    }

    private static Expr plus(Expr a, Expr b) {
        return new Expr.Binary(Expr.Binary.Op.ADD, a, b, NOWHERE);
    }

    private static Expr times(Expr a, Expr b) {
        return new Expr.Binary(Expr.Binary.Op.MULTIPLY, a, b, NOWHERE);
    }
}
