package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import java.math.BigInteger;
import java.util.Optional;

/**
 * Evaluates an expression tree to a {@link Value}: a linear combination of the unknown plus
 * forcing terms. Rejects everything that would leave the linear constant-coefficient form,
 * naming the offending term and pointing at its start.
 */
final class Linearizer extends NodeEvaluator<Value> {
    /** Bound on integer exponents; the sizes of the results are bounded by {@link Limits}. */
    private static final int MAX_EXPONENT = 10_000;

    private final String source;
    private final Shape shape;
    private final Forcing zero;
    /** How many sin/cos arguments enclose the node being read; π is allowed only inside one. */
    private int angleDepth;

    Linearizer(String source, Shape shape) {
        this.source = source;
        this.shape = shape;
        this.zero = Forcing.zero(shape.domain());
    }

    /**
     * The value of {@code node}, refused when it exceeds a size of {@link Limits} (checked at every
     * node, so that no intermediate result grows beyond them).
     */
    @Override
    Value evaluate(Node node) {
        Value value = dispatch(node);
        bounded(value.forcing(), node);
        if (value.unknown().values().stream().anyMatch(Linearizer::huge)) {
            throw tooLarge(node);
        }
        return value;
    }

    @Override
    Value number(Node.Num node) {
        return constant(node.value());
    }

    @Override
    Value indexed(Node.Indexed node) {
        return Value.unknown(offset(node.index(), node), zero);
    }

    @Override
    Value negate(Value value) {
        return value.negate();
    }

    @Override
    Value sum(Value left, Value right) {
        return left.add(right);
    }

    /** The offset j of a sequence term x[v + j] or x(v + j). */
    int offset(Node index, Node term) {
        Optional<Forcing.Linear> linear = free(evaluate(index), term).forcing().asLinear();
        if (linear.isEmpty() || !linear.get().slope().isOne() || linear.get().timesPi()) {
            throw error("index must be " + shape.variable() + " plus a constant: " + text(term), term);
        }
        Rational intercept = linear.get().intercept();
        if (!intercept.isInteger()) {
            throw error("non-integer shift " + text(term) + " is out of scope", term);
        }
        if (intercept.abs().compareTo(Rational.of(Limits.MAX_ORDER)) > 0) {
            throw error("shift " + text(term) + " is above the order limit " + Limits.MAX_ORDER, term);
        }
        return intercept.toBigInteger().intValueExact();
    }

    /** The value of a constant expression such as {@code -3/4} or {@code 2^10}. */
    Rational rational(Node node, String role) {
        Value value;
        try {
            value = evaluate(node);
        } catch (InputException e) {
            throw error(role + " must be a rational constant: " + text(node), node);
        }
        return value.constantValue().orElseThrow(() -> error(role + " must be a rational constant: " + text(node), node));
    }

    private Value constant(Rational value) {
        return Value.of(Forcing.constant(shape.domain(), value));
    }

    @Override
    Value name(Node.Name node) {
        String name = node.name();
        if (name.equals(shape.function())) {
            return Value.unknown(0, zero);
        }
        if (name.equals(shape.variable())) {
            return Value.of(Forcing.variable(shape.domain()));
        }
        if (name.equals(Names.PI) && angleDepth > 0) {
            return Value.of(Forcing.pi(shape.domain()));
        }
        if (name.equals(Names.PI) || name.equals(Names.EULER)) {
            throw error(name + ": coefficient must be rational", node);
        }
        if (name.equals(Names.DERIVATIVE_OPERATOR) || name.equals(Names.SHIFT_OPERATOR)) {
            throw error("operator " + name + " must be applied to the unknown", node);
        }
        if (Names.isSupportedFunction(name) || Names.isUnsupportedFunction(name)) {
            throw error(name + " needs a parenthesised argument", node);
        }
        throw error("unknown name '" + name + "'", node);
    }

    @Override
    Value call(Node.Call call) {
        String name = call.name();
        if (name.equals("sin") || name.equals("cos")) {
            return oscillation(call, name.equals("sin") ? Oscillation.SIN : Oscillation.COS);
        }
        if (name.equals("exp")) {
            return exponential(call, call.argument());
        }
        if (Names.isUnsupportedFunction(name)) {
            throw error(text(call) + " is out of scope", call);
        }
        if (isFactor(call)) {
            Node.Name factor = new Node.Name(name, call.start(), call.start() + name.length());
            return product(new Node.Binary(Node.Binary.Op.MUL, factor, call.argument(), call.start(), call.end()));
        }
        if (shape.domain() == Domain.DIFFERENCE) {
            return Value.unknown(offset(call.argument(), call), zero);
        }
        requireVariable(call.argument(), call);
        return Value.unknown(0, zero);
    }

