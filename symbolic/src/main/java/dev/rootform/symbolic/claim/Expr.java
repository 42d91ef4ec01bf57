package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.Objects;

/**
 * The expression tree of a claimed closed form. Every node remembers where it starts in the claim's
 * text, so a refusal can point at it. {@link #toString()} writes the tree back in ordinary notation
 * with explicit products and only the parentheses it needs, which shows how the claim was read.
 *
 * @since 0.3
 */
public sealed interface Expr permits Expr.Number, Expr.Variable, Expr.Constant, Expr.Negation, Expr.Binary,
        Expr.Call, Expr.RootSum {

    /** Offset of the node's first character in the claim. */
    int start();

    /** An exact number. */
    record Number(Rational value, int start) implements Expr {
        public Number {
            Objects.requireNonNull(value, "value");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /** The independent variable (n or t, or the name the equation uses). */
    record Variable(String name, int start) implements Expr {
        public Variable {
            Objects.requireNonNull(name, "name");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /** π, e, or the root λ bound by an enclosing {@link RootSum}. */
    record Constant(Kind kind, int start) implements Expr {
        /** The named constants. */
        public enum Kind { PI, E, LAMBDA }

        public Constant {
            Objects.requireNonNull(kind, "kind");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /** -operand. */
    record Negation(Expr operand, int start) implements Expr {
        public Negation {
            Objects.requireNonNull(operand, "operand");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /** left op right. */
    record Binary(Op op, Expr left, Expr right, int start) implements Expr {
        /** The arithmetic operators. */
        public enum Op {
            ADD, SUBTRACT, MULTIPLY, DIVIDE, POWER
        }

        public Binary {
            Objects.requireNonNull(op, "op");
            Objects.requireNonNull(left, "left");
            Objects.requireNonNull(right, "right");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /** A function applied to one argument. */
    record Call(Function function, Expr argument, int start) implements Expr {
        /** The functions a claim may use. */
        public enum Function {
            SIN("sin"), COS("cos"), EXP("exp"), SQRT("sqrt"), ARCCOS("arccos"), ARCSIN("arcsin"), ARCTAN("arctan");

            private final String written;

            Function(String written) {
                this.written = written;
            }

            /** The name as written in ordinary notation. */
            public String written() {
                return written;
            }
        }

        public Call {
            Objects.requireNonNull(function, "function");
            Objects.requireNonNull(argument, "argument");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }

    /**
     * Σ over the roots λ of the polynomial {@code factor} of {@code summand}, as the tool writes
     * solutions whose characteristic factor has degree 3 or more.
     */
    record RootSum(RationalPolynomial factor, Expr summand, int start) implements Expr {
        public RootSum {
            Objects.requireNonNull(factor, "factor");
            Objects.requireNonNull(summand, "summand");
        }

        @Override
        public String toString() {
            return ExprWriter.write(this);
        }
    }
}
