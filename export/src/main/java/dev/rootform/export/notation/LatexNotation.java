package dev.rootform.export.notation;

import java.util.Optional;

/**
 * LaTeX math mode: {@code \frac{1}{5}}, {@code \sqrt{5}}, {@code e^{-t}},
 * {@code \cos\left(2 t\right)}, {@code \sum_{\lambda^{3}-\lambda-1=0}}. A product gets
 * {@code \cdot} only when the right factor starts with a number, where juxtaposition would
 * misread.
 *
 * @since 0.1
 */
public final class LatexNotation implements Notation {
    public static final LatexNotation INSTANCE = new LatexNotation();

    private LatexNotation() {
    }

    @Override
    public String fraction(String numerator, String denominator) {
        return "\\frac{" + numerator + "}{" + denominator + "}";
    }

    @Override
    public String sqrt(String radicand) {
        return "\\sqrt{" + radicand + "}";
    }

    @Override
    public String times(String left, String right) {
        boolean number = !right.isEmpty() && (Character.isDigit(right.charAt(0)) || right.startsWith("\\frac"));
        return left + (number ? " \\cdot " : " ") + right;
    }

    @Override
    public String implicit(String left, String right) {
        return left + " " + right;
    }

    @Override
    public String power(String base, String exponent) {
        return base + "^{" + exponent + "}";
    }

    @Override
    public String function(String name, String argument) {
        return "\\" + name + parens(argument);
    }

    @Override
    public String parens(String inner) {
        return "\\left(" + inner + "\\right)";
    }

    @Override
    public String clarify(String inner) {
        return inner;
    }

    @Override
    public String plus() {
        return "+";
    }

    @Override
    public String minus() {
        return "-";
    }

    @Override
    public String conjugateSum(String polynomial, String summand) {
        return "\\sum_{" + polynomial + "=0} " + summand;
    }

    /** {@code C1} becomes {@code C_{1}}; other names stay as they are. */
    @Override
    public String constant(String name) {
        return name.replaceFirst("^([A-Za-z]+)(\\d+)$", "$1_{$2}");
    }

    @Override
    public String pi() {
        return "\\pi";
    }

    @Override
    public String lambda() {
        return "\\lambda";
    }

    /** {@code y^{(4)}} beyond the third derivative. */
    @Override
    public String derivative(String function, int order) {
        return order <= 3 ? function + "'".repeat(order) : function + "^{(" + order + ")}";
    }

    /** {@code =}, {@code \approx}, {@code \geq}. */
    @Override
    public String relation(String left, String symbol, String right) {
        String command = switch (symbol) {
            case "≈" -> "\\approx";
            case "≥" -> "\\geq";
            case "∈" -> "\\in";
            default -> symbol;
        };
        return left + " " + command + " " + right;
    }

    /** Names as written, with the reals ℝ as {@code \\mathbb{R}}. */
    @Override
    public String name(String identifier) {
        return identifier.equals("ℝ") ? "\\mathbb{R}" : identifier;
    }

    /** Allowed outside braces; the open groups are the unmatched {@code \\left}s. */
    @Override
    public Optional<Integer> openGroups(String written) {
        int braces = 0;
        for (int i = 0; i < written.length(); i++) {
            char c = written.charAt(i);
            braces += c == '{' ? 1 : c == '}' ? -1 : 0;
        }
        int open = count(written, "\\left") - count(written, "\\right");
        return braces == 0 ? Optional.of(open) : Optional.empty();
    }

    @Override
    public String closeGroups(int count) {
        return "\\right.".repeat(count);
    }

    @Override
    public String reopenGroups(int count) {
        return "\\left.".repeat(count);
    }

    private static int count(String text, String word) {
        int found = 0;
        for (int at = text.indexOf(word); at >= 0; at = text.indexOf(word, at + word.length())) {
            found++;
        }
        return found;
    }

    @Override
    public String text(String words) {
        return "\\text{" + words + "}";
    }
}
