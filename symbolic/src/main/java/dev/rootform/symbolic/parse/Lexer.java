package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Splits a range of the source into tokens. Names are runs of letters, so {@code 3t} is a number
 * followed by a name; a derivative in the form {@code dy/dt}, {@code d2y/dt2} or
 * {@code d^2y/dt^2} becomes a single token.
 */
final class Lexer {
    private static final Pattern LEIBNIZ = Pattern.compile(
            "d(?:\\^?(\\d+))?\\s*([A-Za-z]+)\\s*/\\s*d\\s*([A-Za-z]+)(?:\\^?(\\d+))?");
    /** One-character tokens; the middle dot and the times sign, as rootform prints products, multiply too. */
    private static final String SINGLE = "+-*/^()[]!\u00b7\u00d7";
    private static final Token.Kind[] SINGLE_KINDS = {Token.Kind.PLUS, Token.Kind.MINUS, Token.Kind.STAR,
        Token.Kind.SLASH, Token.Kind.CARET, Token.Kind.LPAREN, Token.Kind.RPAREN, Token.Kind.LBRACKET,
        Token.Kind.RBRACKET, Token.Kind.BANG, Token.Kind.STAR, Token.Kind.STAR};
    /** The letter π, as rootform prints it: read as the name pi. */
    private static final char PI_LETTER = '\u03c0';

    private final String source;
    private final int end;
    /** Declared parameter names, which may carry digits ({@code x0}); empty for an ordinary problem. */
    private final java.util.Set<String> parameters;
    private int position;

    /** A lexer for {@code source.substring(begin, end)}; token offsets refer to the whole source. */
    Lexer(String source, int begin, int end) {
        this(source, begin, end, java.util.Set.of());
    }

    /** A lexer that also reads the declared {@code parameters} (letters then letters or digits) as single names. */
    Lexer(String source, int begin, int end, java.util.Set<String> parameters) {
        this.source = source;
        this.end = end;
        this.parameters = java.util.Set.copyOf(parameters);
        this.position = begin;
    }

    /** All tokens of the range, ending with an {@link Token.Kind#END} token. */
    List<Token> tokens() {
        List<Token> tokens = new ArrayList<>();
        while (true) {
            while (position < end && Character.isWhitespace(source.charAt(position))) {
                position++;
            }
            if (position >= end) {
                tokens.add(Token.of(Token.Kind.END, "", end));
                return tokens;
            }
            Token token = next();
            tokens.add(token);
            position = token.end();
        }
    }

    private Token next() {
        char c = source.charAt(position);
        if (Character.isDigit(c) || c == '.') {
            return number();
        }
        if (c == 'd') {
            Matcher m = LEIBNIZ.matcher(source).region(position, end);
            if (m.lookingAt()) {
                return leibniz(m);
            }
        }
        if (c == PI_LETTER) {
            return new Token(Token.Kind.NAME, Names.PI, position, position + 1, null, null);
        }
        if (Character.isLetter(c) && !parameters.isEmpty()) {
            String identifier = run(ch -> ch < 0x80 && Character.isLetterOrDigit(ch));
            if (parameters.contains(identifier)) {
                return Token.of(Token.Kind.NAME, identifier, position);
            }
        }
        if (Character.isLetter(c)) {
            return Token.of(Token.Kind.NAME, run(ch -> Character.isLetter(ch) && ch != PI_LETTER), position);
        }
        if (c == '\'') {
            return Token.of(Token.Kind.PRIMES, run(ch -> ch == '\''), position);
        }
        if (c == '=') {
            if (position + 1 < end && source.charAt(position + 1) == '=') {
                throw new InputException("'==' is not an equation sign: write '=' for an equation", source, position);
            }
            return Token.of(Token.Kind.EQUALS, "=", position);
        }
        int single = SINGLE.indexOf(c);
        if (single < 0) {
            String shown = c >= 0x20 && c < 0x7f ? "'" + c + "'" : String.format("U+%04X", (int) c);
            throw new InputException("unexpected character " + shown, source, position);
        }
        return Token.of(SINGLE_KINDS[single], String.valueOf(c), position);
    }

    /** A number literal, read and bounded by {@link NumberLiteral}. */
    private Token number() {
        NumberLiteral n = NumberLiteral.read(source, position, end, "number");
        return new Token(Token.Kind.NUMBER, n.text(), position, n.end(), n.value(), null);
    }

    private Token leibniz(Matcher m) {
        int top = order(m.group(1), m);
        int bottom = order(m.group(4), m);
        if (top != bottom) {
            throw new InputException("derivative " + shorten(m.group()) + ": orders " + top + " and " + bottom + " differ",
                    source, position);
        }
        Token.Leibniz parts = new Token.Leibniz(m.group(2), m.group(3), top);
        return new Token(Token.Kind.LEIBNIZ, m.group(), position, m.end(), null, parts);
    }

    /** The order written in a Leibniz derivative (1 when absent), at most {@link Limits#MAX_ORDER}. */
    private int order(String digits, Matcher m) {
        if (digits == null) {
            return 1;
        }
        String significant = digits.replaceFirst("^0+(?=.)", "");
        if (significant.length() > 9 || Integer.parseInt(significant) > Limits.MAX_ORDER) {
            throw new InputException("derivative " + shorten(m.group()) + ": order " + shorten(significant)
                    + " is above the limit " + Limits.MAX_ORDER, source, position);
        }
        return Integer.parseInt(significant);
    }

    /** {@code text}, cut to 40 characters for a message. */
    static String shorten(String text) {
        return text.length() <= 40 ? text : text.substring(0, 37) + "...";
    }

    private String run(java.util.function.IntPredicate member) {
        int stop = position;
        while (stop < end && member.test(source.charAt(stop))) {
            stop++;
        }
        return source.substring(position, stop);
    }
}
