package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.params.ParamFunction;
import dev.rootform.symbolic.params.ParamTerm;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Evaluates an expression tree with declared parameters to a {@link ParamValue}. Parameters may
 * stand in coefficients, amplitudes, rates ({@code e^(-r t)}, {@code a^n}) and frequencies
 * ({@code sin(w t)}, differential equations only); every other use is refused with one line
 * naming the term.
 */
final class ParamLinearizer extends NodeEvaluator<ParamValue> {
    private static final int MAX_EXPONENT = 64;

    private final String source;
    private final Shape shape;
    private final List<String> names;

    ParamLinearizer(String source, Shape shape, List<String> names) {
        this.source = source;
        this.shape = shape;
        this.names = List.copyOf(names);
    }

    @Override
    ParamValue evaluate(Node node) {
        return dispatch(node);
    }

    @Override
    ParamValue number(Node.Num node) {
        return constant(ParamFunction.constant(names, node.value()));
    }

    @Override
    ParamValue indexed(Node.Indexed node) {
        if (!node.name().equals(shape.function())) {
            throw error("unknown sequence " + node.name(), node);
        }
        return ParamValue.unknown(offset(node.index(), node), names);
    }

    @Override
    ParamValue negate(ParamValue value) {
        return value.negate();
    }

    @Override
    ParamValue sum(ParamValue left, ParamValue right) {
        return left.add(right);
    }

    @Override
    ParamValue product(Node.Binary node) {
        return product(evaluate(node.left()), evaluate(node.right()), node);
    }

    /** The value of a constant expression in the parameters, such as {@code x0} or {@code F/m}. */
    ParamFunction constantOf(Node node, String role) {
        ParamValue v = evaluate(node);
        return v.constantValue(shape.domain())
                .orElseThrow(() -> error(role + " must be a constant in the parameters: " + text(node), node));
    }

    /** The integer j of an index v + j. */
    int offset(Node index, Node term) {
        ParamValue v = evaluate(index);
        ParamFunction shift = ParamFunction.zero(names);
        boolean variable = false;
        for (ParamTerm t : v.hasUnknown() ? List.<ParamTerm>of() : v.forcing()) {
            if (t.power() == 1 && t.wave() == ParamTerm.Wave.NONE && neutral(t.rate()) && t.amplitude().equals(one())) {
                variable = true;
            } else if (t.power() == 0 && t.wave() == ParamTerm.Wave.NONE && neutral(t.rate())) {
                shift = t.amplitude();
            } else {
                variable = false;
                break;
            }
        }
        if (v.hasUnknown() || !variable || !shift.isConstant() || !shift.constantValue().isInteger()
                || shift.constantValue().abs().compareTo(Rational.of(dev.rootform.symbolic.model.Limits.MAX_ORDER)) > 0) {
            throw error("index must be " + shape.variable() + " plus an integer: " + text(term), term);
        }
        return shift.constantValue().toBigInteger().intValueExact();
    }

    @Override
    ParamValue name(Node.Name node) {
        String name = node.name();
        int index = names.indexOf(name);
        if (index >= 0) {
            return constant(ParamFunction.of(ParamPolynomial.variable(names, index)));
        }
        if (name.equals(shape.function())) {
            return ParamValue.unknown(0, names);
        }
        if (name.equals(shape.variable())) {
            return ParamValue.term(new ParamTerm(one(), 1, ParamValue.neutralRate(shape.domain(), names), zero(), ParamTerm.Wave.NONE));
        }
        if (name.equals(Names.PI)) {
            throw error("π is not supported together with parameters", node);
        }
        if (name.equals(Names.DERIVATIVE_OPERATOR) || name.equals(Names.SHIFT_OPERATOR)) {
            throw error("operator notation is not supported together with parameters: write " + shape.function()
                    + (shape.domain() == Domain.DIFFERENTIAL ? "'' and " + shape.function() + "'" : "[n+1]"), node);
        }
        if (name.equals(Names.EULER)) {
            throw error("e stands alone: write e^(r " + shape.variable() + ")", node);
        }
        throw error("undeclared parameter '" + name + "': list it in --params", node);
    }

    @Override
    ParamValue call(Node.Call call) {
        String name = call.name();
        if (names.contains(name)) {
            return product(name(new Node.Name(name, call.start(), call.start() + name.length())), evaluate(call.argument()), call);
        }
        if (name.equals(shape.function())) {
            requireVariable(call.argument(), call);
            return ParamValue.unknown(0, names);
        }
        if (name.equals("exp")) {
            return exponential(evaluate(call.argument()), call);
        }
        if (name.equals("sin") || name.equals("cos")) {
            if (shape.domain() == Domain.DIFFERENCE) {
                throw error(text(call) + ": sampled waves are not supported together with parameters", call);
            }
            ParamFunction frequency = linearRate(evaluate(call.argument()), call);
            return ParamValue.term(new ParamTerm(one(), 0, zero(), frequency,
                    name.equals("sin") ? ParamTerm.Wave.SIN : ParamTerm.Wave.COS));
        }
        if (Names.isUnsupportedFunction(name)) {
            throw error(text(call) + " is out of scope", call);
        }
        throw error("undeclared parameter or function '" + name + "'", call);
    }

    @Override
    ParamValue derivative(Node.Derivative d) {
        if (shape.domain() == Domain.DIFFERENCE) {
            throw error("derivative " + text(d) + " does not fit a recurrence", d);
        }
        if (!d.name().equals(shape.function())) {
            throw error("derivative of " + d.name() + ", but the unknown is " + shape.function(), d);
        }
        if (d.argument() != null) {
            requireVariable(d.argument(), d);
        }
        return ParamValue.unknown(d.order(), names);
    }

