package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.parse.Node.Binary.Op;
import dev.rootform.symbolic.parse.Token.Kind;
import java.util.List;

/**
 * Recursive-descent reader of {@code expression = expression} over a token list. Multiplication
 * may be implicit ({@code 2y'}, {@code 3 t}); {@code ^} binds tighter and to the right; a name
 * followed by primes, by {@code ^(k)} or in Leibniz form is a derivative.
 */
final class Parser {
    /** The two sides of an equation or condition. */
    record Equality(Node left, Node right) { }

    private final String source;
    private final List<Token> tokens;
    private final String variable;
    private int next;
    /** How many expressions, signs and exponents enclose the token being read. */
    private int nesting;

    /**
     * @param source the whole text being read
     * @param begin start of the range to read
     * @param end end of the range to read
     * @param variable the explicit independent variable, or null; it is never read as a derivative in {@code v^(k)}
     */
    Parser(String source, int begin, int end, String variable) {
        this(source, begin, end, variable, java.util.Set.of());
    }

    /** A reader that takes the declared {@code parameters} as single names (see {@link Lexer}). */
    Parser(String source, int begin, int end, String variable, java.util.Set<String> parameters) {
        this.source = source;
        this.tokens = new Lexer(source, begin, end, parameters).tokens();
        this.variable = variable;
    }

    /** Reads the whole range as {@code left = right}; {@code what} names the construct in the error for a missing '='. */
    Equality equality(String what) {
        Node left = expression();
        if (!peek().is(Kind.EQUALS)) {
            if (peek().is(Kind.END)) {
                throw new InputException("expected '=' in the " + what, source, peek().start());
            }
            throw unexpected(peek());
        }
        advance();
        Node right = expression();
        if (!peek().is(Kind.END)) {
            throw unexpected(peek());
        }
        return new Equality(shallow(left), shallow(right));
    }

    /** {@code side}, unless its tree is deeper than {@link Limits#MAX_EXPRESSION_DEPTH}. */
    private Node shallow(Node side) {
        side.atDepth(Limits.MAX_EXPRESSION_DEPTH + 1).ifPresent(deep -> {
            throw new InputException("expression too long: more than " + Limits.MAX_EXPRESSION_DEPTH
                    + " operations one after another", source, deep.start());
        });
        return side;
    }

    /** Reads the whole range as one expression (no {@code =}). */
    Node expressionOnly() {
        Node node = expression();
        if (!peek().is(Kind.END)) {
            throw unexpected(peek());
        }
        return node;
    }

    private Node expression() {
        enter();
        int start = peek().start();
        Node node = term();
        while (peek().is(Kind.PLUS) || peek().is(Kind.MINUS)) {
            Op op = advance().is(Kind.PLUS) ? Op.ADD : Op.SUB;
            Node right = term();
            node = new Node.Binary(op, node, right, start, consumedEnd());
        }
        nesting--;
        return node;
    }

    /** One level deeper, refused beyond {@link Limits#MAX_NESTING} (so reading never exhausts the stack). */
    private void enter() {
        if (++nesting > Limits.MAX_NESTING) {
            throw new InputException("nested too deeply: more than " + Limits.MAX_NESTING
                    + " levels of parentheses, signs or exponents", source, peek().start());
        }
    }

    private Node term() {
        int start = peek().start();
        Node node = unary();
        while (true) {
            Op op;
            Node right;
            if (peek().is(Kind.STAR) || peek().is(Kind.SLASH)) {
                op = advance().is(Kind.STAR) ? Op.MUL : Op.DIV;
                right = unary();
            } else if (startsPrimary(peek())) {
                if (peek().is(Kind.NUMBER) && tokens.get(next - 1).is(Kind.NUMBER)) {
                    throw new InputException("two numbers side by side: write '*' to multiply them", source, peek().start());
                }
                op = Op.MUL;
                right = power();
            } else {
                return node;
            }
            node = new Node.Binary(op, node, right, start, consumedEnd());
        }
    }

