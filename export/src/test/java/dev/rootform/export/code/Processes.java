package dev.rootform.export.code;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs the external tools of the generated-code tests (gcc, the cross compiler, the compiled checks). */
final class Processes {
    private Processes() {
    }

    /** Runs {@code command} in {@code dir}; its output (stdout and stderr), or an assertion failure with the output. */
    static String run(Path dir, List<String> command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "timeout: " + command);
        assertEquals(0, p.exitValue(), command + ": " + out);
        return out;
    }
}
