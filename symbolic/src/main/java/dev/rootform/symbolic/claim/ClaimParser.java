package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.claim.ClaimToken.Kind;
import dev.rootform.symbolic.claim.Expr.Binary.Op;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Reads a claimed closed form in ordinary notation: {@code 2^(n+1) - 1},
 * {@code ((1+sqrt(5))/2)^n/sqrt(5)}, {@code e^(-2t)(cos(3t) + 2/3 sin(3t))}, {@code (3 + 2t)e^(-t)},
 * {@code 2cos(3t - pi/4)}, {@code cos(pi n/3)}, optionally prefixed {@code x[n] =} or {@code y(t) =},
 * followed by a range ({@code for n >= 2}) and by values claimed one by one ({@code ; x[0] = 1}),
 * the parts separated by {@code ;}, {@code ,} or line breaks. The tool's own text output reads the
 * same way ({@code 1/5·√5}, {@code 5^(n/2)·cos(n·arccos(1/5·√5))},
 * {@code Σ_{λ^3 - λ - 1 = 0} (1/2 + λ)·λ^n}). Multiplication may be implicit, {@code ^} binds
 * tighter than it and to the right, as in the equation syntax.
 *
 * @since 0.3
 */
public final class ClaimParser {
    private static final Map<String, Expr.Call.Function> FUNCTIONS = Map.of("sin", Expr.Call.Function.SIN,
            "cos", Expr.Call.Function.COS, "exp", Expr.Call.Function.EXP, "sqrt", Expr.Call.Function.SQRT,
            "arccos", Expr.Call.Function.ARCCOS, "acos", Expr.Call.Function.ARCCOS,
            "arcsin", Expr.Call.Function.ARCSIN, "asin", Expr.Call.Function.ARCSIN,
            "arctan", Expr.Call.Function.ARCTAN, "atan", Expr.Call.Function.ARCTAN);
    private static final Set<String> OTHER_FUNCTIONS = Set.of("tan", "cot", "sec", "csc", "log", "ln", "lg", "sinh",
            "cosh", "tanh", "abs", "floor", "ceil", "sign", "gamma", "min", "max", "erf", "arccot", "sinc");
    private static final String FOR = "for";
    private static final String ALL = "all";
    private static final Set<String> LAMBDA = Set.of("λ", "lambda");
    private static final Set<String> PI = Set.of("π", "pi");
    private static final String EULER = "e";

    private final String source;
    private final List<ClaimToken> tokens;
    private final Domain domain;
    private final String function;
    private final String variable;
    private int next;
    /** True while reading the summand or polynomial of a root sum, where λ is bound. */
    private boolean inRootSum;

    private ClaimParser(String source, Domain domain, String function, String variable) {
        this.source = source;
        this.tokens = new ClaimLexer(source).tokens();
        this.domain = domain;
        this.function = function;
        this.variable = variable;
    }

    /**
     * Reads a claim about the unknown {@code function} of an equation in {@code variable}.
     *
     * @throws InputException naming what is wrong and where: a syntax error, an unknown name or
     *     function, a claim about another unknown or in another variable
     */
    public static Claim parse(String text, Domain domain, String function, String variable) {
        String source = text == null ? "" : text;
        return new ClaimParser(source, domain, function, variable).claim();
    }

    private Claim claim() {
        Expr formula = null;
        Optional<Long> from = Optional.empty();
        List<Claim.ExplicitValue> values = new ArrayList<>();
        while (true) {
            while (peek().is(Kind.SEPARATOR)) {
                advance();
            }
            if (peek().is(Kind.END)) {
                break;
            }
            if (isRange()) {
                from = range(from);
            } else if (isExplicitValue()) {
                values.add(explicitValue());
            } else if (formula == null) {
                formula = formula();
                if (isName(peek(), FOR)) {
                    from = range(from);
                }
            } else {
                throw new InputException("a claim has one formula; expected a range such as 'for " + variable
                        + " >= 0'" + (domain == Domain.DIFFERENCE ? " or a value such as '" + function + "[0] = 1'" : ""),
                        source, peek().start());
            }
            if (!peek().is(Kind.SEPARATOR) && !peek().is(Kind.END)) {
                throw unexpected(peek());
            }
        }
        if (formula == null) {
            throw new InputException("the claim has no formula", source, source.isEmpty() ? 0 : peek().start());
        }
        return new Claim(source, domain, variable, formula, from, values);
    }

