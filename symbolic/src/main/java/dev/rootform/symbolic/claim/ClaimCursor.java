package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.claim.ClaimToken.Kind;
import dev.rootform.symbolic.model.InputException;
import java.util.List;

/** The tokens of one claim and the reading position in them, with the refusals that point into the claim. */
final class ClaimCursor {
    private final String source;
    private final List<ClaimToken> tokens;
    /** How the claim should start, for a misplaced '=': {@code x[n] = formula}. */
    private final String form;
    private int next;

    ClaimCursor(String source, String form) {
        this.source = source;
        this.tokens = new ClaimLexer(source).tokens();
        this.form = form;
    }

    String source() {
        return source;
    }

    ClaimToken peek() {
        return at(0);
    }

    ClaimToken at(int ahead) {
        return tokens.get(Math.min(next + ahead, tokens.size() - 1));
    }

    ClaimToken advance() {
        ClaimToken token = peek();
        if (!token.is(Kind.END)) {
            next++;
        }
        return token;
    }

    /** True when the next token is the name {@code name}. */
    boolean atName(String name) {
        return isName(peek(), name);
    }

    static boolean isName(ClaimToken token, String name) {
        return token.is(Kind.NAME) && token.text().equals(name);
    }

    ClaimToken expect(Kind kind, String what) {
        if (!peek().is(kind)) {
            throw error("expected " + what, peek().start());
        }
        return advance();
    }

    ClaimToken close(Kind kind, ClaimToken open) {
        if (!peek().is(kind)) {
            throw error("unbalanced '" + open.text() + "'", open.start());
        }
        return advance();
    }

    /** A constant integer such as an index or a range bound, possibly negative. */
    Rational integerConstant(String role) {
        int start = peek().start();
        boolean negative = false;
        while (peek().is(Kind.MINUS) || peek().is(Kind.PLUS)) {
            negative ^= advance().is(Kind.MINUS);
        }
        ClaimToken number = peek();
        if (!number.is(Kind.NUMBER) || !number.number().isInteger()) {
            throw error(role + " must be an integer", start);
        }
        advance();
        return negative ? number.number().negate() : number.number();
    }

    InputException unexpected(ClaimToken token) {
        if (token.is(Kind.END)) {
            return error("unexpected end of the claim", token.start());
        }
        if (token.is(Kind.RPAREN) || token.is(Kind.RBRACKET) || token.is(Kind.RBRACE)) {
            return error("unbalanced '" + token.text() + "'", token.start());
        }
        if (token.is(Kind.EQUALS)) {
            return error("unexpected '='; write the claim as " + form + " = formula", token.start());
        }
        return error("unexpected '" + token.text() + "'", token.start());
    }

    InputException error(String message, int position) {
        return new InputException(message, source, position);
    }
}
