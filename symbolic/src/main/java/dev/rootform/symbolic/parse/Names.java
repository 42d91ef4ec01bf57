package dev.rootform.symbolic.parse;

import java.util.Set;

/** The names with a fixed meaning, which can never be the unknown function. */
final class Names {
    static final String DERIVATIVE_OPERATOR = "D";
    static final String SHIFT_OPERATOR = "E";
    static final String EULER = "e";
    static final String PI = "pi";
    static final String DEFAULT_TIME = "t";
    static final String DEFAULT_INDEX = "n";

    private static final Set<String> SUPPORTED_FUNCTIONS = Set.of("sin", "cos", "exp");
    private static final Set<String> UNSUPPORTED_FUNCTIONS = Set.of("tan", "cot", "sec", "csc", "sqrt", "log",
            "ln", "lg", "sinh", "cosh", "tanh", "arcsin", "arccos", "arctan", "asin", "acos", "atan", "abs",
            "floor", "ceil", "sign", "gamma");
    private static final Set<String> SYMBOLS = Set.of(DERIVATIVE_OPERATOR, SHIFT_OPERATOR, EULER, PI,
            DEFAULT_TIME, DEFAULT_INDEX);

    private Names() {
    }

    /** True for sin, cos and exp. */
    static boolean isSupportedFunction(String name) {
        return SUPPORTED_FUNCTIONS.contains(name);
    }

    /** True for well-known functions that lie outside the forcing forms, such as tan or log. */
    static boolean isUnsupportedFunction(String name) {
        return UNSUPPORTED_FUNCTIONS.contains(name);
    }

    /** True when {@code name} has a fixed meaning or is the independent variable. */
    static boolean isReserved(String name, String variable) {
        return SYMBOLS.contains(name) || isSupportedFunction(name) || isUnsupportedFunction(name)
                || name.equals(variable);
    }
}
