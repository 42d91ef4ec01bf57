package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Report;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.Optional;

/**
 * Coverage-guided fuzzing of the whole library call (Jazzer): {@link Rootform#solve} with a short
 * time limit, then every document format of the answer. The input's first line is the problem, an
 * optional second line the points for values, an optional third the digits. The invariant: every
 * input gives a {@link Result} (an exception is a bug), a refusal has a one-line message and a
 * position inside its source (or -1), and an answer renders in text, JSON, LaTeX and MathML. In
 * every {@code mvn verify} the committed inputs under {@code SolveFuzzTestInputs/solve} run as
 * regression tests; {@code JAZZER_FUZZ=1} fuzzes (see the README, "Fuzzing").
 */
class SolveFuzzTest {
    /** Short, so that fuzzing spends its time on many inputs; a job past it is {@link Result.OutOfTime}. */
    static final Duration LIMIT = Duration.ofSeconds(2);
    private static final List<String> DOCUMENTS = List.of("text", "json", "latex", "mathml");

    @FuzzTest(maxDuration = "10m")
    void solve(byte[] data) {
        String[] lines = new String(data, StandardCharsets.UTF_8).split("\n", 3);
        Options.Builder options = Options.builder().timeLimit(LIMIT);
        if (lines.length > 1) {
            options.points(List.of(lines[1].split(",", -1)));
        }
        if (lines.length > 2) {
            options.digits(1 + Math.floorMod(lines[2].strip().hashCode(), 60));
        }
        Result result = Rootform.solve(SolveRequest.of(lines[0]).with(options.build()));
        assertNotNull(result);
        if (result instanceof Result.Refused r) {
            assertTrue(r.position() >= -1 && r.position() <= r.source().length(), () -> r.position() + " in " + r.source());
            assertFalse(r.message().isBlank() || r.message().contains("\n"), r::message);
        }
        Optional<Report> answer = result.answer();
        if (answer.isPresent()) {
            for (String format : DOCUMENTS) {
                Exporter exporter = Exporters.byName(format).orElseThrow();
                if (exporter.refusal(answer.get()).isEmpty()) {
                    assertFalse(exporter.render(answer.get(), CodeNames.defaults()).text().isEmpty(), format);
                }
            }
        }
    }
}
