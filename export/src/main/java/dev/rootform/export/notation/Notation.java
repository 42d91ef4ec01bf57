package dev.rootform.export.notation;

import java.util.Optional;

/**
 * The atoms of one written notation for formulas. {@link FormulaWriter} decides the structure
 * (signs, order of factors, which parts are grouped); a notation only spells each atom. Every
 * method is pure and takes already-written operands.
 *
 * @since 0.1
 */
public interface Notation {
    /** The fraction numerator/denominator, both already written. */
    String fraction(String numerator, String denominator);

    /** The square root of a positive integer radicand. */
    String sqrt(String radicand);

    /** An explicit product of two factors. */
    String times(String left, String right);

    /** A product written by juxtaposition, such as 2t or πn. */
    String implicit(String left, String right);

    /** base raised to exponent; the base is already grouped if it needs to be. */
    String power(String base, String exponent);

    /** A named function (cos, sin, arccos) applied to an argument. */
    String function(String name, String argument);

    /** Parentheses that the meaning requires. */
    String parens(String inner);

    /** Parentheses that only help reading; a notation may leave them out. */
    String clarify(String inner);

    /** The joiner for a positive summand after the first. */
    String plus();

    /** The joiner for a negative summand after the first. */
    String minus();

    /** The conjugate sum of summand over the roots λ of polynomial. */
    String conjugateSum(String polynomial, String summand);

    /** The name of a free constant, such as C1. */
    String constant(String name);

    /** The constant π. */
    String pi();

    /** The bound variable λ of a conjugate sum. */
    String lambda();

    /** A non-negative integer written in decimal digits; as is, unless the notation marks up numbers. */
    default String number(String digits) {
        return digits;
    }

    /** A single-letter or short name: a variable, a function or the base e; as is by default. */
    default String name(String identifier) {
        return identifier;
    }

    /** The negation -body of an already written operand. */
    default String negate(String body) {
        return "-" + body;
    }

    /** The unknown's derivative of the given order (0: the name itself): {@code y''}, {@code y^(4)}. */
    default String derivative(String function, int order) {
        return order <= 3 ? function + "'".repeat(order) : function + "^(" + order + ")";
    }

    /** A function applied to a point, without spacing: {@code y(0)}. */
    default String applied(String function, String argument) {
        return function + "(" + argument + ")";
    }

    /** A sequence at an index: {@code x[n+2]}. */
    default String indexed(String sequence, String index) {
        return sequence + "[" + index + "]";
    }

    /** The variable shifted by k, tight: {@code n+2}, {@code n-1}, or the variable for k = 0. */
    default String shifted(String variable, int k) {
        return k == 0 ? variable : variable + (k > 0 ? "+" : "-") + number(Integer.toString(Math.abs(k)));
    }

    /** left symbol right for a relation symbol such as {@code =}, {@code ≈} or {@code ≥}. */
    default String relation(String left, String symbol, String right) {
        return left + " " + symbol + " " + right;
    }

    /**
     * Whether a line may break after {@code written} (a prefix of a formula in this notation),
     * and how many groups are open there that {@link #closeGroups} must close; empty when the
     * break would fall inside an unbreakable part (a fraction, a power, a subscript).
     */
    default Optional<Integer> openGroups(String written) {
        return Optional.of(0);
    }

    /** Text that ends a line inside {@code count} open groups. */
    default String closeGroups(int count) {
        return "";
    }

    /** Text that starts the next line inside {@code count} groups again. */
    default String reopenGroups(int count) {
        return "";
    }

    /** Words inside a formula, e.g. {@code (30 digits)}. */
    default String text(String words) {
        return words;
    }

    /**
     * A line of a formula broken inside parentheses, with fences that no longer pair up across
     * lines made fixed-size where the notation needs it; as is by default.
     */
    default String unpairedFences(String line) {
        return line;
    }
}
