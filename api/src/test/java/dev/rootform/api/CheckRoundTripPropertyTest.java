package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ClaimReport;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Every answer of solve round-trips through check: seeded random problems of order 1 to 8 from
 * {@link RandomProblems} (all root kinds, forced and unforced) are solved, the solution lines of
 * solve's own text output are handed to check as the claim, and the claim must hold exactly. The
 * seed is printed on failure; -Dtests.multiplier scales the count.
 */
class CheckRoundTripPropertyTest {
    private static final long SEED = 20261210L;
    private static final int CASES = 60 * Integer.getInteger("tests.multiplier", 1);
    private static final int LABEL_WIDTH = 16;

    @Test
    void solveOutputChecksExactly() {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        int checked = 0;
        for (int i = 0; i < CASES; i++) {
            GeneratedProblem g = corpus.next(8);
            Result solved = Rootform.solve(SolveRequest.of(g.text()));
            if (!(solved instanceof Result.Solved s)) {
                continue;
            }
            String text = Exporters.byName("text").orElseThrow().render(s.report(), CodeNames.defaults()).text();
            String claim = solutionLines(text);
            CheckResult r = Rootform.check(CheckRequest.of(g.text(), claim));
            if (!(r instanceof CheckResult.Holds h)) {
                fail(g.label() + ": " + g.text() + "\nclaim " + claim + "\n" + r
                        + r.report().map(ClaimReport::toString).orElse(""));
                return;
            }
            assertTrue(h.checked().exact(), g.label() + ": not exact: " + h.checked().notes());
            checked++;
        }
        assertTrue(checked >= CASES * 3 / 4, "only " + checked + " of " + CASES + " solved (seed " + SEED + ")");
    }

    /** The claim as solve printed it: the formula line, its range and the values listed before it. */
    static String solutionLines(String text) {
        List<String> parts = new ArrayList<>();
        boolean inside = false;
        for (String line : text.split("\n")) {
            String label = line.length() > LABEL_WIDTH ? line.substring(0, LABEL_WIDTH).trim() : line.trim();
            if (!label.isEmpty()) {
                inside = label.equals("solution");
            }
            String body = line.length() > LABEL_WIDTH ? line.substring(LABEL_WIDTH) : "";
            if (inside && !body.contains("part:")) {
                parts.add(body);
            }
        }
        assertInstanceOf(String.class, parts.get(0));
        return String.join("\n", parts);
    }
}
