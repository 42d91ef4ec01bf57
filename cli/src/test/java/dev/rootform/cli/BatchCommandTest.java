package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code rootform batch} end to end: files, threads, resume, progress and exit codes. */
class BatchCommandTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final String FIBONACCI = "{\"id\": \"fib\", \"problem\": \"x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1\", \"valuesAt\": [\"30\"]}";
    private static final String DOUBLING = "{\"id\": \"dbl\", \"problem\": \"x[n+1] = 2x[n]; x[0] = 1\", \"valuesAt\": [\"10\"]}";
    private static final String SLOW = "{\"id\": \"slow\", \"problem\": \"x[n+200] = x[n+3] + x[n+1] + x[n]\", \"timeLimit\": 0.5}";

    @TempDir
    Path dir;

    private Path input(String... lines) throws Exception {
        Path in = dir.resolve("in.jsonl");
        Files.writeString(in, String.join("\n", lines) + "\n", StandardCharsets.UTF_8);
        return in;
    }

    /** The answers of OUT by id. */
    private static Map<String, JsonNode> answers(Path out) throws Exception {
        Map<String, JsonNode> byId = new TreeMap<>();
        for (String line : Files.readAllLines(out)) {
            JsonNode node = MAPPER.readTree(line);
            assertEquals(null, byId.put(node.get("id").asText(), node), "one answer per id: " + line);
        }
        return byId;
    }

    @Test
    void everyLineIsAnsweredWhateverGoesWrongOnOthers() throws Exception {
        Path in = input(FIBONACCI, "", "{\"id\": \"bad\", \"problem\": \"y'' + (2y' = 0\"}", "not json at all", SLOW, DOUBLING);
        Path out = dir.resolve("out.jsonl");
        MainTest.Run r = MainTest.run("batch", in.toString(), "-o", out.toString(), "--jobs", "2");
        assertEquals(0, r.code(), r.err());
        Map<String, JsonNode> answers = answers(out);
        assertEquals(List.of("4", "bad", "dbl", "fib", "slow"), new ArrayList<>(answers.keySet()));
        // F(30) = 832040 (OEIS A000045, from memory); 2^10 = 1024 (common practice)
        assertEquals("832040", answers.get("fib").get("values").get(0).get("exact").asText());
        assertEquals("1024", answers.get("dbl").get("values").get(0).get("exact").asText());
        assertEquals(0, answers.get("fib").get("exit").asInt());
        assertEquals(2, answers.get("bad").get("exit").asInt());
        assertTrue(answers.get("4").get("error").asText().startsWith("line 4 is not JSON"), answers.get("4").toString());
        assertEquals(1, answers.get("slow").get("exit").asInt());
        assertTrue(r.err().contains("batch: 5 lines answered in "), r.err());
        assertTrue(r.err().contains("2 solved, 2 refused, 1 failed; 0 skipped"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void withoutOutTheAnswersGoToStandardOutput() throws Exception {
        MainTest.Run r = MainTest.run("batch", input(DOUBLING).toString(), "--jobs", "1");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("{\"id\":\"dbl\",\"exit\":0,"), r.out());
        assertEquals(1, r.out().lines().count());
    }

    @Test
    void resumeKeepsTheAnswersAndDropsATornLastLine() throws Exception {
        Path in = input(FIBONACCI, DOUBLING, "{\"id\": \"sq\", \"problem\": \"x[n+1] = 3x[n]; x[0] = 1\", \"valuesAt\": \"4\"}");
        Path out = dir.resolve("out.jsonl");
        String kept = "{\"id\":\"fib\",\"exit\":0,\"note\":\"written by the run before\"}";
        Files.writeString(out, kept + "\n{\"id\":\"dbl\",\"exit\":0,\"values\":[{\"at\":\"1", StandardCharsets.UTF_8);
        MainTest.Run r = MainTest.run("batch", in.toString(), "-o", out.toString(), "--resume");
        assertEquals(0, r.code(), r.err());
        List<String> lines = Files.readAllLines(out);
        assertEquals(kept, lines.get(0));
        Map<String, JsonNode> answers = answers(out);
        assertEquals(List.of("dbl", "fib", "sq"), new ArrayList<>(answers.keySet()));
        // 3^4 = 81 (common practice)
        assertEquals("81", answers.get("sq").get("values").get(0).get("exact").asText());
        assertTrue(r.err().contains("batch: 2 lines answered"), r.err());
        assertTrue(r.err().contains("1 skipped (answered before)"), r.err());
    }

    @Test
    void parametricLinesAreAnsweredAsSolveWithParamsAndABadOneUnderItsLineNumber() throws Exception {
        // a savings plan x[n+1] = (1 + r) x[n] + d (scenario of our own); with r = 0 the balance is d·n (common practice)
        String plan = "{\"id\": \"plan\", \"problem\": \"x[n+1] = (1 + r) x[n] + d; x[0] = 0\", \"params\": \"r, d\","
                + " \"where\": \"r >= 0\", \"at\": \"r=0, d=50\", \"valuesAt\": [\"12\"]}";
        String tex = "{\"id\": \"tex\", \"problem\": \"x[n+1] = (1 + r) x[n] + d; x[0] = 0\", \"params\": \"r, d\", \"format\": \"latex\"}";
        String bad = "{\"problem\": \"x[n+1] = (1 + r) x[n] + q; x[0] = 0\", \"params\": \"r, d\"}";
        Path out = dir.resolve("out.jsonl");
        MainTest.Run r = MainTest.run("batch", input(plan, tex, bad).toString(), "-o", out.toString(), "--jobs", "2");
        assertEquals(0, r.code(), r.err());
        Map<String, JsonNode> answers = answers(out);
        assertEquals(List.of("3", "plan", "tex"), new ArrayList<>(answers.keySet()));
        JsonNode p = answers.get("plan");
        assertEquals(0, p.get("exit").asInt(), p.toString());
        assertTrue(p.get("verified").asBoolean(), p.toString());
        assertEquals(List.of("r", "d"), List.of(p.get("parameters").get(0).asText(), p.get("parameters").get(1).asText()));
        assertEquals("600", p.get("values").get(0).get("exact").asText(), p.toString());
        assertTrue(answers.get("tex").get("text").asText().contains("\\begin{cases}"), answers.get("tex").toString());
        assertEquals(2, answers.get("3").get("exit").asInt());
        assertTrue(answers.get("3").get("error").asText().contains("undeclared parameter 'q'"), answers.get("3").toString());
        assertTrue(r.err().contains("2 solved, 1 refused, 0 failed"), r.err());
    }

    @Test
    void withoutResumeOutIsWrittenAfresh() throws Exception {
        Path out = dir.resolve("out.jsonl");
        Files.writeString(out, "{\"id\":\"old\",\"exit\":0}\n");
        MainTest.Run r = MainTest.run("batch", input(DOUBLING).toString(), "-o", out.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals(List.of("dbl"), new ArrayList<>(answers(out).keySet()));
    }

    @Test
    void aBadCommandLineExitsWithTwo() throws Exception {
        Path in = input(DOUBLING);
        assertEquals(2, MainTest.run("batch", dir.resolve("missing.jsonl").toString()).code());
        assertEquals(2, MainTest.run("batch", in.toString(), "--resume").code());
        assertEquals(2, MainTest.run("batch", in.toString(), "--jobs", "0").code());
        assertEquals(2, MainTest.run("batch", in.toString(), "--time-limit", "0").code());
        MainTest.Run same = MainTest.run("batch", in.toString(), "-o", in.toString());
        assertEquals(2, same.code());
        assertEquals("rootform: OUT must not be IN", same.err().strip());
    }

    @Test
    void anOutThatIsNotAFileIsRefusedBeforeAnyWork() throws Exception {
        // a directory, device or FIFO as OUT is bad input (exit 2), checked as every command's output file is
        MainTest.Run r = MainTest.run("batch", input(DOUBLING).toString(), "-o", dir.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("rootform: -o " + dir + " is a directory"), r.err());
    }

    @Test
    void withoutATerminalProgressComesAsPlainLines() throws Exception {
        StringWriter text = new StringWriter();
        BatchTally tally = new BatchTally();
        tally.skip();
        try (BatchProgress.Lines lines = new BatchProgress.Lines(new PrintWriter(text, true), 4, tally, Duration.ofMillis(20))) {
            long deadline = System.nanoTime() + Duration.ofSeconds(10).toNanos();
            while (text.toString().isEmpty() && System.nanoTime() < deadline) {
                Thread.sleep(10);
            }
        }
        assertTrue(text.toString().startsWith("batch: 1/4 lines (25 %), "), text.toString());
        assertTrue(text.toString().contains("0 solved, 0 refused, 0 failed"), text.toString());
    }
}
