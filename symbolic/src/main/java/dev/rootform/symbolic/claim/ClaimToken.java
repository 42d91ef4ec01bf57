package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;

/**
 * One lexical unit of a claimed closed form, with its place in the text.
 *
 * @param kind what the token is
 * @param text the characters as written (a name's letters; for a superscript exponent its digits)
 * @param start offset of the first character
 * @param end offset after the last character
 * @param number the exact value of a {@link Kind#NUMBER}, otherwise null
 */
record ClaimToken(Kind kind, String text, int start, int end, Rational number) {

    /** Token kinds. A separator is {@code ;}, {@code ,} or a line break between the parts of a claim. */
    enum Kind { NUMBER, NAME, PLUS, MINUS, TIMES, DIVIDE, CARET, LPAREN, RPAREN, LBRACKET, RBRACKET, LBRACE, RBRACE,
        UNDERSCORE, EQUALS, GREATER, AT_LEAST, SQRT, SIGMA, SEPARATOR, PRIME, BANG, END }

    boolean is(Kind other) {
        return kind == other;
    }
}
