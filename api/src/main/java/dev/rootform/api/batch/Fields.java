package dev.rootform.api.batch;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.symbolic.model.InputException;
import java.math.BigDecimal;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * The fields of one request object, read by name and type. Every name asked for is remembered, so
 * that {@link #rejectUnknown} can name a field nobody reads (a typo such as {@code digts}). Not
 * thread-safe: one instance per request.
 */
final class Fields {
    private final ObjectNode node;
    private final Set<String> known = new LinkedHashSet<>();

    Fields(ObjectNode node) {
        this.node = node;
    }

    /** A string field. @throws InputException if present and not a string */
    Optional<String> text(String name) {
        JsonNode value = field(name);
        if (value == null) {
            return Optional.empty();
        }
        if (!value.isTextual()) {
            throw wrongType(name, "a string");
        }
        return Optional.of(value.textValue());
    }

    /** A string field that must be there. */
    String requiredText(String name) {
        return text(name).orElseThrow(() -> new InputException("the request has no \"" + name + "\"", "", -1));
    }

    /**
     * A list of strings: a JSON array of strings (numbers are taken by their exact decimal text),
     * or one string whose items are separated by commas; empty when absent.
     */
    List<String> texts(String name, boolean commaSeparated) {
        JsonNode value = field(name);
        if (value == null) {
            return List.of();
        }
        if (value.isTextual()) {
            return commaSeparated ? List.of(value.textValue().split(",", -1)) : List.of(value.textValue());
        }
        if (!value.isArray()) {
            throw wrongType(name, "an array of strings");
        }
        List<String> items = new ArrayList<>();
        for (JsonNode item : value) {
            if (item.isTextual()) {
                items.add(item.textValue());
            } else if (item.isNumber()) {
                items.add(item.decimalValue().toString());
            } else {
                throw wrongType(name, "an array of strings");
            }
        }
        return items;
    }

    /** A whole number in {@code min..max}, or {@code fallback} when absent. */
    int integer(String name, int fallback, int min, int max) {
        JsonNode value = field(name);
        if (value == null) {
            return fallback;
        }
        if (!value.isIntegralNumber() || !value.canConvertToInt() || value.intValue() < min || value.intValue() > max) {
            throw new InputException("\"" + name + "\" must be a whole number in " + min + ".." + max + ", not " + value, "", -1);
        }
        return value.intValue();
    }

    /** A boolean field, false when absent. */
    boolean flag(String name) {
        JsonNode value = field(name);
        if (value == null) {
            return false;
        }
        if (!value.isBoolean()) {
            throw wrongType(name, "true or false");
        }
        return value.booleanValue();
    }

    /** A positive number of seconds (fractions allowed, to the millisecond). */
    Optional<Duration> seconds(String name) {
        JsonNode value = field(name);
        if (value == null) {
            return Optional.empty();
        }
        if (!value.isNumber() || value.decimalValue().compareTo(new BigDecimal("0.001")) < 0) {
            throw new InputException("\"" + name + "\" must be a number of seconds of at least 0.001, not " + value, "", -1);
        }
        return Optional.of(Duration.ofMillis(value.decimalValue().movePointRight(3).longValue()));
    }

    /** Marks {@code name} as read without reading it (a field the caller handles itself). */
    void accept(String name) {
        known.add(name);
    }

    /** @throws InputException naming the first field that no reader asked for, and the fields {@code command} takes */
    void rejectUnknown(String command) {
        for (Iterator<String> names = node.fieldNames(); names.hasNext();) {
            String name = names.next();
            if (!known.contains(name)) {
                throw new InputException("unknown field \"" + name + "\" for " + command + " (it takes " + String.join(", ", known) + ")",
                        "", -1);
            }
        }
    }

    private JsonNode field(String name) {
        known.add(name);
        JsonNode value = node.get(name);
        return value == null || value.isNull() ? null : value;
    }

    private static InputException wrongType(String name, String what) {
        return new InputException("\"" + name + "\" must be " + what, "", -1);
    }
}