    /** {@code for n >= K}, {@code n >= K}, {@code for all n}: the first index (empty for all). */
    private Optional<Long> range(Optional<Long> earlier) {
        ClaimToken first = peek();
        if (isName(peek(), FOR)) {
            advance();
        }
        if (isName(peek(), ALL)) {
            advance();
            expectVariable();
            return earlier;
        }
        expectVariable();
        if (earlier.isPresent()) {
            throw new InputException("the range is given twice", source, first.start());
        }
        boolean strict = peek().is(Kind.GREATER);
        if (!strict && !peek().is(Kind.AT_LEAST)) {
            throw new InputException("expected '>=' in the range", source, peek().start());
        }
        advance();
        Rational bound = integerConstant("the range");
        if (domain == Domain.DIFFERENTIAL) {
            return earlier;
        }
        return Optional.of(bound.toBigInteger().longValueExact() + (strict ? 1 : 0));
    }

    private void expectVariable() {
        ClaimToken t = peek();
        if (!t.is(Kind.NAME) || !t.text().equals(variable)) {
            throw new InputException("expected the variable " + variable + " in the range", source, t.start());
        }
        advance();
    }

    private boolean isRange() {
        return isName(peek(), FOR) || isName(peek(), variable) && (at(1).is(Kind.AT_LEAST) || at(1).is(Kind.GREATER));
    }

    /** {@code x[3] = ...}: the unknown at a number rather than at the variable. */
    private boolean isExplicitValue() {
        return isName(peek(), function) && (at(1).is(Kind.LBRACKET) || at(1).is(Kind.LPAREN))
                && (at(2).is(Kind.NUMBER) || at(2).is(Kind.MINUS) || at(2).is(Kind.PLUS));
    }

    private Claim.ExplicitValue explicitValue() {
        ClaimToken name = advance();
        if (domain != Domain.DIFFERENCE) {
            throw new InputException("a function claim is one formula for all " + variable
                    + "; values at points follow from it", source, name.start());
        }
        ClaimToken open = advance();
        if (!open.is(Kind.LBRACKET)) {
            throw new InputException("write sequence values as " + function + "[0] = ...", source, open.start());
        }
        Rational index = integerConstant("an index");
        close(Kind.RBRACKET, open);
        expect(Kind.EQUALS, "'='");
        Expr value = expression();
        return new Claim.ExplicitValue(index.toBigInteger().longValueExact(), value);
    }

    /** An optional prefix {@code x[n] =} or {@code y(t) =}, then the formula. */
    private Expr formula() {
        if (isName(peek(), function) && at(1).is(Kind.EQUALS)) {
            advance();
            advance();
        } else if (peek().is(Kind.NAME) && !isName(peek(), variable) && (at(1).is(Kind.LBRACKET) || at(1).is(Kind.LPAREN))
                && at(2).is(Kind.NAME) && (at(3).is(Kind.RBRACKET) || at(3).is(Kind.RPAREN)) && at(4).is(Kind.EQUALS)) {
            prefix();
        }
        return expression();
    }

    private void prefix() {
        ClaimToken name = advance();
        ClaimToken open = advance();
        ClaimToken argument = advance();
        if (!name.text().equals(function)) {
            throw new InputException("the claim is about " + name.text() + ", the equation about " + function,
                    source, name.start());
        }
        boolean brackets = open.is(Kind.LBRACKET);
        if (brackets != (domain == Domain.DIFFERENCE)) {
            throw new InputException(domain == Domain.DIFFERENCE ? "a sequence is written " + function + "[" + variable + "]"
                    : "a function is written " + function + "(" + variable + ")", source, open.start());
        }
        if (!argument.text().equals(variable)) {
            throw new InputException("the claim is in " + argument.text() + ", but the equation's variable is "
                    + variable, source, argument.start());
        }
        advance();
        expect(Kind.EQUALS, "'='");
    }