    private void requireVariable(Node argument, Node term) {
        if (!(argument instanceof Node.Name n && n.name().equals(shape.variable()))) {
            throw error(text(term) + ": inside the equation the unknown takes the argument " + shape.variable(), term);
        }
    }

    private ParamValue product(ParamValue left, ParamValue right, Node term) {
        if (left.hasUnknown() && right.hasUnknown()) {
            throw error("nonlinear term: " + text(term) + " (rootform solves linear equations)", term);
        }
        if (left.hasUnknown() || right.hasUnknown()) {
            ParamValue factor = left.hasUnknown() ? right : left;
            ParamValue unknown = left.hasUnknown() ? left : right;
            ParamFunction c = factor.constantValue(shape.domain())
                    .orElseThrow(() -> error("variable coefficient: " + text(term) + " (coefficients must be constants)", term));
            return unknown.scale(c);
        }
        ParamValue sum = new ParamValue(names, Map.of(), List.of());
        for (ParamTerm a : left.forcing()) {
            for (ParamTerm b : right.forcing()) {
                if (a.wave() != ParamTerm.Wave.NONE && b.wave() != ParamTerm.Wave.NONE) {
                    throw error(text(term) + ": a product of two waves is not supported with parameters; write it as a sum", term);
                }
                ParamTerm wave = a.wave() != ParamTerm.Wave.NONE ? a : b;
                ParamFunction rate = shape.domain() == Domain.DIFFERENTIAL ? a.rate().add(b.rate()) : a.rate().multiply(b.rate());
                sum = sum.add(ParamValue.term(new ParamTerm(a.amplitude().multiply(b.amplitude()), a.power() + b.power(),
                        rate, wave.frequency(), wave.wave())));
            }
        }
        return sum;
    }

    @Override
    ParamValue quotient(Node.Binary b) {
        ParamFunction divisor = constantOf(b.right(), "a divisor");
        if (divisor.isZero()) {
            throw error("division by zero", b.right());
        }
        return evaluate(b.left()).scale(ParamFunction.one(names).divide(divisor));
    }

    @Override
    ParamValue power(Node.Binary b) {
        if (b.left() instanceof Node.Name base && base.name().equals(Names.EULER)) {
            return exponential(evaluate(b.right()), b);
        }
        ParamValue exponent = evaluate(b.right());
        java.util.Optional<ParamFunction> constant = exponent.constantValue(shape.domain());
        if (constant.isPresent()) {
            if (!constant.get().isConstant() || !constant.get().constantValue().isInteger()
                    || constant.get().constantValue().abs().compareTo(Rational.of(MAX_EXPONENT)) > 0) {
                throw error(text(b) + ": exponents must be integers up to " + MAX_EXPONENT, b);
            }
            return integerPower(evaluate(b.left()), constant.get().constantValue().toBigInteger().intValueExact(), b);
        }
        if (shape.domain() == Domain.DIFFERENCE) {
            ParamFunction base = constantOf(b.left(), "the base of " + text(b));
            if (base.isZero()) {
                throw error(text(b) + ": base must be nonzero", b);
            }
            int shift = offset(b.right(), b);
            return ParamValue.term(new ParamTerm(base.pow(shift), 0, base, zero(), ParamTerm.Wave.NONE));
        }
        throw error(text(b) + " is out of scope (write e^(r " + shape.variable() + "))", b);
    }

    private ParamValue integerPower(ParamValue base, int k, Node term) {
        if (base.hasUnknown() && k != 1) {
            throw error("nonlinear term: " + text(term) + " (rootform solves linear equations)", term);
        }
        if (k < 0) {
            ParamFunction c = base.constantValue(shape.domain())
                    .orElseThrow(() -> error(text(term) + ": negative powers only of constants", term));
            if (c.isZero()) {
                throw error("division by zero", term);
            }
            return constant(c.pow(k));
        }
        ParamValue result = constant(one());
        for (int i = 0; i < k; i++) {
            result = product(result, base, term);
        }
        return result;
    }

    private ParamValue exponential(ParamValue exponent, Node term) {
        if (shape.domain() == Domain.DIFFERENCE) {
            throw error(text(term) + ": write a^" + shape.variable() + " in a recurrence", term);
        }
        return ParamValue.term(new ParamTerm(one(), 0, linearRate(exponent, term), zero(), ParamTerm.Wave.NONE));
    }

    /** r for an argument r·v with r free of the variable. */
    private ParamFunction linearRate(ParamValue argument, Node term) {
        if (!argument.hasUnknown() && argument.forcing().size() == 1) {
            ParamTerm t = argument.forcing().get(0);
            if (t.power() == 1 && t.wave() == ParamTerm.Wave.NONE && neutral(t.rate())) {
                return t.amplitude();
            }
        }
        throw error(text(term) + ": the argument must be a constant times " + shape.variable(), term);
    }

    private boolean neutral(ParamFunction rate) {
        return rate.equals(ParamValue.neutralRate(shape.domain(), names));
    }

    private ParamValue constant(ParamFunction c) {
        return ParamValue.constant(c, shape.domain());
    }

    private ParamFunction one() {
        return ParamFunction.one(names);
    }

    private ParamFunction zero() {
        return ParamFunction.zero(names);
    }

    private InputException error(String message, Node node) {
        return new InputException(message, source, node.start());
    }

    private String text(Node node) {
        String t = source.substring(node.start(), node.end());
        return t.length() <= 40 ? t : t.substring(0, 37) + "...";
    }
}
