package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.claim.ClaimToken.Kind;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

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
    static final String FOR = "for";
    private static final String ALL = "all";

    private final String source;
    private final ClaimCursor cursor;
    private final FormulaReader formulas;
    private final Domain domain;
    private final String function;
    private final String variable;

    private ClaimParser(String source, Domain domain, String function, String variable) {
        this.source = source;
        this.cursor = new ClaimCursor(source, domain == Domain.DIFFERENCE ? function + "[" + variable + "]"
                : function + "(" + variable + ")");
        this.formulas = new FormulaReader(cursor, new ClaimNames(source, function, variable), variable);
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
            while (cursor.peek().is(Kind.SEPARATOR)) {
                cursor.advance();
            }
            if (cursor.peek().is(Kind.END)) {
                break;
            }
            if (isRange()) {
                from = range(from);
            } else if (isExplicitValue()) {
                values.add(explicitValue());
            } else if (formula == null) {
                formula = formula();
                if (ClaimCursor.isName(cursor.peek(), FOR)) {
                    from = range(from);
                }
            } else {
                throw new InputException("a claim has one formula; expected a range such as 'for " + variable
                        + " >= 0'" + (domain == Domain.DIFFERENCE ? " or a value such as '" + function + "[0] = 1'" : ""),
                        source, cursor.peek().start());
            }
            if (!cursor.peek().is(Kind.SEPARATOR) && !cursor.peek().is(Kind.END)) {
                throw cursor.unexpected(cursor.peek());
            }
        }
        if (formula == null) {
            throw new InputException("the claim has no formula", source, source.isEmpty() ? 0 : cursor.peek().start());
        }
        return new Claim(source, domain, variable, formula, from, values);
    }

    /** {@code for n >= K}, {@code n >= K}, {@code for all n}: the first index (empty for all). */
    private Optional<Long> range(Optional<Long> earlier) {
        ClaimToken first = cursor.peek();
        if (ClaimCursor.isName(cursor.peek(), FOR)) {
            cursor.advance();
        }
        if (ClaimCursor.isName(cursor.peek(), ALL)) {
            cursor.advance();
            expectVariable();
            return earlier;
        }
        expectVariable();
        if (earlier.isPresent()) {
            throw new InputException("the range is given twice", source, first.start());
        }
        boolean strict = cursor.peek().is(Kind.GREATER);
        if (!strict && !cursor.peek().is(Kind.AT_LEAST)) {
            throw new InputException("expected '>=' in the range", source, cursor.peek().start());
        }
        cursor.advance();
        Rational bound = cursor.integerConstant("the range");
        if (domain == Domain.DIFFERENTIAL) {
            return earlier;
        }
        return Optional.of(bound.toBigInteger().longValueExact() + (strict ? 1 : 0));
    }

    private void expectVariable() {
        ClaimToken t = cursor.peek();
        if (!t.is(Kind.NAME) || !t.text().equals(variable)) {
            throw new InputException("expected the variable " + variable + " in the range", source, t.start());
        }
        cursor.advance();
    }

    private boolean isRange() {
        return ClaimCursor.isName(cursor.peek(), FOR) || ClaimCursor.isName(cursor.peek(), variable) && (cursor.at(1).is(Kind.AT_LEAST) || cursor.at(1).is(Kind.GREATER));
    }

    /** {@code x[3] = ...}: the unknown at a number rather than at the variable. */
    private boolean isExplicitValue() {
        return ClaimCursor.isName(cursor.peek(), function) && (cursor.at(1).is(Kind.LBRACKET) || cursor.at(1).is(Kind.LPAREN))
                && (cursor.at(2).is(Kind.NUMBER) || cursor.at(2).is(Kind.MINUS) || cursor.at(2).is(Kind.PLUS));
    }

    private Claim.ExplicitValue explicitValue() {
        ClaimToken name = cursor.advance();
        if (domain != Domain.DIFFERENCE) {
            throw new InputException("a function claim is one formula for all " + variable
                    + "; values at points follow from it", source, name.start());
        }
        ClaimToken open = cursor.advance();
        if (!open.is(Kind.LBRACKET)) {
            throw new InputException("write sequence values as " + function + "[0] = ...", source, open.start());
        }
        Rational index = cursor.integerConstant("an index");
        cursor.close(Kind.RBRACKET, open);
        cursor.expect(Kind.EQUALS, "'='");
        Expr value = formulas.expression();
        return new Claim.ExplicitValue(index.toBigInteger().longValueExact(), value);
    }

    /** An optional prefix {@code x[n] =} or {@code y(t) =}, then the formula. */
    private Expr formula() {
        if (ClaimCursor.isName(cursor.peek(), function) && cursor.at(1).is(Kind.EQUALS)) {
            cursor.advance();
            cursor.advance();
        } else if (cursor.peek().is(Kind.NAME) && !ClaimCursor.isName(cursor.peek(), variable) && (cursor.at(1).is(Kind.LBRACKET) || cursor.at(1).is(Kind.LPAREN))
                && cursor.at(2).is(Kind.NAME) && (cursor.at(3).is(Kind.RBRACKET) || cursor.at(3).is(Kind.RPAREN)) && cursor.at(4).is(Kind.EQUALS)) {
            prefix();
        }
        return formulas.expression();
    }

    private void prefix() {
        ClaimToken name = cursor.advance();
        ClaimToken open = cursor.advance();
        ClaimToken argument = cursor.advance();
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
        cursor.advance();
        cursor.expect(Kind.EQUALS, "'='");
    }
}
