package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The names a claim may use — the functions, π, e, λ inside a root sum, and the equation's
 * variable — and how a run of letters splits into them, longest first: {@code pin} is π·n,
 * {@code tcos} is t·cos. A piece that is none of them is refused where it starts, with the reason
 * (another variable, the unknown itself, a free constant).
 */
final class ClaimNames {
    private static final Map<String, Expr.Call.Function> FUNCTIONS = Map.of("sin", Expr.Call.Function.SIN,
            "cos", Expr.Call.Function.COS, "exp", Expr.Call.Function.EXP, "sqrt", Expr.Call.Function.SQRT,
            "arccos", Expr.Call.Function.ARCCOS, "acos", Expr.Call.Function.ARCCOS,
            "arcsin", Expr.Call.Function.ARCSIN, "asin", Expr.Call.Function.ARCSIN,
            "arctan", Expr.Call.Function.ARCTAN, "atan", Expr.Call.Function.ARCTAN);
    /** Well-known functions outside the closed forms of linear equations. */
    private static final Set<String> OTHER_FUNCTIONS = Set.of("tan", "cot", "sec", "csc", "log", "ln", "lg", "sinh",
            "cosh", "tanh", "abs", "floor", "ceil", "sign", "gamma", "min", "max", "erf", "arccot", "sinc");
    private static final Map<String, Expr.Constant.Kind> CONSTANTS = Map.of("π", Expr.Constant.Kind.PI,
            "pi", Expr.Constant.Kind.PI, "e", Expr.Constant.Kind.E, "λ", Expr.Constant.Kind.LAMBDA,
            "lambda", Expr.Constant.Kind.LAMBDA);
    private static final Set<String> KEYWORDS = Set.of("for", "all");

    private final String source;
    private final String function;
    private final String variable;

    ClaimNames(String source, String function, String variable) {
        this.source = source;
        this.function = function;
        this.variable = variable;
    }

    Optional<Expr.Call.Function> function(String name) {
        return Optional.ofNullable(FUNCTIONS.get(name));
    }

    /** The constant a known name that is not a function or the variable stands for. */
    Expr.Constant.Kind constant(String name) {
        return CONSTANTS.get(name);
    }

    /** True for a well-known other function, or a run before '(' that is no product of known names. */
    boolean isUnknownFunction(String run, boolean called) {
        return OTHER_FUNCTIONS.contains(run) || called && !known(run) && !splits(run);
    }

    /**
     * The run as a sequence of known names, longest first.
     *
     * @param start the run's offset in the claim
     * @throws InputException at the first piece that is no known name
     */
    List<String> split(String run, int start) {
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < run.length()) {
            int end = run.length();
            while (end > i && !known(run.substring(i, end))) {
                end--;
            }
            if (end == i) {
                throw unknown(run.equals(function) || run.substring(i).equals(function) ? function : run.substring(i), start + i);
            }
            parts.add(run.substring(i, end));
            i = end;
        }
        return parts;
    }

    private boolean known(String name) {
        return FUNCTIONS.containsKey(name) || CONSTANTS.containsKey(name) || name.equals(variable);
    }

    private boolean splits(String run) {
        try {
            split(run, 0);
            return true;
        } catch (InputException e) {
            return false;
        }
    }

    private InputException unknown(String name, int position) {
        if (name.equals(function)) {
            return new InputException("the formula must not contain the unknown " + function + " itself", source, position);
        }
        if (KEYWORDS.contains(name)) {
            return new InputException("unexpected '" + name + "'", source, position);
        }
        boolean constant = name.length() <= 2 && Character.isUpperCase(name.charAt(0));
        return new InputException("unknown name '" + name + "' (the equation's variable is " + variable
                + (constant ? "; free constants such as C1 are not accepted, give a fitted solution" : "") + ")", source, position);
    }
}
