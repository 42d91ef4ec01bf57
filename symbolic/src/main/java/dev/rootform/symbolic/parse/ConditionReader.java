package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Reads one condition such as {@code y'(0) = 1} or {@code x[5] = 8} against an equation already read. */
final class ConditionReader {
    /** A point written as a rational multiple of π. */
    private static final Pattern PI_POINT =
            Pattern.compile("(-?)\\s*(\\d+(?:\\.\\d+)?)?\\s*[*\u00b7]?\\s*(?:pi|\u03c0)\\s*(?:/\\s*(\\d+))?");

    private final Shape shape;
    private final int order;

    /**
     * @param shape the frame of the equation
     * @param order the order of the equation
     */
    ConditionReader(Shape shape, int order) {
        this.shape = shape;
        this.order = order;
    }

    /** The condition in {@code source.substring(begin, end)}. */
    Condition read(String source, int begin, int end) {
        Parser.Equality sides = new Parser(source, begin, end, shape.variable()).equality("condition");
        Linearizer constants = new Linearizer(source, shape);
        Node left = sides.left();
        String text = source.substring(left.start(), left.end());
        Node point;
        int derivative = 0;
        if (left instanceof Node.Indexed indexed && indexed.name().equals(shape.function())) {
            if (shape.domain() != Domain.DIFFERENCE) {
                throw new InputException("condition " + text + ": brackets need a recurrence", source, left.start());
            }
            point = indexed.index();
        } else if (left instanceof Node.Call call && call.name().equals(shape.function())) {
            point = call.argument();
        } else if (left instanceof Node.Derivative d && d.name().equals(shape.function()) && d.argument() != null) {
            if (shape.domain() != Domain.DIFFERENTIAL) {
                throw new InputException("condition " + text + ": derivatives need a differential equation",
                        source, left.start());
            }
            derivative = d.order();
            point = d.argument();
        } else {
            throw new InputException("condition " + text + ": expected " + example() + " with the unknown "
                    + shape.function(), source, left.start());
        }
        if (derivative >= order) {
            throw new InputException("condition order " + derivative + " >= equation order " + order,
                    source, left.start());
        }
        Rational value = constants.rational(sides.right(), "condition value");
        Optional<Rational> piMultiple = shape.domain() == Domain.DIFFERENTIAL
                ? piMultiple(source.substring(point.start(), point.end())) : Optional.empty();
        if (piMultiple.isPresent()) {
            return new Condition(derivative, within(piMultiple.get(), text, source, point), true, value);
        }
        Rational at = constants.rational(point, "condition point");
        if (shape.domain() == Domain.DIFFERENCE && !at.isInteger()) {
            throw new InputException("condition " + text + ": index must be an integer", source, point.start());
        }
        return new Condition(derivative, within(at, text, source, point), value);
    }

    /** {@code at}, unless it lies beyond {@link Limits#MAX_INDEX} (sequences) or {@link Limits#MAX_POINT} (functions). */
    private Rational within(Rational at, String text, String source, Node point) {
        boolean sequence = shape.domain() == Domain.DIFFERENCE;
        long limit = sequence ? Limits.MAX_INDEX : Limits.MAX_POINT;
        if (at.abs().compareTo(Rational.of(limit)) > 0) {
            throw new InputException("condition " + Lexer.shorten(text) + ": " + (sequence ? "indices" : "points")
                    + " up to " + limit + " in size are accepted", source, point.start());
        }
        return at;
    }

    /** q for a point written as a rational multiple of π: {@code pi}, {@code -2pi}, {@code 3*pi/4}, {@code pi/2}. */
    static Optional<Rational> piMultiple(String text) {
        Matcher m = PI_POINT.matcher(text.trim());
        if (!m.matches()) {
            return Optional.empty();
        }
        Rational q = m.group(2) == null ? Rational.ONE : Rational.parse(m.group(2));
        if (m.group(3) != null && Rational.parse(m.group(3)).isZero()) {
            return Optional.empty();
        }
        q = m.group(3) == null ? q : q.divide(Rational.parse(m.group(3)));
        return Optional.of(m.group(1).isEmpty() ? q : q.negate());
    }

    private String example() {
        String f = shape.function();
        return shape.domain() == Domain.DIFFERENCE ? f + "[0] = value" : f + "(0) = value or " + f + "'(0) = value";
    }
}
