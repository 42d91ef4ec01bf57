package dev.rootform.export.document;

import dev.rootform.export.notation.LineBreaker;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Set;
import java.util.function.UnaryOperator;

/**
 * Converts the plain formulas of answers with parameters (as {@link ParametricFormula} and the
 * conditions write them: names, numbers, + - · / = ≠ &lt; &gt; &lt;= &gt;=, ^ with a name, number or
 * parenthesised exponent, √(…), cos/sin/cosh/sinh/arccos(…)) into LaTeX or presentation MathML.
 * Only a notation change: nothing is computed.
 */
final class PlainMath {
    private static final Set<String> FUNCTIONS = Set.of("cos", "sin", "cosh", "sinh", "arccos");

    /** A read piece: a name, number, operator, parenthesised group, function call, root, or power. */
    private sealed interface Piece permits Atom, Group, Call, Root, Power { }

    private record Atom(String text, char kind) implements Piece { }

    private record Group(List<Piece> inner) implements Piece { }

    private record Call(String name, List<Piece> argument) implements Piece { }

    private record Root(List<Piece> inner) implements Piece { }

    private record Power(Piece base, Piece exponent) implements Piece { }

    private final String text;
    private int at;

    private PlainMath(String text) {
        this.text = text;
    }

    static String latex(String plain) {
        return latex(new PlainMath(plain).sequence());
    }

    /**
     * The plain formula in lines no wider than the breaker's width, written by {@code writer}
     * ({@link #latex(String)} or {@link #mathMl(String)}, the notation of the breaker): breaks fall
     * before the binary + and − signs (those written with a space on each side), also inside
     * parentheses but never inside a power or a root.
     */
    static List<String> lines(String plain, LineBreaker breaker, UnaryOperator<String> writer) {
        String marked = marked(plain);
        return breaker.lines(marked, writer.apply(marked));
    }

    /**
     * Plain formulas joined by {@code separator} into lines: lines break between formulas, and
     * inside one (as in {@link #lines(String, LineBreaker, UnaryOperator)}) only when it is wider
     * than a line by itself.
     */
    static List<String> lines(List<String> plain, String separator, LineBreaker breaker, UnaryOperator<String> writer) {
        List<String> marked = plain.stream().map(p -> p.length() > breaker.width() ? marked(p) : p).toList();
        return breaker.list(marked, marked.stream().map(writer).toList(), separator);
    }

    /**
     * The plain formula with {@link LineBreaker#MARK} before each binary + and − outside powers
     * and roots (a parenthesised exponent, the base of a power, the argument of √), where LaTeX
     * sets braces and no line may break.
     */
    private static String marked(String plain) {
        StringBuilder out = new StringBuilder();
        Deque<Integer> opened = new ArrayDeque<>();
        int closed = 0;
        for (int i = 0; i < plain.length(); i++) {
            char c = plain.charAt(i);
            if (c == '(') {
                boolean braced = i > 0 && (plain.charAt(i - 1) == '^' || plain.charAt(i - 1) == '√');
                opened.push(braced || closed > 0 ? -1 : out.length());
                closed += braced || closed > 0 ? 1 : 0;
            } else if (c == ')' && !opened.isEmpty()) {
                int start = opened.pop();
                closed -= start < 0 ? 1 : 0;
                if (start >= 0 && i + 1 < plain.length() && plain.charAt(i + 1) == '^') {
                    out.replace(start, out.length(), out.substring(start).replace(LineBreaker.MARK, ""));
                }
            } else if ((c == '+' || c == '-') && closed == 0 && i > 0 && plain.charAt(i - 1) == ' ' && i + 1 < plain.length()
                    && plain.charAt(i + 1) == ' ') {
                out.append(LineBreaker.MARK);
            }
            out.append(c);
        }
        return out.toString();
    }

    static String mathMl(String plain) {
        return "<mrow>" + mathMl(new PlainMath(plain).sequence()) + "</mrow>";
    }

    private List<Piece> sequence() {
        List<Piece> out = new ArrayList<>();
        while (at < text.length() && text.charAt(at) != ')') {
            if (Character.isWhitespace(text.charAt(at))) {
                at++;
                continue;
            }
            Piece p = atom();
            while (at < text.length() && text.charAt(at) == '^') {
                at++;
                p = new Power(p, atom());
            }
            out.add(p);
        }
        return out;
    }

