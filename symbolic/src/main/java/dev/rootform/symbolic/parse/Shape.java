package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The frame of an equation read from its tree before evaluation: the domain (a recurrence when
 * brackets or the shift operator E appear), the independent variable and the one unknown function.
 *
 * @param domain difference or differential
 * @param function name of the unknown
 * @param variable name of the independent variable
 */
record Shape(Domain domain, String function, String variable) {

    /** Resolves the frame of {@code sides} read from {@code source}; {@code explicitVariable} may be null. */
    static Shape of(String source, List<Node> sides, String explicitVariable) {
        List<Node> nodes = sides.stream().flatMap(Node::descendants).toList();
        boolean recurrence = nodes.stream().anyMatch(n -> n instanceof Node.Indexed
                || n instanceof Node.Name name && name.name().equals(Names.SHIFT_OPERATOR)
                || n instanceof Node.Call call && call.name().equals(Names.SHIFT_OPERATOR));
        Domain domain = recurrence ? Domain.DIFFERENCE : Domain.DIFFERENTIAL;
        String variable = recurrence ? indexName(nodes) : timeName(source, nodes, explicitVariable);
        return new Shape(domain, function(source, nodes, variable), variable);
    }

    private static String indexName(List<Node> nodes) {
        return nodes.stream().filter(Node.Indexed.class::isInstance)
                .flatMap(n -> ((Node.Indexed) n).index().descendants())
                .filter(Node.Name.class::isInstance).map(n -> ((Node.Name) n).name())
                .filter(name -> !name.equals(Names.PI) && !name.equals(Names.EULER))
                .findFirst().orElse(Names.DEFAULT_INDEX);
    }

    /** The explicit variable, else one named by dy/dx or y(x), else t; all that are named must agree. */
    private static String timeName(String source, List<Node> nodes, String explicitVariable) {
        String chosen = explicitVariable;
        refuseFixedVariable(source, explicitVariable, -1);
        for (Node node : nodes) {
            String named = namedVariable(node, explicitVariable);
            if (named == null) {
                continue;
            }
            if (chosen != null && !chosen.equals(named)) {
                throw new InputException(text(source, node) + ": the variable is " + chosen + ", not " + named,
                        source, node.start());
            }
            refuseFixedVariable(source, named, node.start());
            chosen = named;
        }
        return chosen == null ? Names.DEFAULT_TIME : chosen;
    }

    /**
     * A variable named like a constant, an operator or a function (--var e, dy/dpi) would make the
     * answer read as that constant ({@code u(e) = e^(-e)}, {@code y(pi) = cos(pi)}): refused.
     */
    private static void refuseFixedVariable(String source, String name, int at) {
        if (name == null || name.equals(Names.DEFAULT_TIME) || name.equals(Names.DEFAULT_INDEX)
                || !Names.isReserved(name, null)) {
            return;
        }
        throw new InputException((name.equals(Names.EULER) ? "e is Euler's number" : name + " has a fixed meaning")
                + " and cannot name the variable; use another name such as t", source, at);
    }

    private static String namedVariable(Node node, String explicitVariable) {
        if (node instanceof Node.Derivative d && d.variable() != null) {
            return d.variable();
        }
        Node argument = node instanceof Node.Derivative d ? d.argument()
                : node instanceof Node.Call c && !Names.isReserved(c.name(), explicitVariable) ? c.argument()
                : null;
        return argument instanceof Node.Name name && !name.name().equals(Names.PI)
                && !name.name().equals(Names.EULER) ? name.name() : null;
    }

    /** The one name used as a derivative, sequence or application; failing that, the one free bare name. */
    private static String function(String source, List<Node> nodes, String variable) {
        Map<String, Node> applied = new LinkedHashMap<>();
        Map<String, Node> bare = new LinkedHashMap<>();
        for (Node node : nodes) {
            if (node instanceof Node.Derivative d) {
                refuseFixedName(source, d.name(), d);
                applied.putIfAbsent(d.name(), d);
            } else if (node instanceof Node.Indexed i) {
                refuseFixedName(source, i.name(), i);
                applied.putIfAbsent(i.name(), i);
            } else if (node instanceof Node.Call c && !Names.isReserved(c.name(), variable)) {
                applied.putIfAbsent(c.name(), c);
            } else if (node instanceof Node.Name n && !Names.isReserved(n.name(), variable)) {
                bare.putIfAbsent(n.name(), n);
            }
        }
        Map<String, Node> candidates = applied.isEmpty() ? bare : applied;
        if (candidates.isEmpty()) {
            throw new InputException("equation has no unknown", source, -1);
        }
        List<String> names = List.copyOf(candidates.keySet());
        if (names.size() > 1) {
            Node second = candidates.get(names.get(1));
            throw new InputException("mixes " + names.get(0) + " and " + names.get(1)
                    + ": one unknown function expected", source, second.start());
        }
        return names.get(0);
    }

    /**
     * A derivative or sequence of a name with a fixed meaning (Euler's e, π, the operators D and E)
     * would be written like that constant in the answer ({@code e(t) = 1 - e^(-t)}): refused.
     */
    private static void refuseFixedName(String source, String name, Node node) {
        if (name.equals(Names.EULER)) {
            throw new InputException("e is Euler's number and cannot name the unknown function; use another name such as y",
                    source, node.start());
        }
        if (name.equals(Names.PI) || name.equals(Names.DERIVATIVE_OPERATOR) || name.equals(Names.SHIFT_OPERATOR)) {
            throw new InputException(name + " has a fixed meaning and cannot name the unknown function; use another name such as y",
                    source, node.start());
        }
    }

    private static String text(String source, Node node) {
        return source.substring(node.start(), node.end());
    }
}