    @Override
    Value derivative(Node.Derivative d) {
        if (shape.domain() == Domain.DIFFERENCE) {
            throw error("derivative " + text(d) + " does not fit a recurrence", d);
        }
        if (d.argument() != null) {
            requireVariable(d.argument(), d);
        }
        return Value.unknown(d.order(), zero);
    }

    private void requireVariable(Node argument, Node term) {
        if (!(argument instanceof Node.Name name && name.name().equals(shape.variable()))) {
            throw error(text(term) + ": inside the equation the unknown takes the argument " + shape.variable(), term);
        }
    }

    @Override
    Value product(Node.Binary b) {
        if (OperatorEvaluator.isOperator(b.left())) {
            Value operand = evaluate(b.right());
            if (!operand.forcing().isZero() || !operand.hasUnknown()) {
                throw error("an operator must be applied to the unknown alone: " + text(b), b);
            }
            return operand.apply(new OperatorEvaluator(source, shape.domain()).polynomial(b.left()));
        }
        Value left = evaluate(b.left());
        Value right = evaluate(b.right());
        if (left.hasUnknown() && right.hasUnknown()) {
            throw nonlinear(b);
        }
        if (left.hasUnknown() || right.hasUnknown()) {
            Value linear = left.hasUnknown() ? left : right;
            Value factor = left.hasUnknown() ? right : left;
            Rational c = factor.constantValue().orElseThrow(() -> error("variable coefficient: " + text(b)
                    + " (rootform solves constant-coefficient equations)", b));
            return linear.scale(c);
        }
        return Value.of(times(left.forcing(), right.forcing(), b));
    }

    /** The product of two forcings, within the limits of {@link #bounded}. */
    private Forcing times(Forcing left, Forcing right, Node term) {
        if (left.mixesFrequencyKinds(right)) {
            throw error(text(term) + ": frequencies must be all rational or all rational multiples of pi", term);
        }
        if (left.size() * right.size() > Limits.MAX_FORCING_TERMS * Limits.MAX_FORCING_TERMS
                || left.degree() + right.degree() > Limits.MAX_FORCING_DEGREE) {
            throw tooLarge(term);
        }
        return bounded(left.multiply(right), term);
    }

    /**
     * {@code forcing}, unless it has more than {@link Limits#MAX_FORCING_TERMS} terms, a power of the
     * variable above {@link Limits#MAX_FORCING_DEGREE} or a number of more than
     * {@link Limits#MAX_NUMBER_DIGITS} digits.
     */
    private Forcing bounded(Forcing forcing, Node term) {
        if (forcing.size() > Limits.MAX_FORCING_TERMS || forcing.degree() > Limits.MAX_FORCING_DEGREE
                || forcing.numbers().anyMatch(Linearizer::huge)) {
            throw tooLarge(term);
        }
        return forcing;
    }

    private InputException tooLarge(Node term) {
        return error(shorten(text(term)) + " is too large: at most " + Limits.MAX_FORCING_TERMS + " forcing terms, powers up to "
                + shape.variable() + "^" + Limits.MAX_FORCING_DEGREE + " and numbers of " + Limits.MAX_NUMBER_DIGITS
                + " digits are accepted", term);
    }

    /** True for a number with more than {@link Limits#MAX_NUMBER_DIGITS} digits above or below the line. */
    private static boolean huge(Rational r) {
        return Math.max(log10(r.numerator()), log10(r.denominator())) >= Limits.MAX_NUMBER_DIGITS;
    }

    /** log10 |x| for x ≠ 0, of any size (0 for 0). */
    private static double log10(BigInteger x) {
        int shift = Math.max(0, x.abs().bitLength() - 60);
        double leading = x.abs().shiftRight(shift).doubleValue();
        return leading == 0 ? 0 : Math.log10(leading) + shift * Math.log10(2);
    }

    /** c^n for a constant c, refused when the result would exceed {@link Limits#MAX_NUMBER_DIGITS} digits. */
    private Rational power(Rational c, int n, Node term) {
        double digits = Math.max(log10(c.numerator()), log10(c.denominator())) * Math.abs((double) n);
        if (digits >= Limits.MAX_NUMBER_DIGITS) {
            throw tooLarge(term);
        }
        return c.pow(n);
    }

    @Override
    Value quotient(Node.Binary b) {
        Value divisor = evaluate(b.right());
        if (divisor.hasUnknown()) {
            throw nonlinear(b);
        }
        Rational c = divisor.constantValue().orElseThrow(() -> error(text(b) + " is out of scope", b));
        if (c.isZero()) {
            throw error("division by zero", b.right());
        }
        return evaluate(b.left()).scale(c.inverse());
    }

    /** True when {@code call} is a name that is no function before parentheses: a product such as {@code t (t+1)}. */
    private boolean isFactor(Node.Call call) {
        String name = call.name();
        return !name.equals("sin") && !name.equals("cos") && !name.equals("exp") && !Names.isUnsupportedFunction(name)
                && !name.equals(shape.function());
    }

