package dev.rootform.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes an answer to standard output, or to a file atomically (a temporary file moved into place). */
final class Output {
    private Output() {
    }

    /** The answer with a final newline, to {@code output}, or to {@code out} when it is null. */
    static void write(PrintWriter out, Path output, String answer) throws IOException {
        String text = answer.endsWith("\n") ? answer : answer + System.lineSeparator();
        if (output == null) {
            out.print(text);
            out.flush();
            return;
        }
        Path target = output.toAbsolutePath();
        Path temp = Files.createTempFile(target.getParent(), ".rootform-", ".tmp");
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8);
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
