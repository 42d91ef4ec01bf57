package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.InputException;
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
    private static final String SINGLE = "+-*/^()[]!";
    private static final Token.Kind[] SINGLE_KINDS = {Token.Kind.PLUS, Token.Kind.MINUS, Token.Kind.STAR,
        Token.Kind.SLASH, Token.Kind.CARET, Token.Kind.LPAREN, Token.Kind.RPAREN, Token.Kind.LBRACKET,
        Token.Kind.RBRACKET, Token.Kind.BANG};

    private final String source;
    private final int end;
    private int position;

    /** A lexer for {@code source.substring(begin, end)}; token offsets refer to the whole source. */
    Lexer(String source, int begin, int end) {
        this.source = source;
        this.end = end;
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
        if (Character.isLetter(c)) {
            return Token.of(Token.Kind.NAME, run(Character::isLetter), position);
        }
        if (c == '\'') {
            return Token.of(Token.Kind.PRIMES, run(ch -> ch == '\''), position);
        }
        if (c == '=') {
            boolean twice = position + 1 < end && source.charAt(position + 1) == '=';
            return Token.of(Token.Kind.EQUALS, twice ? "==" : "=", position);
        }
        int single = SINGLE.indexOf(c);
        if (single < 0) {
            throw new InputException("unexpected character '" + c + "'", source, position);
        }
        return Token.of(SINGLE_KINDS[single], String.valueOf(c), position);
    }

    private Token number() {
        NumberLiteral n = NumberLiteral.read(source, position, end, "number");
        return new Token(Token.Kind.NUMBER, n.text(), position, n.end(), n.value(), null);
    }

    private Token leibniz(Matcher m) {
        int top = m.group(1) == null ? 1 : Integer.parseInt(m.group(1));
        int bottom = m.group(4) == null ? 1 : Integer.parseInt(m.group(4));
        if (top != bottom) {
            throw new InputException("derivative " + m.group() + ": orders " + top + " and " + bottom + " differ",
                    source, position);
        }
        Token.Leibniz parts = new Token.Leibniz(m.group(2), m.group(3), top);
        return new Token(Token.Kind.LEIBNIZ, m.group(), position, m.end(), null, parts);
    }

    private String run(java.util.function.IntPredicate member) {
        int stop = position;
        while (stop < end && member.test(source.charAt(stop))) {
            stop++;
        }
        return source.substring(position, stop);
    }
}
