package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.params.ParamCondition;
import dev.rootform.symbolic.params.ParamFunction;
import dev.rootform.symbolic.params.ParamTerm;
import dev.rootform.symbolic.params.ParametricProblem;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a problem whose coefficients, forcing and condition values contain declared parameters:
 * {@code m y'' + c y' + k y = F cos(w t); y(0) = x0; y'(0) = 0} with parameters
 * {@code m, c, k, F, w, x0}. Conditions of a differential equation are taken at t = 0.
 *
 * @since 0.3
 */
public final class ParametricParser {
    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z][A-Za-z0-9]*");
    private static final Set<String> FIXED = Set.of(Names.DERIVATIVE_OPERATOR, Names.SHIFT_OPERATOR, Names.EULER, Names.PI);

    private ParametricParser() {
    }

    /**
     * The declared parameter names of a list such as {@code "m, c, k"}.
     *
     * @throws InputException for an empty list, a name that is not letters then letters or digits, a
     *     repeated name, or a name with a fixed meaning (D, E, e, pi, a function), positioned in {@code list}
     */
    public static List<String> names(String list) {
        Set<String> names = new LinkedHashSet<>();
        Matcher m = Pattern.compile("[^,\\s]+").matcher(list == null ? "" : list);
        while (m.find()) {
            String name = m.group();
            if (!IDENTIFIER.matcher(name).matches()) {
                throw new InputException("parameter '" + name + "': a name is a letter followed by letters or digits", list, m.start());
            }
            if (FIXED.contains(name) || Names.isSupportedFunction(name) || Names.isUnsupportedFunction(name)) {
                throw new InputException("parameter '" + name + "' has a fixed meaning; choose another name", list, m.start());
            }
            if (!names.add(name)) {
                throw new InputException("parameter '" + name + "' is listed twice", list, m.start());
            }
        }
        if (names.isEmpty()) {
            throw new InputException("no parameters listed", list == null ? "" : list, 0);
        }
        if (names.size() > Limits.MAX_PARAMETERS) {
            throw new InputException(names.size() + " parameters: at most " + Limits.MAX_PARAMETERS + " are accepted", list, 0);
        }
        return List.copyOf(names);
    }

    /**
     * Parses an equation with parameters and its {@code ;}-separated conditions.
     *
     * @param text the equation and conditions
     * @param parameters the declared names (see {@link #names})
     * @param variable the independent variable of a differential equation, or null
     * @throws InputException naming the problem and its position in {@code text}
     */
    public static ParametricProblem parse(String text, List<String> parameters, String variable) {
        String source = text == null ? "" : text;
        ProblemParser.requireShort(source);
        Set<String> declared = Set.copyOf(parameters);
        List<int[]> segments = ProblemParser.segments(source);
        if (segments.isEmpty()) {
            throw new InputException("empty input", source, 0);
        }
        int[] first = segments.get(0);
        Parser.Equality sides = new Parser(source, first[0], first[1], variable, declared).equality("equation");
        Shape shape = Shape.of(source, List.of(sides.left(), sides.right()), variable);
        refuseClashes(source, shape, parameters, sides);
        ParamLinearizer linearizer = new ParamLinearizer(source, shape, parameters);
        ParamValue difference = linearizer.evaluate(sides.left()).add(linearizer.evaluate(sides.right()).negate());
        if (!difference.hasUnknown()) {
            throw new InputException("equation has no unknown", source, sides.left().start());
        }
        int low = difference.unknown().keySet().stream().min(Integer::compare).orElseThrow();
        int high = difference.unknown().keySet().stream().max(Integer::compare).orElseThrow();
        if (shape.domain() == Domain.DIFFERENTIAL) {
            low = 0;
        }
        if (high - low < 1) {
            throw new InputException("the equation must involve " + shape.function() + " at two orders or shifts at least", source,
                    sides.left().start());
        }
        List<ParamFunction> coefficients = new ArrayList<>();
        for (int j = low; j <= high; j++) {
            coefficients.add(difference.unknown().getOrDefault(j, ParamFunction.zero(parameters)));
        }
        List<ParamTerm> forcing = difference.negate().forcing();
        List<ParamCondition> conditions = new ArrayList<>();
        List<Node> nodes = new ArrayList<>(List.of(sides.left(), sides.right()));
        for (int[] segment : segments.subList(1, segments.size())) {
            Parser.Equality c = new Parser(source, segment[0], segment[1], shape.variable(), declared).equality("condition");
            conditions.add(condition(source, shape, linearizer, c));
            nodes.add(c.left());
            nodes.add(c.right());
        }
        List<ParametricProblem.Occurrence> occurrences = new ArrayList<>();
        for (Node node : nodes) {
            node.descendants().forEach(n -> {
                if (n instanceof Node.Name name && declared.contains(name.name())) {
                    occurrences.add(new ParametricProblem.Occurrence(name.name(), name.start(), name.end()));
                } else if (n instanceof Node.Call call && declared.contains(call.name())) {
                    occurrences.add(new ParametricProblem.Occurrence(call.name(), call.start(), call.start() + call.name().length()));
                }
            });
        }
        return new ParametricProblem(shape.domain(), shape.function(), shape.variable(), parameters, coefficients,
                shape.domain() == Domain.DIFFERENCE ? low : 0, forcing, conditions, source, occurrences);
    }

    /** The text with every parameter replaced by its rational value in parentheses: an ordinary problem. */
    public static String substitute(ParametricProblem problem, Map<String, Rational> values) {
        StringBuilder text = new StringBuilder(problem.source());
        List<ParametricProblem.Occurrence> backwards = new ArrayList<>(problem.occurrences());
        backwards.sort((a, b) -> Integer.compare(b.start(), a.start()));
        for (ParametricProblem.Occurrence o : backwards) {
            text.replace(o.start(), o.end(), "(" + values.get(o.name()) + ")");
        }
        return text.toString();
    }

    private static void refuseClashes(String source, Shape shape, List<String> parameters, Parser.Equality sides) {
        if (parameters.contains(shape.variable())) {
            throw new InputException("parameter '" + shape.variable() + "' is the independent variable; choose another name",
                    source, position(sides, shape.variable()));
        }
        if (parameters.contains(shape.function())) {
            throw new InputException("parameter '" + shape.function() + "' is the unknown; choose another name",
                    source, position(sides, shape.function()));
        }
    }

    private static int position(Parser.Equality sides, String name) {
        return java.util.stream.Stream.of(sides.left(), sides.right()).flatMap(Node::descendants)
                .filter(n -> n instanceof Node.Name x && x.name().equals(name)
                        || n instanceof Node.Derivative d && d.name().equals(name)
                        || n instanceof Node.Indexed i && i.name().equals(name)
                        || n instanceof Node.Call c && c.name().equals(name))
                .mapToInt(Node::start).findFirst().orElse(-1);
    }

    private static ParamCondition condition(String source, Shape shape, ParamLinearizer linearizer, Parser.Equality c) {
        Node left = c.left();
        ParamFunction value = linearizer.constantOf(c.right(), "a condition's value");
        if (shape.domain() == Domain.DIFFERENCE) {
            if (left instanceof Node.Indexed i && i.name().equals(shape.function())) {
                Rational index = linearizer.constantOf(i.index(), "an index").isConstant()
                        ? linearizer.constantOf(i.index(), "an index").constantValue() : null;
                if (index == null || !index.isInteger() || index.signum() < 0) {
                    throw new InputException("a condition's index must be an integer ≥ 0", source, i.index().start());
                }
                return new ParamCondition(0, index, value);
            }
        } else {
            int order = left instanceof Node.Derivative d && d.name().equals(shape.function()) && d.argument() != null ? d.order()
                    : left instanceof Node.Call call && call.name().equals(shape.function()) ? 0 : -1;
            Node point = left instanceof Node.Derivative d ? d.argument() : left instanceof Node.Call call ? call.argument() : null;
            if (order >= 0) {
                ParamFunction at = linearizer.constantOf(point, "a condition's point");
                if (!at.isZero()) {
                    throw new InputException("with parameters, conditions are taken at " + shape.variable() + " = 0", source, point.start());
                }
                return new ParamCondition(order, Rational.ZERO, value);
            }
        }
        throw new InputException("a condition reads " + (shape.domain() == Domain.DIFFERENCE ? shape.function() + "[0] = value"
                : shape.function() + "(0) = value or " + shape.function() + "'(0) = value"), source, left.start());
    }
}