    private Node unary() {
        if (peek().is(Kind.MINUS) || peek().is(Kind.PLUS)) {
            Token sign = advance();
            enter();
            Node operand = unary();
            nesting--;
            return sign.is(Kind.PLUS) ? operand : new Node.Negation(operand, sign.start(), consumedEnd());
        }
        return power();
    }

    private Node power() {
        int start = peek().start();
        Node base = primary();
        if (peek().is(Kind.BANG)) {
            throw new InputException("factorial " + source.substring(start, peek().end()) + " is out of scope",
                    source, start);
        }
        if (!peek().is(Kind.CARET)) {
            return base;
        }
        advance();
        enter();
        Node exponent = unary();
        nesting--;
        return new Node.Binary(Op.POW, base, exponent, start, consumedEnd());
    }

    private Node primary() {
        Token token = advance();
        switch (token.kind()) {
            case NUMBER:
                return new Node.Num(token.number(), token.start(), token.end());
            case LPAREN:
                Node inner = expression();
                close(Kind.RPAREN, token);
                return inner;
            case LEIBNIZ:
                Token.Leibniz d = token.leibniz();
                return new Node.Derivative(d.function(), d.order(), d.variable(), null, token.start(), token.end());
            case NAME:
                return named(token);
            default:
                throw unexpected(token);
        }
    }

    private Node named(Token name) {
        String text = name.text();
        if (peek().is(Kind.LBRACKET)) {
            Token open = advance();
            Node index = expression();
            Token close = close(Kind.RBRACKET, open);
            return new Node.Indexed(text, index, name.start(), close.end());
        }
        int order = derivativeOrder(text);
        Node argument = null;
        int end = consumedEnd();
        if (peek().is(Kind.LPAREN)) {
            Token open = advance();
            argument = expression();
            end = close(Kind.RPAREN, open).end();
        }
        if (order > 0) {
            return new Node.Derivative(text, order, null, argument, name.start(), end);
        }
        return argument == null ? new Node.Name(text, name.start(), end)
                : new Node.Call(text, argument, name.start(), end);
    }

    /** Consumes primes or {@code ^(k)} after a name and returns the derivative order (0 if none). */
    private int derivativeOrder(String name) {
        if (peek().is(Kind.PRIMES)) {
            return advance().text().length();
        }
        boolean braced = peek().is(Kind.CARET) && at(1).is(Kind.LPAREN) && at(2).is(Kind.NUMBER)
                && at(2).number().isInteger() && at(3).is(Kind.RPAREN);
        if (!braced || Names.isReserved(name, variable)) {
            return 0;
        }
        if (at(2).number().abs().compareTo(Rational.of(Limits.MAX_ORDER)) > 0) {
            throw new InputException("derivative " + name + "^(" + Lexer.shorten(at(2).text()) + "): order above the limit "
                    + Limits.MAX_ORDER, source, peek().start());
        }
        int order = at(2).number().toBigInteger().intValueExact();
        next += 4;
        return order;
    }

    private Token close(Kind kind, Token open) {
        if (!peek().is(kind)) {
            throw new InputException("unbalanced '" + open.text() + "'", source, open.start());
        }
        return advance();
    }

    private InputException unexpected(Token token) {
        if (token.is(Kind.END)) {
            return new InputException("unexpected end of input", source, token.start());
        }
        if (token.is(Kind.RPAREN) || token.is(Kind.RBRACKET)) {
            return new InputException("unbalanced '" + token.text() + "'", source, token.start());
        }
        return new InputException("unexpected '" + token.text() + "'", source, token.start());
    }

    private static boolean startsPrimary(Token token) {
        return token.is(Kind.NUMBER) || token.is(Kind.NAME) || token.is(Kind.LEIBNIZ) || token.is(Kind.LPAREN);
    }

    /** The end of the last token read. */
    private int consumedEnd() {
        return tokens.get(next - 1).end();
    }

    private Token peek() {
        return at(0);
    }

    private Token at(int ahead) {
        return tokens.get(Math.min(next + ahead, tokens.size() - 1));
    }

    private Token advance() {
        Token token = peek();
        if (!token.is(Kind.END)) {
            next++;
        }
        return token;
    }
}
