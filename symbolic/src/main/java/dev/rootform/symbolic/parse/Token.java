package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;

/**
 * One lexical unit with its place in the source: {@code start} is the offset of its first
 * character, {@code end} the offset just after its last.
 *
 * @param kind what the token is
 * @param text the characters as written
 * @param start offset of the first character
 * @param end offset after the last character
 * @param number the exact value of a {@link Kind#NUMBER}, otherwise null
 * @param leibniz the parts of a {@link Kind#LEIBNIZ} derivative, otherwise null
 */
record Token(Kind kind, String text, int start, int end, Rational number, Leibniz leibniz) {

    /** Token kinds. */
    enum Kind { NUMBER, NAME, LEIBNIZ, PRIMES, PLUS, MINUS, STAR, SLASH, CARET, LPAREN, RPAREN, LBRACKET, RBRACKET,
        EQUALS, BANG, END }

    /** A derivative written as d^k f / dv^k. */
    record Leibniz(String function, String variable, int order) { }

    static Token of(Kind kind, String text, int start) {
        return new Token(kind, text, start, start + text.length(), null, null);
    }

    boolean is(Kind other) {
        return kind == other;
    }
}
