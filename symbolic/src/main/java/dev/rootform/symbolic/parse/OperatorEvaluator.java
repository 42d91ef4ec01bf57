package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;

/**
 * Reads an operator expression such as {@code (D+1)^2 (D^2+4)} or {@code E^2 - E - 1} as an exact
 * polynomial in the operator symbol of the domain (D for derivatives, E for forward shifts).
 */
final class OperatorEvaluator {
    private final String source;
    private final String symbol;

    OperatorEvaluator(String source, Domain domain) {
        this.source = source;
        this.symbol = domain == Domain.DIFFERENCE ? Names.SHIFT_OPERATOR : Names.DERIVATIVE_OPERATOR;
    }

    /** True when {@code node} mentions D or E, so that it is an operator to apply to what follows. */
    static boolean isOperator(Node node) {
        return node.descendants().anyMatch(n -> n instanceof Node.Name name
                && (name.name().equals(Names.DERIVATIVE_OPERATOR) || name.name().equals(Names.SHIFT_OPERATOR)));
    }

    /** The polynomial in the operator symbol that {@code node} denotes. */
    RationalPolynomial polynomial(Node node) {
        if (node instanceof Node.Num num) {
            return RationalPolynomial.constant(num.value());
        }
        if (node instanceof Node.Name name && name.name().equals(symbol)) {
            return RationalPolynomial.X;
        }
        if (node instanceof Node.Name name && isOperator(name)) {
            String other = name.name();
            throw new InputException("operator " + other + " does not fit a "
                    + (symbol.equals(Names.SHIFT_OPERATOR) ? "recurrence; use E" : "differential equation; use D"),
                    source, node.start());
        }
        if (node instanceof Node.Call call && call.name().equals(symbol)) {
            // D (D+1) reads like a call; for the operator symbol it can only be a product
            return RationalPolynomial.X.multiply(polynomial(call.argument()));
        }
        if (node instanceof Node.Negation negation) {
            return polynomial(negation.operand()).negate();
        }
        if (node instanceof Node.Binary b && b.op() == Node.Binary.Op.POW && b.left() instanceof Node.Call call
                && call.name().equals(symbol)) {
            return polynomial(call.factorTimesPower(b.right(), b.end()));
        }
        if (node instanceof Node.Binary b) {
            return binary(b);
        }
        throw new InputException("unexpected " + text(node) + " in an operator", source, node.start());
    }

    private RationalPolynomial binary(Node.Binary b) {
        RationalPolynomial left = polynomial(b.left());
        switch (b.op()) {
            case ADD:
                return left.add(polynomial(b.right()));
            case SUB:
                return left.subtract(polynomial(b.right()));
            case MUL:
                RationalPolynomial right = polynomial(b.right());
                requireOrder(b, left.degree() + right.degree());
                return left.multiply(right);
            case DIV:
                Rational divisor = constant(b.right(), "divisor");
                if (divisor.isZero()) {
                    throw new InputException("division by zero", source, b.right().start());
                }
                return left.multiply(divisor.inverse());
            default:
                Rational exponent = constant(b.right(), "exponent");
                if (!exponent.isInteger() || exponent.signum() < 0 || exponent.compareTo(Rational.of(64)) > 0) {
                    throw new InputException("operator exponent " + text(b.right())
                            + " must be a whole number up to 64", source, b.right().start());
                }
                int k = exponent.toBigInteger().intValueExact();
                requireOrder(b, left.degree() * k);
                return left.pow(k);
        }
    }

    /** @throws InputException when an operator of {@code degree} would exceed {@link Limits#MAX_ORDER} */
    private void requireOrder(Node node, int degree) {
        if (degree > Limits.MAX_ORDER) {
            throw new InputException("operator " + Lexer.shorten(text(node)) + " has degree " + degree + ", above the order limit "
                    + Limits.MAX_ORDER, source, node.start());
        }
    }

    private Rational constant(Node node, String role) {
        RationalPolynomial p = polynomial(node);
        if (p.degree() > 0) {
            throw new InputException("operator " + role + " " + text(node) + " must be a constant",
                    source, node.start());
        }
        return p.coefficient(0);
    }

    private String text(Node node) {
        return source.substring(node.start(), node.end());
    }
}