    private Expr expression() {
        Expr node = term();
        while (peek().is(Kind.PLUS) || peek().is(Kind.MINUS)) {
            Op op = advance().is(Kind.PLUS) ? Op.ADD : Op.SUBTRACT;
            node = new Expr.Binary(op, node, term(), node.start());
        }
        return node;
    }

    private Expr term() {
        Expr node = unary();
        while (true) {
            if (peek().is(Kind.TIMES) || peek().is(Kind.DIVIDE)) {
                Op op = advance().is(Kind.TIMES) ? Op.MULTIPLY : Op.DIVIDE;
                node = new Expr.Binary(op, node, unary(), node.start());
            } else if (startsPrimary(peek())) {
                node = new Expr.Binary(Op.MULTIPLY, node, power(), node.start());
            } else {
                return node;
            }
        }
    }

    private Expr unary() {
        if (peek().is(Kind.MINUS)) {
            ClaimToken minus = advance();
            return new Expr.Negation(unary(), minus.start());
        }
        if (peek().is(Kind.PLUS)) {
            advance();
            return unary();
        }
        return power();
    }

    private Expr power() {
        Expr base = primary();
        if (peek().is(Kind.PRIME)) {
            throw new InputException("a claim is a formula, not an equation with derivatives", source, peek().start());
        }
        if (peek().is(Kind.BANG)) {
            throw new InputException("factorials are out of scope in a claim", source, peek().start());
        }
        if (!peek().is(Kind.CARET)) {
            return base;
        }
        advance();
        return new Expr.Binary(Op.POWER, base, unary(), base.start());
    }

    private Expr primary() {
        ClaimToken token = peek();
        switch (token.kind()) {
            case NUMBER:
                advance();
                return new Expr.Number(token.number(), token.start());
            case LPAREN: {
                advance();
                Expr inner = expression();
                close(Kind.RPAREN, token);
                return inner;
            }
            case SQRT:
                advance();
                return new Expr.Call(Expr.Call.Function.SQRT, power(), token.start());
            case SIGMA:
                return rootSum();
            case NAME:
                return named();
            default:
                throw unexpected(token);
        }
    }

    /** A name run, split into known names where it is not one ({@code pin} is π·n, {@code tcos(t)} is t·cos(t)). */
    private Expr named() {
        ClaimToken token = advance();
        String run = token.text();
        if (OTHER_FUNCTIONS.contains(run) || !known(run) && peek().is(Kind.LPAREN) && !splits(run)) {
            throw new InputException("unknown function '" + run + "'", source, token.start());
        }
        List<String> parts = split(run, token.start());
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
        if (FUNCTIONS.containsKey(name)) {
            if (!last || !peek().is(Kind.LPAREN)) {
                throw new InputException(name + " needs a parenthesised argument", source, start);
            }
            ClaimToken open = advance();
            Expr argument = expression();
            close(Kind.RPAREN, open);
            return new Expr.Call(FUNCTIONS.get(name), argument, start);
        }
        if (name.equals(variable)) {
            return new Expr.Variable(variable, start);
        }
        if (PI.contains(name)) {
            return new Expr.Constant(Expr.Constant.Kind.PI, start);
        }
        if (name.equals(EULER)) {
            return new Expr.Constant(Expr.Constant.Kind.E, start);
        }
        if (LAMBDA.contains(name)) {
            if (!inRootSum) {
                throw new InputException("λ stands for a root only inside a root sum Σ_{p(λ) = 0}", source, start);
            }
            return new Expr.Constant(Expr.Constant.Kind.LAMBDA, start);
        }
        throw new AssertionError(name);
    }

    private boolean known(String name) {
        return FUNCTIONS.containsKey(name) || name.equals(variable) || PI.contains(name) || name.equals(EULER)
                || LAMBDA.contains(name);
    }

    private boolean splits(String run) {
        try {
            split(run, 0);
            return true;
        } catch (InputException e) {
            return false;
        }
    }

