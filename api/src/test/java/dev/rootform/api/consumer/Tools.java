package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs the real consumers of the page formats: Debian's headless Chromium, pdflatex (TeX Live) and
 * poppler's tools. A missing tool fails the test with the package to install (.ci/run installs them);
 * nothing is skipped.
 */
final class Tools {
    static final Path OUT = Path.of("target", "consumer");
    private static final long TIMEOUT_SECONDS = 90;

    private Tools() {
    }

    /** The output of a finished command. */
    record Run(int exit, String out, String err) {
    }

    /** The Chromium executable, or a failure naming the Debian package. */
    static String chromium() {
        return find("chromium (Debian package 'chromium'; .ci/run installs it)", "chromium", "chromium-browser");
    }

    static String pdflatex() {
        return find("pdflatex (Debian packages 'texlive-latex-base texlive-latex-recommended'; .ci/run installs them)", "pdflatex");
    }

    static String poppler(String tool) {
        return find(tool + " (Debian package 'poppler-utils'; .ci/run installs it)", tool);
    }

    /** Headless Chromium with the given arguments, in the test profile under target, no network use. */
    static Run chromium(String... args) throws IOException, InterruptedException {
        Path profile = OUT.resolve("chromium-profile");
        List<String> command = new ArrayList<>(List.of(chromium(), "--headless", "--no-sandbox", "--disable-gpu",
                "--hide-scrollbars", "--no-first-run", "--disable-extensions", "--disable-background-networking",
                "--host-resolver-rules=MAP * ~NOTFOUND", "--user-data-dir=" + profile.toAbsolutePath()));
        command.addAll(List.of(args));
        return run(command, OUT);
    }

    static Run run(List<String> command, Path directory) throws IOException, InterruptedException {
        Files.createDirectories(directory);
        Path out = Files.createTempFile(OUT.toAbsolutePath(), "out", ".txt");
        Path err = Files.createTempFile(OUT.toAbsolutePath(), "err", ".txt");
        Process p = new ProcessBuilder(command).directory(directory.toFile()).redirectInput(ProcessBuilder.Redirect.from(
                new java.io.File("/dev/null"))).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail(String.join(" ", command) + " did not finish in " + TIMEOUT_SECONDS + " s");
        }
        Run run = new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
        Files.delete(out);
        Files.delete(err);
        return run;
    }

    private static String find(String what, String... names) {
        for (String dir : System.getenv().getOrDefault("PATH", "/usr/bin:/bin").split(java.io.File.pathSeparator)) {
            for (String name : names) {
                Path candidate = Path.of(dir, name);
                if (Files.isExecutable(candidate)) {
                    return candidate.toString();
                }
            }
        }
        fail("this test needs " + what + " on the PATH");
        throw new AssertionError();
    }

    static void writeString(Path file, String text) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
        assertTrue(Files.size(file) > 0, file.toString());
    }
}
