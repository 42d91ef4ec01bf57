package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.claim.Expr;
import java.math.MathContext;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Evaluates a claim's expression tree numerically: its value and first derivatives at a point, to a
 * working precision, by Taylor jets in complex apfloat arithmetic. Integer powers are multiplied
 * out; other powers go through exp and log (so (−2)^n is right at integer n); the roots of a root
 * sum come certified from {@link RootFinder}. Independent of the exact evaluation.
 */
final class JetEvaluator {
    private final long precision;
    private final int order;
    private final Map<RationalPolynomial, List<Enclosure>> roots = new HashMap<>();
    private final Apfloat euler;

    /**
     * @param precision working precision in decimal digits
     * @param order highest derivative wanted
     */
    JetEvaluator(long precision, int order) {
        this.precision = precision;
        this.order = order;
        this.euler = ApfloatMath.exp(new Apfloat(1, precision));
    }

    /** The jet of e at the point x. @throws UnsupportedOperationException for arccos etc. of the variable */
    Jet at(Expr e, Apfloat x) {
        return evaluate(e, x, null);
    }

    private Jet evaluate(Expr e, Apfloat x, Apcomplex lambda) {
        if (e instanceof Expr.Number n) {
            return constant(decimal(n.value()));
        }
        if (e instanceof Expr.Variable) {
            return Jet.variable(x, order, precision);
        }
        if (e instanceof Expr.Constant c) {
            switch (c.kind()) {
                case PI:
                    return constant(ApfloatMath.pi(precision));
                case E:
                    return constant(euler);
                default:
                    return constant(lambda);
            }
        }
        if (e instanceof Expr.Negation n) {
            return evaluate(n.operand(), x, lambda).negate();
        }
        if (e instanceof Expr.Binary b) {
            return binary(b, x, lambda);
        }
        if (e instanceof Expr.Call c) {
            return call(c, x, lambda);
        }
        Expr.RootSum r = (Expr.RootSum) e;
        Jet sum = constant(Apcomplex.ZERO);
        for (Enclosure z : roots.computeIfAbsent(r.factor(), f -> new RootFinder((int) precision).roots(f))) {
            sum = sum.add(evaluate(r.summand(), x, new Apcomplex(new Apfloat(z.re(), precision), new Apfloat(z.im(), precision))));
        }
        return sum;
    }

    private Jet binary(Expr.Binary b, Apfloat x, Apcomplex lambda) {
        if (b.op() == Expr.Binary.Op.POWER) {
            Jet exponent = evaluate(b.right(), x, lambda);
            if (b.left() instanceof Expr.Constant c && c.kind() == Expr.Constant.Kind.E) {
                return exponent.exp();
            }
            Jet base = evaluate(b.left(), x, lambda);
            OptionalLong k = exponent.integerValue();
            return k.isPresent() ? base.pow(k.getAsLong()) : exponent.multiply(base.log()).exp();
        }
        Jet left = evaluate(b.left(), x, lambda);
        Jet right = evaluate(b.right(), x, lambda);
        switch (b.op()) {
            case ADD:
                return left.add(right);
            case SUBTRACT:
                return left.subtract(right);
            case MULTIPLY:
                return left.multiply(right);
            default:
                return left.divide(right);
        }
    }

    private Jet call(Expr.Call c, Apfloat x, Apcomplex lambda) {
        Jet a = evaluate(c.argument(), x, lambda);
        Apcomplex i = new Apcomplex(Apfloat.ZERO, new Apfloat(1, precision));
        Apfloat half = new Apfloat(1, precision).divide(new Apfloat(2, precision));
        switch (c.function()) {
            case COS:
            case SIN: {
                if (a.isReal()) {
                    return a.cosSin()[c.function() == Expr.Call.Function.COS ? 0 : 1];
                }
                Jet plus = a.scale(i).exp();
                Jet minus = a.scale(i.negate()).exp();
                return c.function() == Expr.Call.Function.COS ? plus.add(minus).scale(half)
                        : plus.subtract(minus).scale(i.negate().multiply(half));
            }
            case EXP:
                return a.exp();
            case SQRT:
                return a.isConstant() ? constant(ApcomplexMath.sqrt(a.value())) : a.log().scale(half).exp();
            default: {
                if (!a.isConstant() || !a.value().imag().equals(Apfloat.ZERO)) {
                    throw new UnsupportedOperationException(c.function().written() + " of the variable is out of scope in a claim");
                }
                Apfloat v = a.value().real();
                Apfloat r = c.function() == Expr.Call.Function.ARCCOS ? ApfloatMath.acos(v)
                        : c.function() == Expr.Call.Function.ARCSIN ? ApfloatMath.asin(v) : ApfloatMath.atan(v);
                return constant(r);
            }
        }
    }

    private Jet constant(Apcomplex v) {
        return Jet.constant(v, order, precision);
    }

    private Apfloat decimal(Rational q) {
        return new Apfloat(q.toBigDecimal(new MathContext((int) precision)), precision);
    }
}
