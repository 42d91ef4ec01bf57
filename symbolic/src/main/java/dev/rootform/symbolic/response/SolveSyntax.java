package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes equations in the input syntax of {@code rootform solve}, so that what a response shows
 * can be pasted back: the input–output relation of a transfer function
 * ({@code y'' + 2y' + 5y = u' + 3u}, {@code y[n] - 1.5y[n-1] + 0.56y[n-2] = u[n] + u[n-1]}) and a
 * complete initial-value problem ({@code y'' + 2y' + 5y = 3; y(0) = 0; y'(0) = 1}).
 *
 * @since 0.3
 */
public final class SolveSyntax {
    private SolveSyntax() {
    }

    /**
     * den(L) y = num(L) u with den monic: derivatives in s; in z shifts backward from y[n] when H
     * is proper (forward from y[n] otherwise).
     */
    public static String relation(TransferFunction h) {
        RationalPolynomial den = h.value().denominator();
        RationalPolynomial num = h.value().numerator();
        int top = h.continuous() || !h.value().isProper() ? 0 : den.degree();
        return combination(den, "y", h.domain(), top) + " = " + combination(num, "u", h.domain(), top);
    }

    /** The whole problem: equation with its forcing, then the conditions, separated by {@code ;}. */
    public static String problem(Problem problem) {
        LinearEquation eq = problem.equation();
        if (eq.shift() != 0) {
            throw new IllegalArgumentException("equations with backward shifts are written as read");
        }
        StringBuilder sb = new StringBuilder(combination(RationalPolynomial.of(eq.coefficients()), eq.function(), eq.domain(), 0));
        sb.append(" = ").append(forcing(eq));
        for (Condition c : problem.conditions()) {
            sb.append("; ").append(condition(eq, c));
        }
        return sb.toString();
    }

    /** Σ c_j·(f at order j − top), highest order first. */
    private static String combination(RationalPolynomial p, String f, Domain domain, int top) {
        List<String> terms = new ArrayList<>();
        List<Boolean> negative = new ArrayList<>();
        for (int j = p.degree(); j >= 0; j--) {
            Rational c = p.coefficient(j);
            if (!c.isZero()) {
                String unknown = domain == Domain.DIFFERENTIAL ? derivative(f, j) : f + "[" + index("n", j - top) + "]";
                terms.add(scaled(c.abs(), unknown));
                negative.add(c.signum() < 0);
            }
        }
        return join(terms, negative);
    }

    private static String forcing(LinearEquation eq) {
        List<String> terms = new ArrayList<>();
        List<Boolean> negative = new ArrayList<>();
        for (ForcingTerm t : eq.forcing()) {
            terms.add(scaled(t.coefficient().abs(), factors(t, eq.domain(), eq.variable())));
            negative.add(t.coefficient().signum() < 0);
        }
        return terms.isEmpty() ? "0" : join(terms, negative);
    }

    /** v^p, the exponential and the oscillation of a term, juxtaposed; empty for the constant 1. */
    private static String factors(ForcingTerm t, Domain domain, String v) {
        List<String> f = new ArrayList<>();
        if (t.power() > 0) {
            f.add(t.power() == 1 ? v : v + "^" + t.power());
        }
        if (domain == Domain.DIFFERENTIAL && !t.exponential().isZero()) {
            Rational a = t.exponential();
            f.add("e^(" + (a.abs().isOne() ? (a.signum() < 0 ? "-" : "") : number(a)) + v + ")");
        } else if (domain == Domain.DIFFERENCE && !t.exponential().isOne()) {
            f.add("(" + plain(t.exponential()) + ")^" + v);
        }
        if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
            String name = t.oscillation() == ForcingTerm.Oscillation.COS ? "cos" : "sin";
            String w = t.frequency().isOne() ? "" : number(t.frequency());
            f.add(name + "(" + w + (t.frequencyTimesPi() ? (w.isEmpty() ? "" : " ") + "pi " : "") + v + ")");
        }
        return String.join(" ", f);
    }

    private static String condition(LinearEquation eq, Condition c) {
        String lhs = eq.domain() == Domain.DIFFERENTIAL ? derivative(eq.function(), c.derivative()) + "(" + plain(c.at()) + ")"
                : eq.function() + "[" + plain(c.at()) + "]";
        return lhs + " = " + plain(c.value());
    }

    private static String derivative(String f, int order) {
        return order <= 3 ? f + "'".repeat(order) : f + "^(" + order + ")";
    }

    private static String index(String v, int offset) {
        return offset == 0 ? v : v + (offset > 0 ? "+" : "-") + Math.abs(offset);
    }

    /** c·body for c &gt; 0: the body alone for 1, the number alone for an empty body. */
    private static String scaled(Rational c, String body) {
        if (body.isEmpty()) {
            return plain(c);
        }
        return c.isOne() ? body : number(c) + body;
    }

    private static String join(List<String> terms, List<Boolean> negative) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < terms.size(); i++) {
            sb.append(i == 0 ? (negative.get(i) ? "-" : "") : negative.get(i) ? " - " : " + ").append(terms.get(i));
        }
        return sb.toString();
    }

    /** A factor that juxtaposes safely: an integer, a terminating decimal, or a parenthesised fraction. */
    private static String number(Rational r) {
        String p = plain(r);
        return p.indexOf('/') < 0 ? p : "(" + p + ")";
    }

    /** An integer, a terminating decimal ({@code -1.5}), or a fraction ({@code 1/3}). */
    private static String plain(Rational r) {
        if (r.isInteger()) {
            return r.toString();
        }
        try {
            return new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator())).toPlainString();
        } catch (ArithmeticException endless) {
            return r.toString();
        }
    }
}