    private Piece atom() {
        char c = text.charAt(at);
        if (c == '(') {
            return new Group(group());
        }
        if (c == '√') {
            at++;
            return new Root(group());
        }
        if (Character.isLetter(c)) {
            int start = at;
            while (at < text.length() && Character.isLetterOrDigit(text.charAt(at))) {
                at++;
            }
            String name = text.substring(start, at);
            if (FUNCTIONS.contains(name) && at < text.length() && text.charAt(at) == '(') {
                return new Call(name, group());
            }
            return new Atom(name, 'n');
        }
        if (Character.isDigit(c)) {
            int start = at;
            while (at < text.length() && (Character.isDigit(text.charAt(at)) || text.charAt(at) == '.')) {
                at++;
            }
            return new Atom(text.substring(start, at), 'd');
        }
        if ((c == '<' || c == '>') && at + 1 < text.length() && text.charAt(at + 1) == '=') {
            at += 2;
            return new Atom(c + "=", 'o');
        }
        at++;
        return new Atom(String.valueOf(c), 'o');
    }

    private List<Piece> group() {
        at++;
        List<Piece> inner = sequence();
        at = Math.min(text.length(), at + 1);
        return inner;
    }

    private static String latex(List<Piece> pieces) {
        StringBuilder s = new StringBuilder();
        for (Piece p : pieces) {
            s.append(latex(p));
        }
        return s.toString().strip();
    }

    private static String latex(Piece p) {
        if (p instanceof Atom a) {
            if (a.kind() == 'n') {
                return latexName(a.text());
            }
            if (a.kind() == 'd') {
                return a.text();
            }
            switch (a.text()) {
                case LineBreaker.MARK:
                    return LineBreaker.MARK;
                case "·":
                    return " \\cdot ";
                case "≠":
                    return " \\neq ";
                case "<=":
                    return " \\leq ";
                case ">=":
                    return " \\geq ";
                case "/":
                    return "/";
                default:
                    return " " + a.text() + " ";
            }
        }
        if (p instanceof Group g) {
            return "\\left(" + latex(g.inner()) + "\\right)";
        }
        if (p instanceof Call c) {
            return "\\" + c.name() + "\\left(" + latex(c.argument()) + "\\right)";
        }
        if (p instanceof Root r) {
            return "\\sqrt{" + latex(r.inner()) + "}";
        }
        Power w = (Power) p;
        String exponent = w.exponent() instanceof Group g ? latex(g.inner()) : latex(w.exponent());
        return "{" + latex(w.base()) + "}^{" + exponent + "}";
    }

    private static String latexName(String name) {
        String letters = name.replaceAll("\\d+$", "");
        String digits = name.substring(letters.length());
        String head = letters.equals("ω") ? "\\omega" : letters.equals("θ") ? "\\theta" : letters.equals("λ") ? "\\lambda"
                : letters.length() > 1 ? "\\mathit{" + letters + "}" : letters;
        return digits.isEmpty() ? head : head + "_{" + digits + "}";
    }

    private static String mathMl(List<Piece> pieces) {
        StringBuilder s = new StringBuilder();
        for (Piece p : pieces) {
            s.append(mathMl(p));
        }
        return s.toString();
    }

    private static String mathMl(Piece p) {
        if (p instanceof Atom a) {
            if (a.text().equals(LineBreaker.MARK)) {
                return LineBreaker.MARK;
            }
            if (a.kind() == 'n') {
                String letters = a.text().replaceAll("\\d+$", "");
                String digits = a.text().substring(letters.length());
                String mi = "<mi>" + letters + "</mi>";
                return digits.isEmpty() ? mi : "<msub>" + mi + "<mn>" + digits + "</mn></msub>";
            }
            if (a.kind() == 'd') {
                return "<mn>" + a.text() + "</mn>";
            }
            String op = a.text().equals("<") ? "&lt;" : a.text().equals(">") ? "&gt;" : a.text().equals("<=") ? "&#x2264;"
                    : a.text().equals(">=") ? "&#x2265;" : a.text().equals("·") ? "&#x22C5;" : a.text();
            return "<mo>" + op + "</mo>";
        }
        if (p instanceof Group g) {
            return "<mrow><mo>(</mo>" + mathMl(g.inner()) + "<mo>)</mo></mrow>";
        }
        if (p instanceof Call c) {
            return "<mrow><mi>" + c.name() + "</mi><mo>&#x2061;</mo><mrow><mo>(</mo>" + mathMl(c.argument()) + "<mo>)</mo></mrow></mrow>";
        }
        if (p instanceof Root r) {
            return "<msqrt>" + mathMl(r.inner()) + "</msqrt>";
        }
        Power w = (Power) p;
        String exponent = w.exponent() instanceof Group g ? "<mrow>" + mathMl(g.inner()) + "</mrow>" : mathMl(w.exponent());
        return "<msup>" + mathMl(w.base()) + exponent + "</msup>";
    }
}
