package dev.rootform.symbolic.parse;

/**
 * The walk shared by the readers of an expression tree: one method per kind of node, a sum and a
 * negation of values, and {@link #dispatch} choosing among them. Subclasses decide what a value is
 * (numbers only, or with parameters) and what to refuse.
 *
 * @param <V> the value of an expression
 */
abstract class NodeEvaluator<V> {

    /** The value of a subexpression (a subclass may check sizes around {@link #dispatch}). */
    abstract V evaluate(Node node);

    abstract V number(Node.Num node);

    abstract V name(Node.Name node);

    abstract V call(Node.Call node);

    abstract V indexed(Node.Indexed node);

    abstract V derivative(Node.Derivative node);

    abstract V negate(V value);

    abstract V sum(V left, V right);

    abstract V product(Node.Binary node);

    abstract V quotient(Node.Binary node);

    abstract V power(Node.Binary node);

    /** The value of {@code node} by its kind; its children through {@link #evaluate}. */
    final V dispatch(Node node) {
        if (node instanceof Node.Num num) {
            return number(num);
        }
        if (node instanceof Node.Name name) {
            return name(name);
        }
        if (node instanceof Node.Call call) {
            return call(call);
        }
        if (node instanceof Node.Indexed indexed) {
            return indexed(indexed);
        }
        if (node instanceof Node.Derivative derivative) {
            return derivative(derivative);
        }
        if (node instanceof Node.Negation negation) {
            return negate(evaluate(negation.operand()));
        }
        Node.Binary b = (Node.Binary) node;
        switch (b.op()) {
            case ADD:
                return sum(evaluate(b.left()), evaluate(b.right()));
            case SUB:
                return sum(evaluate(b.left()), negate(evaluate(b.right())));
            case MUL:
                return product(b);
            case DIV:
                return quotient(b);
            default:
                return power(b);
        }
    }
}
