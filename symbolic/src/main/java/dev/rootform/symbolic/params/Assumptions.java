package dev.rootform.symbolic.params;

import dev.rootform.symbolic.model.InputException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Sign conditions on single parameters given with {@code --where}, such as
 * {@code "m > 0, c >= 0, k > 0"} (also {@code <}, {@code <=}, {@code !=} or {@code ≠}, and
 * {@code 0 < m}). Immutable.
 *
 * @since 0.3
 */
public final class Assumptions {
    private static final Pattern ITEM = Pattern.compile(
            "\\s*(?:([A-Za-z][A-Za-z0-9]*)\\s*(>=|<=|!=|≠|≥|≤|>|<)\\s*0|0\\s*(>=|<=|!=|≠|≥|≤|>|<)\\s*([A-Za-z][A-Za-z0-9]*))\\s*");
    private final Map<String, Relation> signs;

    private Assumptions(Map<String, Relation> signs) {
        this.signs = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(signs));
    }

    /** No assumptions. */
    public static Assumptions none() {
        return new Assumptions(Map.of());
    }

    /**
     * Reads a comma-separated list of sign conditions on the declared parameters.
     *
     * @throws InputException for an item that is not a sign condition on one parameter, positioned in {@code text}
     */
    public static Assumptions parse(String text, List<String> parameters) {
        Map<String, Relation> signs = new LinkedHashMap<>();
        if (text == null || text.isBlank()) {
            return none();
        }
        int at = 0;
        for (String item : text.split(",", -1)) {
            Matcher m = ITEM.matcher(item);
            if (!m.matches()) {
                throw new InputException("'" + item.strip() + "': write a sign condition on one parameter such as m > 0", text, at);
            }
            String name = m.group(1) != null ? m.group(1) : m.group(4);
            Relation r = relation(m.group(1) != null ? m.group(2) : m.group(3));
            if (m.group(1) == null) {
                r = r.negated();
            }
            if (!parameters.contains(name)) {
                throw new InputException("'" + name + "' is not a declared parameter", text, at + item.indexOf(name));
            }
            Relation before = signs.get(name);
            if (before != null && before.excludes(r)) {
                throw new InputException("the conditions on " + name + " contradict each other", text, at);
            }
            signs.put(name, before == null ? r : stronger(before, r));
            at += item.length() + 1;
        }
        return new Assumptions(signs);
    }

    private static Relation stronger(Relation a, Relation b) {
        if (a.follows(b)) {
            return b;
        }
        if (b.follows(a)) {
            return a;
        }
        if (a == Relation.NONNEGATIVE && b == Relation.NONZERO || b == Relation.NONNEGATIVE && a == Relation.NONZERO) {
            return Relation.POSITIVE;
        }
        if (a == Relation.NONPOSITIVE && b == Relation.NONZERO || b == Relation.NONPOSITIVE && a == Relation.NONZERO) {
            return Relation.NEGATIVE;
        }
        return a;
    }

    private static Relation relation(String symbol) {
        switch (symbol) {
            case ">":
                return Relation.POSITIVE;
            case ">=":
            case "≥":
                return Relation.NONNEGATIVE;
            case "<":
                return Relation.NEGATIVE;
            case "<=":
            case "≤":
                return Relation.NONPOSITIVE;
            default:
                return Relation.NONZERO;
        }
    }

    /** The assumed relation of a parameter to zero, or null. */
    public Relation of(String name) {
        return signs.get(name);
    }

    /** Whether rational values satisfy every assumption. */
    public boolean holdAt(Map<String, dev.rootform.symbolic.algebra.Rational> values) {
        return signs.entrySet().stream().allMatch(e -> e.getValue().holdsFor(values.get(e.getKey()).signum()));
    }

    /** The conditions as written back: {@code m > 0, c >= 0}. */
    @Override
    public String toString() {
        return String.join(", ", signs.entrySet().stream().map(e -> e.getKey() + " " + e.getValue().symbol() + " 0").toList());
    }
}
