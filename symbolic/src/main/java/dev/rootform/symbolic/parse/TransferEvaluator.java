package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Map;

/**
 * Evaluates a transfer-function expression to a {@link Block}, refusing what is not a rational
 * function of the variable with a message that names the term and points at it. In z every
 * occurrence of z is the same piece (z^-1 is delay notation, its powers cancel freely); in s each
 * written factor is its own piece.
 */
final class TransferEvaluator {
    /** Largest |k| accepted in a power x^k. */
    private static final int MAX_POWER = 1000;
    /** The shared tag of the variable z. */
    private static final int DELAY_TAG = 0;

    private final String source;
    private final String variable;
    private int nextTag = DELAY_TAG + 1;

    TransferEvaluator(String source, String variable) {
        this.source = source;
        this.variable = variable;
    }

    /** The value of {@code node}, where {@code parts} holds the parts defined so far. */
    Block evaluate(Node node, Map<String, Block> parts) {
        if (node instanceof Node.Num num) {
            return Block.constant(num.value());
        }
        if (node instanceof Node.Name name) {
            return name(name, parts);
        }
        if (node instanceof Node.Call call) {
            return call(call, parts);
        }
        if (node instanceof Node.Negation negation) {
            return evaluate(negation.operand(), parts).multiply(Block.constant(Rational.MINUS_ONE));
        }
        if (node instanceof Node.Binary b) {
            return binary(b, parts);
        }
        throw error(text(node) + " does not belong in a transfer function", node);
    }

    private Block binary(Node.Binary b, Map<String, Block> parts) {
        switch (b.op()) {
            case ADD:
                return evaluate(b.left(), parts).add(evaluate(b.right(), parts), nextTag++);
            case SUB:
                return evaluate(b.left(), parts).add(evaluate(b.right(), parts).multiply(Block.constant(Rational.MINUS_ONE)), nextTag++);
            case MUL:
                return evaluate(b.left(), parts).multiply(evaluate(b.right(), parts));
            case DIV:
                Block dividend = evaluate(b.left(), parts);
                Block divisor = evaluate(b.right(), parts);
                if (divisor.isZero()) {
                    throw error("division by zero", b.right());
                }
                return dividend.multiply(divisor.inverse());
            default:
                return power(b, parts);
        }
    }

    private Block power(Node.Binary b, Map<String, Block> parts) {
        if (b.left() instanceof Node.Name n && n.name().equals(Names.EULER)) {
            throw delay(b);
        }
        Block exponent = evaluate(b.right(), parts);
        Rational k = exponent.constantValue().orElseThrow(() -> error(text(b)
                + ": the exponent must be an integer constant (not a rational function otherwise)", b.right()));
        if (!k.isInteger()) {
            throw error(text(b) + ": a non-integer power is not a rational function: out of scope", b.right());
        }
        if (k.abs().compareTo(Rational.of(MAX_POWER)) > 0) {
            throw error(text(b) + ": exponent beyond " + MAX_POWER, b.right());
        }
        Block base = evaluate(b.left(), parts);
        int power = k.toBigInteger().intValueExact();
        if (base.isZero() && power < 0) {
            throw error("division by zero", b);
        }
        return base.pow(power);
    }

    private Block name(Node.Name node, Map<String, Block> parts) {
        String name = node.name();
        if (name.equals(variable)) {
            int tag = variable.equals(TransferVariable.Z) ? DELAY_TAG : nextTag++;
            return Block.polynomial(RationalPolynomial.X, tag);
        }
        Block part = parts.get(name);
        if (part != null) {
            return part;
        }
        if (name.equals(Names.PI) || name.equals(Names.EULER)) {
            throw error(name + ": coefficients must be rational", node);
        }
        if (Names.isSupportedFunction(name) || Names.isUnsupportedFunction(name)) {
            throw error(name + " is not a rational function of " + variable + ": out of scope", node);
        }
        throw error("unknown name '" + name + "' (define it first, e.g. " + name + "(" + variable + ") = ...;)", node);
    }

    /** G(s) is the part G; s(s + 2) is a product; exp(-s) is a delay; other functions are out of scope. */
    private Block call(Node.Call call, Map<String, Block> parts) {
        String name = call.name();
        if (name.equals("exp")) {
            throw delay(call);
        }
        if (Names.isSupportedFunction(name) || Names.isUnsupportedFunction(name)) {
            throw error(text(call) + " is not a rational function of " + variable + ": out of scope", call);
        }
        if (parts.containsKey(name)) {
            if (!(call.argument() instanceof Node.Name arg && arg.name().equals(variable))) {
                throw error(text(call) + ": a part takes the argument " + variable + " only", call.argument());
            }
            return parts.get(name);
        }
        Node.Name factor = new Node.Name(name, call.start(), call.start() + name.length());
        return evaluate(factor, parts).multiply(evaluate(call.argument(), parts));
    }

    private InputException delay(Node node) {
        return error(text(node) + " is a time delay, not a rational function of " + variable
                + ": out of scope (approximate it by a rational function, e.g. a Padé form, to analyse it)", node);
    }

    private InputException error(String message, Node node) {
        return new InputException(message, source, node.start());
    }

    private String text(Node node) {
        return source.substring(node.start(), node.end());
    }
}
