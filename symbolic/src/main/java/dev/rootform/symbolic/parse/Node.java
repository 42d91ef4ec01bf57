package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.Optional;
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

    /** This node and all its descendants, parents first (walked without recursion, so deep trees are safe). */
    default Stream<Node> descendants() {
        List<Node> all = new ArrayList<>();
        Deque<Node> pending = new ArrayDeque<>(List.of(this));
        while (!pending.isEmpty()) {
            Node node = pending.pop();
            all.add(node);
            List<Node> children = node.children();
            for (int i = children.size() - 1; i >= 0; i--) {
                pending.push(children.get(i));
            }
        }
        return all.stream();
    }

    /** The first node found at {@code depth} levels below this one (this is level 0), if the tree is that deep. */
    default Optional<Node> atDepth(int depth) {
        Deque<Map.Entry<Node, Integer>> pending = new ArrayDeque<>(List.of(Map.entry(this, 0)));
        while (!pending.isEmpty()) {
            Map.Entry<Node, Integer> entry = pending.pop();
            if (entry.getValue() >= depth) {
                return Optional.of(entry.getKey());
            }
            entry.getKey().children().forEach(child -> pending.push(Map.entry(child, entry.getValue() + 1)));
        }
        return Optional.empty();
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

        /**
         * This call raised to {@code exponent}, read as a product for a name that is no function:
         * the name is a factor and {@code ^} binds to the parentheses only ({@code t (3)^2} is
         * t·3^2, {@code D (D+1)^2} is D·(D+1)^2), as it does after a number ({@code 2 (3)^2}).
         */
        Binary factorTimesPower(Node exponent, int powerEnd) {
            Node power = new Binary(Binary.Op.POW, argument, exponent, start, powerEnd);
            return new Binary(Binary.Op.MUL, new Name(name, start, start + name.length()), power, start, powerEnd);
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
