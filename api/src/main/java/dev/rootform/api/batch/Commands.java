package dev.rootform.api.batch;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** The command table of batch requests: a command's name to the function that reads and runs it. */
final class Commands {
    /** The command of a request without {@code "command"}. */
    static final String DEFAULT = "solve";

    private static final Map<String, Command> TABLE = new TreeMap<>(Map.of(
            "check", CheckLine::prepare,
            "recover", RecoverLine::prepare,
            "response", ResponseLine::prepare,
            "solve", SolveLine::prepare));

    private Commands() {
    }

    static Optional<Command> byName(String name) {
        return Optional.ofNullable(TABLE.get(name));
    }

    /** The command names in alphabetical order. */
    static List<String> names() {
        return List.copyOf(TABLE.keySet());
    }
}
