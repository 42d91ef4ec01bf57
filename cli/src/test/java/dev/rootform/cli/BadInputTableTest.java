package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * The bad-input table (bad-inputs.csv) run through {@link Main#execute} in-process: every row exits
 * with 2, one line on standard error naming the problem (optionally followed by the input line
 * and a caret line), nothing on standard output, no stack trace, and the output file that existed
 * before unchanged (contents and permissions). The wall time of each row is measured; the assertion
 * is only a generous guard against a hang (10 s), and the slowest row is printed.
 */
class BadInputTableTest {
    private static final Pattern REPEAT = Pattern.compile("<<(\\d+)\\*(.*?)>>");
    private static final String BEFORE = "an earlier answer that must survive\n";
    /** A guard against hangs only; the figures are printed, not asserted tightly. */
    private static final long HANG_GUARD_MILLIS = 10_000;
    private static long slowest;
    private static String slowestRow = "";

    @TempDir
    Path dir;

    @ParameterizedTest(name = "[{index}] {0} {1}")
    @CsvFileSource(resources = "bad-inputs.csv", delimiter = '|', nullValues = {}, maxCharsPerColumn = 200_000)
    void refusedWithOneLineAndNothingDamaged(String input, String options, String fragment) throws IOException {
        Path out = dir.resolve("answer.txt");
        Files.writeString(out, BEFORE, StandardCharsets.UTF_8);
        Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("rw-r-----"));
        List<String> args = new ArrayList<>(List.of("solve", expand(input == null ? "" : input)));
        Arrays.stream(options.trim().split("\\s+")).map(o -> o.equals("OUT") ? out.toString() : o).forEach(args::add);
        if (!args.contains("--time-limit")) {
            args.addAll(List.of("--time-limit", "20"));
        }

        long start = System.nanoTime();
        MainTest.Run r = MainTest.run(args.toArray(String[]::new));
        long millis = (System.nanoTime() - start) / 1_000_000;
        record(millis, input);

        String shown = shorten(input) + " " + options + "\n" + shorten(r.err());
        assertEquals(ExitCode.BAD_INPUT, r.code(), shown);
        assertEquals("", r.out(), shown);
        List<String> lines = r.err().lines().toList();
        assertTrue(lines.get(0).startsWith("rootform: "), shown);
        assertTrue(lines.get(0).contains(fragment), "expected '" + fragment + "' in " + shown);
        assertFalse(lines.get(0).contains("internal error"), shown);
        boolean caret = lines.size() == 3 && lines.get(2).strip().equals("^");
        boolean help = lines.size() == 2 && lines.get(1).equals("Try 'rootform --help'.");
        assertTrue(lines.size() == 1 || caret || help, "one line, or one line with the input and a caret: " + shown);
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), shown);
        assertEquals(BEFORE, Files.readString(out, StandardCharsets.UTF_8), shown);
        assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(out)), shown);
        try (var files = Files.list(dir)) {
            assertEquals(List.of(out), files.toList(), "no temporary file is left: " + shown);
        }
        assertTrue(millis < HANG_GUARD_MILLIS, "took " + millis + " ms: " + shown);
    }

    @AfterAll
    static void report() {
        System.out.println("BadInputTableTest: slowest row " + slowest + " ms: " + slowestRow);
    }

    private static synchronized void record(long millis, String input) {
        if (millis > slowest) {
            slowest = millis;
            slowestRow = shorten(input);
        }
    }

    /** The input with every {@code <<N*TEXT>>} replaced by TEXT repeated N times. */
    static String expand(String input) {
        Matcher m = REPEAT.matcher(input);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(sb, Matcher.quoteReplacement(m.group(2).repeat(Integer.parseInt(m.group(1)))));
        }
        m.appendTail(sb);
        return sb.toString();
    }

    private static String shorten(String s) {
        return s == null ? "" : s.length() <= 300 ? s : s.substring(0, 300) + "...";
    }
}
