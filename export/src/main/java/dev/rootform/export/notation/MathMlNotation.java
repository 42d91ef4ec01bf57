package dev.rootform.export.notation;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Presentation MathML (the MathML Core elements mrow, mi, mn, mo, msup, msub, mfrac, msqrt,
 * munder): every atom is an element, every operand of a two-child element is wrapped in an
 * {@code mrow}, so written pieces can be concatenated freely. Names are XML-escaped.
 *
 * @since 0.2
 */
public final class MathMlNotation implements Notation {
    public static final MathMlNotation INSTANCE = new MathMlNotation();
    /** U+2062 INVISIBLE TIMES, for products written by juxtaposition. */
    private static final String INVISIBLE_TIMES = "<mo>&#x2062;</mo>";
    /** U+2061 FUNCTION APPLICATION, between a function name and its argument. */
    private static final String APPLY = "<mo>&#x2061;</mo>";

    /** Primes U+2032, U+2033, U+2034 for the first three derivatives (the glyphs are already raised). */
    /** An element tag: closing slash, name, self-closing slash. */
    private static final Pattern TAG = Pattern.compile("<(/?)([a-z]+)[^>]*?(/?)>");
    private static final String[] PRIMES = {"&#x2032;", "&#x2033;", "&#x2034;"};

    private MathMlNotation() {
    }

    @Override
    public String fraction(String numerator, String denominator) {
        return "<mfrac>" + row(numerator) + row(denominator) + "</mfrac>";
    }

    @Override
    public String sqrt(String radicand) {
        return "<msqrt>" + radicand + "</msqrt>";
    }

    /** A dot only before a number or a fraction, where juxtaposition would misread; else invisible times. */
    @Override
    public String times(String left, String right) {
        boolean number = right.startsWith("<mn") || right.startsWith("<mfrac") || right.startsWith("<mrow><mn");
        return left + (number ? "<mo>&#x22C5;</mo>" : INVISIBLE_TIMES) + right;
    }

    @Override
    public String implicit(String left, String right) {
        return left + INVISIBLE_TIMES + right;
    }

    @Override
    public String power(String base, String exponent) {
        return "<msup>" + row(base) + row(exponent) + "</msup>";
    }

    @Override
    public String function(String name, String argument) {
        return "<mi>" + name + "</mi>" + APPLY + parens(argument);
    }

    /**
     * Fences that stretch only around a fraction: a stretchy fence without a math font gets side
     * space in browsers, so {@code cos(3t)} and {@code y(t)} keep plain, tight parentheses.
     */
    @Override
    public String parens(String inner) {
        String stretchy = inner.contains("<mfrac") ? "true" : "false";
        return "<mrow><mo fence=\"true\" stretchy=\"" + stretchy + "\" form=\"prefix\">(</mo>" + inner
                + "<mo fence=\"true\" stretchy=\"" + stretchy + "\" form=\"postfix\">)</mo></mrow>";
    }

    @Override
    public String clarify(String inner) {
        return row(inner);
    }

    @Override
    public String plus() {
        return "<mo>+</mo>";
    }

    @Override
    public String minus() {
        return "<mo>&#x2212;</mo>";
    }

    @Override
    public String conjugateSum(String polynomial, String summand) {
        return "<munder><mo>&#x2211;</mo><mrow>" + polynomial + "<mo>=</mo><mn>0</mn></mrow></munder>" + summand;
    }

    /** {@code C1} becomes C with subscript 1; other names stay one identifier. */
    @Override
    public String constant(String name) {
        if (name.matches("[A-Za-z]+\\d+")) {
            String letters = name.replaceAll("\\d+$", "");
            return "<msub>" + name(letters) + number(name.substring(letters.length())) + "</msub>";
        }
        return name(name);
    }

    @Override
    public String pi() {
        return "<mi>&#x3C0;</mi>";
    }

    @Override
    public String lambda() {
        return "<mi>&#x3BB;</mi>";
    }

    @Override
    public String number(String digits) {
        return "<mn>" + digits + "</mn>";
    }

    @Override
    public String name(String identifier) {
        return "<mi>" + Xml.escape(identifier) + "</mi>";
    }

    @Override
    public String negate(String body) {
        return "<mo>&#x2212;</mo>" + body;
    }

    private static String row(String inner) {
        return "<mrow>" + inner + "</mrow>";
    }

    @Override
    public String derivative(String function, int order) {
        if (order == 0) {
            return function;
        }
        if (order <= 3) {
            return "<mrow>" + function + "<mo lspace=\"0\" rspace=\"0\">" + PRIMES[order - 1] + "</mo></mrow>";
        }
        return "<msup>" + row(function) + row(parens(number(Integer.toString(order)))) + "</msup>";
    }

    @Override
    public String applied(String function, String argument) {
        return function + APPLY + parens(argument);
    }

    @Override
    public String indexed(String sequence, String index) {
        return sequence + "<mrow><mo fence=\"true\" stretchy=\"false\">[</mo>" + index
                + "<mo fence=\"true\" stretchy=\"false\">]</mo></mrow>";
    }

    @Override
    public String shifted(String variable, int k) {
        return k == 0 ? variable : variable + (k > 0 ? plus() : minus()) + number(Integer.toString(Math.abs(k)));
    }

    @Override
    public String relation(String left, String symbol, String right) {
        return left + "<mo>" + Xml.escape(symbol) + "</mo>" + right;
    }

    /** Allowed where every open element is an {@code mrow}, which can be closed and reopened. */
    @Override
    public Optional<Integer> openGroups(String written) {
        Deque<String> open = new ArrayDeque<>();
        Matcher tag = TAG.matcher(written);
        while (tag.find()) {
            if (tag.group(3).equals("/")) {
                continue;
            }
            if (tag.group(1).equals("/")) {
                open.pop();
            } else {
                open.push(tag.group(2));
            }
        }
        return open.stream().allMatch("mrow"::equals) ? Optional.of(open.size()) : Optional.empty();
    }

    @Override
    public String closeGroups(int count) {
        return "</mrow>".repeat(count);
    }

    @Override
    public String reopenGroups(int count) {
        return "<mrow>".repeat(count);
    }

    @Override
    public String text(String words) {
        return "<mtext>" + Xml.escape(words) + "</mtext>";
    }

    /** A stretchy fence stretches to its own row only, so a fence split from its partner is fixed-size. */
    @Override
    public String unpairedFences(String line) {
        return line.replace("stretchy=\"true\"", "stretchy=\"false\"");
    }
}
