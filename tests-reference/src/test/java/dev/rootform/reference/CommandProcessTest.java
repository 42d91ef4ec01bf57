package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * The packaged command as a user runs it, in its own JVM: stdout carries only the answer, stderr
 * stays empty (no library log chatter), and the process ends as soon as the answer is out (no
 * leftover non-daemon threads). The 60 s limit only detects a hang; it is not a timing goal.
 */
class CommandProcessTest {
    private static final Path JAR = Path.of("..", "cli", "target", "rootform.jar");

    /** Exit code, stdout and stderr of one process. */
    record Result(int code, String out, String err) {
    }

    static Result launch(String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar", JAR.toString()));
        command.addAll(List.of(args));
        Path out = Files.createTempFile("rootform-out", ".txt");
        Path err = Files.createTempFile("rootform-err", ".txt");
        try {
            Process p = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            boolean ended = p.waitFor(60, TimeUnit.SECONDS);
            if (!ended) {
                p.destroyForcibly();
            }
            assertTrue(ended, "the process did not exit after printing its answer");
            return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
        } finally {
            Files.deleteIfExists(out);
            Files.deleteIfExists(err);
        }
    }

    @Test
    void solveExitsCleanlyWithOnlyTheAnswer() throws Exception {
        assertTrue(Files.exists(JAR), "package the cli module first: " + JAR.toAbsolutePath());
        Result r = launch("solve", "x[n+3] = x[n+1] + x[n]; x[0] = 3; x[1] = 0; x[2] = 2", "--values-at", "100");
        assertEquals(0, r.code(), r.err());
        assertEquals("", r.err());
        assertTrue(r.out().contains("verified"), r.out());
    }

    @Test
    void badInputExitsWithTwoAndOneMessage() throws Exception {
        Result r = launch("solve", "y'' + sin(y) = 0");
        assertEquals(2, r.code(), r.err());
        assertEquals("", r.out());
        assertTrue(r.err().startsWith("rootform: "), r.err());
    }
}