    /** The run as a sequence of known names, longest first; an unknown piece is refused where it starts. */
    private List<String> split(String run, int start) {
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < run.length()) {
            int end = run.length();
            while (end > i && !known(run.substring(i, end))) {
                end--;
            }
            if (end == i) {
                throw unknownName(run.equals(function) || run.substring(i).equals(function) ? function : run.substring(i), start + i);
            }
            parts.add(run.substring(i, end));
            i = end;
        }
        return parts;
    }

    private InputException unknownName(String name, int position) {
        if (name.equals(function)) {
            return new InputException("the formula must not contain the unknown " + function + " itself", source, position);
        }
        if (name.equals(FOR) || name.equals(ALL)) {
            return new InputException("unexpected '" + name + "'", source, position);
        }
        return new InputException("unknown name '" + name + "' (the equation's variable is " + variable
                + (name.length() <= 2 && Character.isUpperCase(name.charAt(0)) ? "; free constants such as C1 are not accepted, give a fitted solution" : "")
                + ")", source, position);
    }

    /** Σ_{p(λ) = 0} summand, the summand being one product. */
    private Expr rootSum() {
        ClaimToken sigma = advance();
        if (inRootSum) {
            throw new InputException("root sums cannot be nested", source, sigma.start());
        }
        expect(Kind.UNDERSCORE, "'_' after Σ");
        ClaimToken open = expect(Kind.LBRACE, "'{' after Σ_");
        inRootSum = true;
        Expr polynomial = expression();
        expect(Kind.EQUALS, "'=' in the root sum's polynomial");
        Expr zero = expression();
        close(Kind.RBRACE, open);
        RationalPolynomial f = RootPolynomial.of(source, polynomial).subtract(RootPolynomial.of(source, zero));
        if (f.degree() < 1) {
            throw new InputException("the root sum's polynomial must have degree 1 or more", source, polynomial.start());
        }
        if (f.gcd(f.derivative()).degree() > 0) {
            throw new InputException("the root sum's polynomial must have distinct roots", source, polynomial.start());
        }
        Expr summand = term();
        inRootSum = false;
        return new Expr.RootSum(f.monic(), summand, sigma.start());
    }

    /** A constant integer such as an index or a range bound, possibly negative. */
    private Rational integerConstant(String role) {
        int start = peek().start();
        boolean negative = false;
        while (peek().is(Kind.MINUS) || peek().is(Kind.PLUS)) {
            negative ^= advance().is(Kind.MINUS);
        }
        ClaimToken number = peek();
        if (!number.is(Kind.NUMBER) || !number.number().isInteger()) {
            throw new InputException(role + " must be an integer", source, start);
        }
        advance();
        return negative ? number.number().negate() : number.number();
    }

    private static boolean startsPrimary(ClaimToken token) {
        return token.is(Kind.NUMBER) || token.is(Kind.LPAREN) || token.is(Kind.SQRT) || token.is(Kind.SIGMA)
                || token.is(Kind.NAME) && !token.text().equals(FOR);
    }

    private static boolean isName(ClaimToken token, String name) {
        return token.is(Kind.NAME) && token.text().equals(name);
    }

    private ClaimToken expect(Kind kind, String what) {
        if (!peek().is(kind)) {
            throw new InputException("expected " + what, source, peek().start());
        }
        return advance();
    }

    private ClaimToken close(Kind kind, ClaimToken open) {
        if (!peek().is(kind)) {
            throw new InputException("unbalanced '" + open.text() + "'", source, open.start());
        }
        return advance();
    }

    private InputException unexpected(ClaimToken token) {
        if (token.is(Kind.END)) {
            return new InputException("unexpected end of the claim", source, token.start());
        }
        if (token.is(Kind.RPAREN) || token.is(Kind.RBRACKET) || token.is(Kind.RBRACE)) {
            return new InputException("unbalanced '" + token.text() + "'", source, token.start());
        }
        if (token.is(Kind.EQUALS)) {
            return new InputException("unexpected '='; write the claim as " + (domain == Domain.DIFFERENCE
                    ? function + "[" + variable + "]" : function + "(" + variable + ")") + " = formula", source, token.start());
        }
        return new InputException("unexpected '" + token.text() + "'", source, token.start());
    }

    private ClaimToken peek() {
        return at(0);
    }

    private ClaimToken at(int ahead) {
        return tokens.get(Math.min(next + ahead, tokens.size() - 1));
    }

    private ClaimToken advance() {
        ClaimToken token = peek();
        if (!token.is(Kind.END)) {
            next++;
        }
        return token;
    }
}
