package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The demo prints, above each answer, the very command that prints that answer (same input, points, digits). */
class DemoCommandTest {
    @Test
    void eachPrintedCommandGivesTheAnswerShownBelowIt() {
        MainTest.Run demo = MainTest.run("demo");
        assertEquals(0, demo.code(), demo.err());
        for (DemoCommand.Example e : DemoCommand.EXAMPLES) {
            String command = DemoCommand.command(e);
            int at = demo.out().indexOf("   " + command + "\n\n");
            assertTrue(at >= 0, "the demo does not print " + command);
            MainTest.Run solve = MainTest.run(arguments(command));
            assertEquals(0, solve.code(), command + ": " + solve.err());
            int start = at + command.length() + 5;
            assertEquals(solve.out(), demo.out().substring(start, start + solve.out().length()), command);
        }
    }

    /** The words of a printed command after {@code rootform}, with its one quoted argument unquoted. */
    private static String[] arguments(String command) {
        List<String> words = new ArrayList<>();
        int open = command.indexOf('"');
        int close = command.indexOf('"', open + 1);
        words.add(command.substring("rootform ".length(), open).strip());
        words.add(command.substring(open + 1, close));
        for (String w : command.substring(close + 1).strip().split(" ")) {
            words.add(w);
        }
        return words.toArray(String[]::new);
    }
}
