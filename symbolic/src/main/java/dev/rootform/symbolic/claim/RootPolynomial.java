package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.InputException;

/** The rational polynomial in λ written under a root sum, such as {@code λ^3 - λ - 1}. */
final class RootPolynomial {
    /** Bound on the degree of a root sum's polynomial. */
    private static final int MAX_DEGREE = 200;

    private RootPolynomial() {
    }

    /** @throws InputException if the expression is not a polynomial in λ with rational coefficients */
    static RationalPolynomial of(String source, Expr e) {
        if (e instanceof Expr.Number n) {
            return RationalPolynomial.constant(n.value());
        }
        if (e instanceof Expr.Constant c && c.kind() == Expr.Constant.Kind.LAMBDA) {
            return RationalPolynomial.X;
        }
        if (e instanceof Expr.Negation n) {
            return of(source, n.operand()).negate();
        }
        if (e instanceof Expr.Binary b) {
            RationalPolynomial left = of(source, b.left());
            switch (b.op()) {
                case ADD:
                    return left.add(of(source, b.right()));
                case SUBTRACT:
                    return left.subtract(of(source, b.right()));
                case MULTIPLY:
                    return left.multiply(of(source, b.right()));
                case DIVIDE: {
                    RationalPolynomial d = of(source, b.right());
                    if (d.degree() != 0) {
                        throw notPolynomial(source, b);
                    }
                    return left.multiply(d.coefficient(0).inverse());
                }
                default: {
                    RationalPolynomial k = of(source, b.right());
                    Rational p = k.coefficient(0);
                    if (k.degree() > 0 || !p.isInteger() || p.signum() < 0 || p.compareTo(Rational.of(MAX_DEGREE)) > 0) {
                        throw notPolynomial(source, b);
                    }
                    return left.pow(p.toBigInteger().intValueExact());
                }
            }
        }
        throw notPolynomial(source, e);
    }

    private static InputException notPolynomial(String source, Expr e) {
        return new InputException("a root sum needs a polynomial in λ with rational coefficients", source, e.start());
    }
}
