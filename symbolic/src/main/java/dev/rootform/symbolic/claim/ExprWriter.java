package dev.rootform.symbolic.claim;

/**
 * Writes an expression tree back in ordinary notation with only the parentheses its structure
 * needs: {@code (e^t - e^(-t))/(e - e^(-1))}, {@code 2·π·n/3}. Products are written with
 * {@code ·}, so implicit multiplication shows how it was read.
 */
final class ExprWriter {
    private static final int SUM = 1;
    private static final int PRODUCT = 2;
    private static final int SIGN = 3;
    private static final int POWER = 4;
    private static final int ATOM = 5;

    private ExprWriter() {
    }

    static String write(Expr e) {
        return write(e, 0);
    }

    /** e, parenthesised when it binds looser than {@code context}. */
    private static String write(Expr e, int context) {
        int own = precedence(e);
        String text = body(e);
        return own < context ? "(" + text + ")" : text;
    }

    private static String body(Expr e) {
        if (e instanceof Expr.Number n) {
            return n.value().abs().toString().equals(n.value().toString()) ? n.value().toString() : "-" + n.value().abs();
        }
        if (e instanceof Expr.Variable v) {
            return v.name();
        }
        if (e instanceof Expr.Constant c) {
            return c.kind() == Expr.Constant.Kind.PI ? "π" : c.kind() == Expr.Constant.Kind.E ? "e" : "λ";
        }
        if (e instanceof Expr.Negation n) {
            return "-" + write(n.operand(), POWER);
        }
        if (e instanceof Expr.Call c) {
            return c.function().written() + "(" + write(c.argument(), 0) + ")";
        }
        if (e instanceof Expr.RootSum r) {
            return "Σ_{" + r.factor().toString("λ") + " = 0} " + write(r.summand(), PRODUCT);
        }
        Expr.Binary b = (Expr.Binary) e;
        switch (b.op()) {
            case ADD:
                return write(b.left(), SUM) + " + " + write(b.right(), PRODUCT);
            case SUBTRACT:
                return write(b.left(), SUM) + " - " + write(b.right(), PRODUCT);
            case MULTIPLY:
                return write(b.left(), PRODUCT) + "·" + write(b.right(), POWER);
            case DIVIDE:
                return write(b.left(), PRODUCT) + "/" + write(b.right(), POWER);
            default:
                return write(b.left(), ATOM) + "^" + write(b.right(), ATOM);
        }
    }

    private static int precedence(Expr e) {
        if (e instanceof Expr.Number n) {
            return n.value().signum() < 0 ? SIGN : n.value().isInteger() ? ATOM : PRODUCT;
        }
        if (e instanceof Expr.Negation) {
            return SIGN;
        }
        if (e instanceof Expr.RootSum) {
            return PRODUCT;
        }
        if (e instanceof Expr.Binary b) {
            switch (b.op()) {
                case ADD:
                case SUBTRACT:
                    return SUM;
                case MULTIPLY:
                case DIVIDE:
                    return PRODUCT;
                default:
                    return POWER;
            }
        }
        return ATOM;
    }
}