    @Override
    Value power(Node.Binary b) {
        if (b.left() instanceof Node.Name name && name.name().equals(Names.EULER)) {
            return exponential(b, b.right());
        }
        if (b.left() instanceof Node.Call call && isFactor(call)) {
            return product(call.factorTimesPower(b.right(), b.end()));
        }
        Value base = evaluate(b.left());
        Value exponent = free(evaluate(b.right()), b);
        Optional<Rational> k = exponent.constantValue();
        if (base.hasUnknown()) {
            if (k.isPresent() && k.get().isOne()) {
                return base;
            }
            throw nonlinear(b);
        }
        if (k.isEmpty()) {
            return exponentialWithBase(b, base, exponent.forcing());
        }
        if (!k.get().isInteger()) {
            throw error(text(b) + " is out of scope", b);
        }
        int n = small(k.get(), b);
        Optional<Rational> c = base.constantValue();
        if (c.isPresent()) {
            if (c.get().isZero() && n < 0) {
                throw error("division by zero", b);
            }
            return constant(power(c.get(), n, b));
        }
        if (n < 0) {
            throw error(text(b) + " is out of scope", b);
        }
        Forcing result = Forcing.constant(shape.domain(), Rational.ONE);
        for (int i = 0; i < n; i++) {
            result = times(result, base.forcing(), b);
        }
        return Value.of(result);
    }

    /** c^(a·n + b) for a sequence, with a and b integers. */
    private Value exponentialWithBase(Node.Binary b, Value base, Forcing exponent) {
        Optional<Rational> c = base.constantValue();
        if (c.isEmpty()) {
            throw error(text(b) + " is out of scope", b);
        }
        if (shape.domain() == Domain.DIFFERENTIAL) {
            throw error(text(b) + ": use e^(c " + shape.variable() + ") with rational c", b);
        }
        if (c.get().isZero()) {
            throw error(text(b) + ": base must be nonzero", b);
        }
        Forcing.Linear linear = exponent.asLinear()
                .filter(l -> l.slope().isInteger() && l.intercept().isInteger() && !l.timesPi())
                .orElseThrow(() -> error(text(b) + " is out of scope", b));
        Rational factor = power(c.get(), small(linear.intercept(), b), b);
        Rational ratio = power(c.get(), small(linear.slope(), b), b);
        return Value.of(Forcing.exponential(shape.domain(), ratio).scale(factor));
    }

    /** e^(argument) or exp(argument): only e^(c·t) with rational c. */
    private Value exponential(Node term, Node argument) {
        if (shape.domain() == Domain.DIFFERENCE) {
            throw error(text(term) + ": base must be rational", term);
        }
        Forcing.Linear linear = free(evaluate(argument), term).forcing().asLinear()
                .orElseThrow(() -> error(text(term) + " is out of scope", term));
        if (!linear.intercept().isZero() || linear.timesPi()) {
            throw error(text(term) + ": coefficient must be rational", term);
        }
        return Value.of(Forcing.exponential(shape.domain(), linear.slope()));
    }

    /** sin(ω·v) or cos(ω·v) with ω rational or a rational multiple of π. */
    private Value oscillation(Node.Call call, Oscillation kind) {
        angleDepth++;
        Value argument = evaluate(call.argument());
        angleDepth--;
        Forcing.Linear linear = free(argument, call).forcing().asLinear()
                .filter(l -> l.intercept().isZero())
                .orElseThrow(() -> error(text(call) + " is out of scope (write sin(w " + shape.variable()
                        + ") or cos(w " + shape.variable() + "))", call));
        return Value.of(Forcing.oscillation(shape.domain(), kind, linear.slope(), linear.timesPi()));
    }

    /** The integer {@code value} as an int, if it is small enough to use as an exponent. */
    private int small(Rational value, Node term) {
        if (value.abs().compareTo(Rational.of(MAX_EXPONENT)) > 0) {
            throw error(shorten(text(term)) + ": exponent above " + MAX_EXPONENT, term);
        }
        return value.toBigInteger().intValueExact();
    }

    /** {@code value}, which must not involve the unknown because it sits inside {@code term}. */
    private Value free(Value value, Node term) {
        if (value.hasUnknown()) {
            throw nonlinear(term);
        }
        return value;
    }

    private InputException nonlinear(Node term) {
        return error("nonlinear term: " + text(term) + " (rootform solves linear equations)", term);
    }

    private InputException error(String message, Node node) {
        return new InputException(message, source, node.start());
    }

    private static String shorten(String text) {
        return Lexer.shorten(text);
    }

    private String text(Node node) {
        return source.substring(node.start(), node.end());
    }
}
