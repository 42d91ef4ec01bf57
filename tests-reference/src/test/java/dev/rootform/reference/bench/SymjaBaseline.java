package dev.rootform.reference.bench;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import java.util.ArrayList;
import java.util.List;
import org.matheclipse.core.basic.Config;
import org.matheclipse.core.eval.ExprEvaluator;
import org.matheclipse.core.expression.F;
import org.matheclipse.core.interfaces.IAST;
import org.matheclipse.core.interfaces.IExpr;

/**
 * Symja's own built-in solvers on rootform's problems: {@code RSolve} for recurrences and
 * {@code DSolve} for differential equations, each call capped by {@code TimeConstrained}. An answer
 * counts only if it is a rule for the unknown whose values at the given points match the reference
 * values; an unevaluated call, a wrong answer, a failure or a timeout counts as not solved.
 */
final class SymjaBaseline {
    private static final int SECONDS = 10;
    private static final double TOLERANCE = 1e-8;
    private final ExprEvaluator evaluator;

    private SymjaBaseline(ExprEvaluator evaluator) {
        this.evaluator = evaluator;
    }

    /** Starts Symja quietly: no JAS thread pool (set before class F loads), no log output, quiet engine. */
    static SymjaBaseline start() {
        System.setProperty("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
        System.setProperty("org.apache.logging.log4j.simplelog.level", "OFF");
        Config.JAS_NO_THREADS = true;
        F.initSymbols();
        edu.jas.kern.PreemptStatus.setAllow();
        ExprEvaluator evaluator = new ExprEvaluator();
        evaluator.getEvalEngine().setQuietMode(true);
        return new SymjaBaseline(evaluator);
    }

    /** How Symja fared on one problem. */
    enum Outcome {
        /** A rule whose values agree with the reference. */
        SOLVED,
        /** A rule whose values do not agree (or cannot be evaluated to numbers). */
        DISAGREES,
        /** Returned unevaluated, or aborted by the time limit. */
        UNSOLVED,
        /** Threw an exception. */
        ERROR
    }

    /**
     * Runs Symja on the problem and compares its answer at {@code points} with {@code reference}
     * within a relative {@value #TOLERANCE}.
     *
     * @param points where to evaluate its answer (indices or times)
     * @param reference rootform's verified values at those points
     */
    Outcome check(Problem problem, List<Rational> points, double[] reference) {
        IExpr answer;
        try {
            answer = evaluator.eval("TimeConstrained(" + input(problem) + "," + SECONDS + ",$Aborted)");
        } catch (RuntimeException e) {
            return Outcome.ERROR;
        }
        if (!answer.isList() || answer.argSize() < 1 || !answer.first().isList() || !answer.first().first().isRuleAST()) {
            return Outcome.UNSOLVED;
        }
        IExpr formula = ((IAST) answer.first().first()).arg2();
        String variable = problem.equation().variable();
        for (int i = 0; i < reference.length; i++) {
            double value;
            try {
                value = evaluator.eval("N(ReplaceAll(" + formula + "," + variable + "->(" + points.get(i) + ")))").evalDouble();
            } catch (RuntimeException e) {
                return Outcome.DISAGREES;
            }
            if (!(Math.abs(value - reference[i]) <= TOLERANCE * Math.max(1, Math.abs(reference[i])))) {
                return Outcome.DISAGREES;
            }
        }
        return Outcome.SOLVED;
    }

    /** The problem in Symja syntax: {@code RSolve({eq, a(0)==v, ...}, a(n), n)} or {@code DSolve(...)}. */
    static String input(Problem problem) {
        LinearEquation eq = problem.equation();
        boolean difference = eq.domain() == Domain.DIFFERENCE;
        String v = eq.variable();
        List<String> parts = new ArrayList<>();
        StringBuilder lhs = new StringBuilder("0");
        for (int j = 0; j <= eq.order(); j++) {
            Rational a = eq.coefficients().get(j);
            if (!a.isZero()) {
                lhs.append("+(").append(a).append(")*").append(difference ? "a(" + v + "+" + j + ")" : derivative(j, v));
            }
        }
        parts.add(lhs + "==" + rightSide(eq));
        for (Condition c : problem.conditions()) {
            parts.add((difference ? "a(" + c.at() + ")" : derivative(c.derivative(), "(" + c.at() + ")")) + "==(" + c.value() + ")");
        }
        String unknown = difference ? "a(" + v + ")" : "y(" + v + ")";
        return (difference ? "RSolve" : "DSolve") + "({" + String.join(",", parts) + "}," + unknown + "," + v + ")";
    }

    /** The forcing terms in Symja syntax (generated problems have shift 0), or 0. */
    private static String rightSide(LinearEquation eq) {
        StringBuilder rhs = new StringBuilder("0");
        String v = eq.variable();
        for (ForcingTerm t : eq.forcing()) {
            rhs.append("+(").append(t.coefficient()).append(")*").append(v).append("^").append(t.power()).append('*')
                    .append(eq.domain() == Domain.DIFFERENCE ? "(" + t.exponential() + ")^" + v : "E^((" + t.exponential() + ")*" + v + ")");
            if (t.oscillation() != ForcingTerm.Oscillation.NONE) {
                rhs.append('*').append(t.oscillation() == ForcingTerm.Oscillation.COS ? "Cos" : "Sin").append("((")
                        .append(t.frequency()).append(')').append(t.frequencyTimesPi() ? "*Pi" : "").append('*').append(v).append(')');
            }
        }
        return rhs.toString();
    }

    private static String derivative(int order, String at) {
        return order == 0 ? "y(" + at + ")" : "Derivative(" + order + ")[y][" + at + "]";
    }
}
