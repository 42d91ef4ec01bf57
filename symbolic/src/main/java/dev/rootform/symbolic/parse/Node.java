package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import java.util.List;
import java.util.stream.Stream;

/**
 * The expression tree read from one side of an equation or condition. Every node remembers the
 * source range it was read from, so later checks can quote the term and point at it.
 */
sealed interface Node {

    /** Offset of the first character of the node. */
    int start();

    /** Offset after the last character of the node. */
    int end();

    /** Direct subexpressions. */
    List<Node> children();

    /** This node and all its descendants, parents first. */
    default Stream<Node> descendants() {
        return Stream.concat(Stream.of(this), children().stream().flatMap(Node::descendants));
    }

    /** A number literal. */
    record Num(Rational value, int start, int end) implements Node {
        public List<Node> children() {
            return List.of();
        }
    }

    /** A bare name: a variable, a constant, an operator symbol or the unknown itself. */
    record Name(String name, int start, int end) implements Node {
        public List<Node> children() {
            return List.of();
        }
    }

    /** A name followed by a parenthesised argument: a function, an application of the unknown, or a product. */
    record Call(String name, Node argument, int start, int end) implements Node {
        public List<Node> children() {
            return List.of(argument);
        }
    }

    /** A sequence term such as {@code x[n+1]}. */
    record Indexed(String name, Node index, int start, int end) implements Node {
        public List<Node> children() {
            return List.of(index);
        }
    }

    /**
     * A derivative of order {@code order} of {@code name}, with the variable named in Leibniz form
     * (or null) and an optional argument as in {@code y'(0)} (or null).
     */
    record Derivative(String name, int order, String variable, Node argument, int start, int end)
            implements Node {
        public List<Node> children() {
            return argument == null ? List.of() : List.of(argument);
        }
    }

    /** Unary minus. */
    record Negation(Node operand, int start, int end) implements Node {
        public List<Node> children() {
            return List.of(operand);
        }
    }

    /** A binary operation. */
    record Binary(Op op, Node left, Node right, int start, int end) implements Node {
        /** The arithmetic operators. */
        enum Op { ADD, SUB, MUL, DIV, POW }

        public List<Node> children() {
            return List.of(left, right);
        }
    }
}
