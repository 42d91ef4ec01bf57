package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.List;

/**
 * The problem in ordinary notation: {@code y'' + 2y' + 5y = 0}, {@code x[n+2] - x[n+1] - x[n] = 0},
 * conditions such as {@code y'(0) = 0}, and the factored characteristic polynomial in λ: the plain
 * text form of {@link EquationFormula}.
 *
 * @since 0.1
 */
public final class EquationText {
    /** The name of the characteristic variable in plain text. */
    public static final String LAMBDA = "λ";
    private static final EquationFormula PLAIN = new EquationFormula(PlainNotation.INSTANCE);

    private EquationText() {
    }

    /** Σ a_j·(j-th derivative or shift) = right-hand side, highest order first, zero terms left out. */
    public static String equation(LinearEquation eq) {
        return PLAIN.equation(eq);
    }

    /** e.g. "linear difference equation, order 2". */
    public static String kind(LinearEquation eq) {
        String domain = eq.domain() == Domain.DIFFERENCE ? "difference" : "differential";
        return "linear " + domain + " equation, order " + eq.order();
    }

    /** {@code y'(0) = 1} or {@code x[3] = -2}. */
    public static String condition(LinearEquation eq, Condition c) {
        return PLAIN.condition(eq, c);
    }

    /** The unknown at a point of the closed form's variable: {@code y(t)}, {@code x[n]} or {@code x[3]}. */
    public static String unknownAt(ClosedForm f, String point) {
        return PLAIN.unknownAt(f, point);
    }

    /** lc·(f1)^m1·(f2)^m2…, e.g. {@code λ·(λ - 2)} or {@code (λ + 1)^2}. */
    public static String factorisation(RationalPolynomial characteristic, List<Factor> factors) {
        return PLAIN.factorisation(characteristic, factors);
    }

    /** One forcing term as written, e.g. {@code 2·sin(3t)}. */
    public static String forcingTerm(LinearEquation eq, ForcingTerm term) {
        return PLAIN.forcingTerm(eq, term);
    }
}
