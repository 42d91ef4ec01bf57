package dev.rootform.symbolic.parse;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Problem;
import java.nio.charset.StandardCharsets;
import java.util.List;

/**
 * Coverage-guided fuzzing of the parser (Jazzer). The invariant: every text either parses to a
 * problem or is refused with an {@link InputException} whose message is one line and whose
 * position lies in the text (or is -1); any other exception is a bug. In every {@code mvn verify}
 * the inputs under {@code ParserFuzzTestInputs/parse} (the crash corpus, committed) run as
 * regression tests; {@code JAZZER_FUZZ=1} fuzzes (see the README, "Fuzzing").
 */
class ParserFuzzTest {
    @FuzzTest(maxDuration = "5m")
    void parse(byte[] data) {
        String text = new String(data, StandardCharsets.UTF_8);
        int newline = text.indexOf('\n');
        String equation = newline < 0 ? text : text.substring(0, newline);
        List<String> given = newline < 0 ? List.of() : List.of(text.substring(newline + 1));
        try {
            Problem problem = ProblemParser.parse(equation, given, null);
            assertNotNull(problem.equation());
        } catch (InputException e) {
            String source = e.source() == null ? "" : e.source();
            assertTrue(e.position() >= -1 && e.position() <= source.length(), () -> "position " + e.position() + " in " + source);
            assertTrue(e.getMessage() != null && !e.getMessage().isBlank() && !e.getMessage().contains("\n"), e::getMessage);
        }
    }
}
