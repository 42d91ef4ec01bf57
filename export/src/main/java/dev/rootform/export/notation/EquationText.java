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
 * The problem in ordinary notation: {@code y'' + 2y' + 5y = 0}, {@code x[n+2] - x[n+1] - x[n] = 0},
 * conditions such as {@code y'(0) = 0}, and the factored characteristic polynomial in λ.
 *
 * @since 0.1
 */
public final class EquationText {
    /** The name of the characteristic variable in plain text. */
    public static final String LAMBDA = "λ";

    private EquationText() {
    }

    /** Σ a_j·(j-th derivative or shift) = right-hand side, highest order first, zero terms left out. */
    public static String equation(LinearEquation eq) {
        StringBuilder sb = new StringBuilder();
        for (int j = eq.order(); j >= 0; j--) {
            Rational a = eq.coefficients().get(j);
            if (a.isZero()) {
                continue;
            }
            String unknown = eq.domain() == Domain.DIFFERENTIAL ? derivative(eq.function(), j)
                    : eq.function() + "[" + offset(eq.variable(), eq.shift() + j) + "]";
            Rational m = a.abs();
            String scaled = m.isOne() ? unknown : m.isInteger() ? m + unknown : m + "·" + unknown;
            sb.append(sb.length() == 0 ? (a.signum() < 0 ? "-" : "") : a.signum() < 0 ? " - " : " + ").append(scaled);
        }
        return sb + " = " + rightSide(eq);
    }

    /** e.g. "linear difference equation, order 2". */
    public static String kind(LinearEquation eq) {
        String domain = eq.domain() == Domain.DIFFERENCE ? "difference" : "differential";
        return "linear " + domain + " equation, order " + eq.order();
    }

    /** {@code y'(0) = 1} or {@code x[3] = -2}. */
    public static String condition(LinearEquation eq, Condition c) {
        String at = c.atTimesPi() ? c.point() : Numbers.point(c.at());
        String lhs = eq.domain() == Domain.DIFFERENTIAL ? derivative(eq.function(), c.derivative()) + "(" + at + ")"
                : eq.function() + "[" + at + "]";
        return lhs + " = " + c.value();
    }

    /** The unknown at a point of the closed form's variable: {@code y(t)}, {@code x[n]} or {@code x[3]}. */
    public static String unknownAt(ClosedForm f, String point) {
        return f.domain() == Domain.DIFFERENTIAL ? f.function() + "(" + point + ")" : f.function() + "[" + point + "]";
    }

    /** lc·(f1)^m1·(f2)^m2…, e.g. {@code λ·(λ - 2)} or {@code (λ + 1)^2}. */
    public static String factorisation(RationalPolynomial characteristic, List<Factor> factors) {
        Rational lc = characteristic.leadingCoefficient();
        boolean alone = factors.size() == 1 && factors.get(0).multiplicity() == 1 && lc.isOne();
        List<String> parts = new ArrayList<>();
        if (!lc.isOne()) {
            parts.add(lc.toString());
        }
        for (Factor f : factors) {
            String p = f.polynomial().toString(LAMBDA);
            boolean compound = f.polynomial().coefficients().stream().filter(c -> !c.isZero()).count() > 1;
            String grouped = compound && !alone ? "(" + p + ")" : p;
            parts.add(f.multiplicity() == 1 ? grouped : grouped + "^" + f.multiplicity());
        }
        return String.join("·", parts);
    }

    private static String derivative(String function, int order) {
        return order <= 3 ? function + "'".repeat(order) : function + "^(" + order + ")";
    }

    private static String offset(String variable, int k) {
        return k == 0 ? variable : variable + (k > 0 ? "+" : "-") + Math.abs(k);
    }

    /** The forcing terms, written through the formula walk as a closed form with origin 0. */
    private static String rightSide(LinearEquation eq) {
        return forcing(eq, eq.forcing());
    }

    /** One forcing term as written, e.g. {@code 2·sin(3t)}. */
    public static String forcingTerm(LinearEquation eq, ForcingTerm term) {
        return forcing(eq, List.of(term));
    }

    private static String forcing(LinearEquation eq, List<ForcingTerm> forcing) {
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
        return Formulas.plain(new ClosedForm(eq.domain(), eq.function(), eq.variable(), Rational.ZERO, 0,
                List.of(), terms, List.of()));
    }
}
