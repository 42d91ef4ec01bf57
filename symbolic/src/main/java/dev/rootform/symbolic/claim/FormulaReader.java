package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.claim.ClaimToken.Kind;
import dev.rootform.symbolic.claim.Expr.Binary.Op;
import java.util.List;
import java.util.Optional;

/**
 * Reads one formula of a claim by recursive descent: sums, products (also implicit: {@code 2t},
 * {@code e^(-t)(…)}), unary signs, powers ({@code ^} binds tighter than a product and to the right,
 * as in the equation syntax), parentheses, functions, {@code √}, and root sums
 * {@code Σ_{p(λ) = 0} summand} whose summand is one product.
 */
final class FormulaReader {
    private final ClaimCursor cursor;
    private final ClaimNames names;
    private final String variable;
    /** True while reading the summand or polynomial of a root sum, where λ is bound. */
    private boolean inRootSum;

    FormulaReader(ClaimCursor cursor, ClaimNames names, String variable) {
        this.cursor = cursor;
        this.names = names;
        this.variable = variable;
    }

    Expr expression() {
        Expr node = term();
        while (cursor.peek().is(Kind.PLUS) || cursor.peek().is(Kind.MINUS)) {
            Op op = cursor.advance().is(Kind.PLUS) ? Op.ADD : Op.SUBTRACT;
            node = new Expr.Binary(op, node, term(), node.start());
        }
        return node;
    }

    Expr term() {
        Expr node = unary();
        while (true) {
            if (cursor.peek().is(Kind.TIMES) || cursor.peek().is(Kind.DIVIDE)) {
                Op op = cursor.advance().is(Kind.TIMES) ? Op.MULTIPLY : Op.DIVIDE;
                node = new Expr.Binary(op, node, unary(), node.start());
            } else if (startsPrimary(cursor.peek())) {
                node = new Expr.Binary(Op.MULTIPLY, node, power(), node.start());
            } else {
                return node;
            }
        }
    }

    private Expr unary() {
        if (cursor.peek().is(Kind.MINUS)) {
            ClaimToken minus = cursor.advance();
            return new Expr.Negation(unary(), minus.start());
        }
        if (cursor.peek().is(Kind.PLUS)) {
            cursor.advance();
            return unary();
        }
        return power();
    }

    private Expr power() {
        Expr base = primary();
        if (cursor.peek().is(Kind.PRIME)) {
            throw cursor.error("a claim is a formula, not an equation with derivatives", cursor.peek().start());
        }
        if (cursor.peek().is(Kind.BANG)) {
            throw cursor.error("factorials are out of scope in a claim", cursor.peek().start());
        }
        if (!cursor.peek().is(Kind.CARET)) {
            return base;
        }
        cursor.advance();
        return new Expr.Binary(Op.POWER, base, unary(), base.start());
    }

    private Expr primary() {
        ClaimToken token = cursor.peek();
        switch (token.kind()) {
            case NUMBER:
                cursor.advance();
                return new Expr.Number(token.number(), token.start());
            case LPAREN: {
                cursor.advance();
                Expr inner = expression();
                cursor.close(Kind.RPAREN, token);
                return inner;
            }
            case SQRT:
                cursor.advance();
                return new Expr.Call(Expr.Call.Function.SQRT, power(), token.start());
            case SIGMA:
                return rootSum();
            case NAME:
                return named();
            default:
                throw cursor.unexpected(token);
        }
    }

    /** A name run, split into known names where it is not one ({@code pin} is π·n, {@code tcos(t)} is t·cos(t)). */
    private Expr named() {
        ClaimToken token = cursor.advance();
        String run = token.text();
        if (names.isUnknownFunction(run, cursor.peek().is(Kind.LPAREN))) {
            throw cursor.error("unknown function '" + run + "'", token.start());
        }
        List<String> parts = names.split(run, token.start());
        Expr product = null;
        int offset = token.start();
        for (int i = 0; i < parts.size(); i++) {
            Expr factor = atom(parts.get(i), offset, i == parts.size() - 1);
            product = product == null ? factor : new Expr.Binary(Op.MULTIPLY, product, factor, product.start());
            offset += parts.get(i).length();
        }
        return product;
    }

    /** One known name; a function only as the last part of a run, followed by its argument. */
    private Expr atom(String name, int start, boolean last) {
        Optional<Expr.Call.Function> f = names.function(name);
        if (f.isPresent()) {
            if (!last || !cursor.peek().is(Kind.LPAREN)) {
                throw cursor.error(name + " needs a parenthesised argument", start);
            }
            ClaimToken open = cursor.advance();
            Expr argument = expression();
            cursor.close(Kind.RPAREN, open);
            return new Expr.Call(f.get(), argument, start);
        }
        if (name.equals(variable)) {
            return new Expr.Variable(variable, start);
        }
        Expr.Constant.Kind kind = names.constant(name);
        if (kind == Expr.Constant.Kind.LAMBDA && !inRootSum) {
            throw cursor.error("λ stands for a root only inside a root sum Σ_{p(λ) = 0}", start);
        }
        return new Expr.Constant(kind, start);
    }

    /** Σ_{p(λ) = 0} summand, the summand being one product. */
    private Expr rootSum() {
        ClaimToken sigma = cursor.advance();
        if (inRootSum) {
            throw cursor.error("root sums cannot be nested", sigma.start());
        }
        cursor.expect(Kind.UNDERSCORE, "'_' after Σ");
        ClaimToken open = cursor.expect(Kind.LBRACE, "'{' after Σ_");
        inRootSum = true;
        Expr polynomial = expression();
        cursor.expect(Kind.EQUALS, "'=' in the root sum's polynomial");
        Expr zero = expression();
        cursor.close(Kind.RBRACE, open);
        RationalPolynomial f = RootPolynomial.of(cursor.source(), polynomial).subtract(RootPolynomial.of(cursor.source(), zero));
        if (f.degree() < 1) {
            throw cursor.error("the root sum's polynomial must have degree 1 or more", polynomial.start());
        }
        if (f.gcd(f.derivative()).degree() > 0) {
            throw cursor.error("the root sum's polynomial must have distinct roots", polynomial.start());
        }
        Expr summand = term();
        inRootSum = false;
        return new Expr.RootSum(f.monic(), summand, sigma.start());
    }

    private static boolean startsPrimary(ClaimToken token) {
        return token.is(Kind.NUMBER) || token.is(Kind.LPAREN) || token.is(Kind.SQRT) || token.is(Kind.SIGMA)
                || token.is(Kind.NAME) && !token.text().equals(ClaimParser.FOR);
    }
}
