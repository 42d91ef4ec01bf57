package dev.rootform.symbolic.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import dev.rootform.symbolic.testing.RootCase;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Seeded random problems of order 1 to 12 from {@link RandomProblems} (every {@link RootCase},
 * repeated up to multiplicity 5, random exact conditions): every answer must verify exactly, and
 * the generated text must read back as the same problem. The seed is printed on failure;
 * -Dtests.multiplier scales the count.
 */
class RandomCorpusPropertyTest {
    private static final long SEED = 20261201L;
    private static final int CASES = 120 * Integer.getInteger("tests.multiplier", 1);

    @Test
    void everyRandomProblemIsVerifiedExactly() {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        Set<RootCase> seen = EnumSet.noneOf(RootCase.class);
        int forced = 0;
        for (int i = 0; i < CASES; i++) {
            GeneratedProblem g = corpus.next(12);
            seen.addAll(g.cases());
            forced += g.problem().equation().isHomogeneous() ? 0 : 1;
            Solution s = Solver.solve(g.problem());
            for (Check c : s.checks()) {
                assertTrue(c.passed(), g.label() + ": " + c.name() + ": " + c.detail());
            }
            assertEquals(3, s.checks().size(), g.label());
        }
        assertEquals(EnumSet.allOf(RootCase.class), seen, "seed " + SEED + " must cover every root case");
        assertTrue(forced >= CASES / 5 && forced <= CASES / 2, "about a third forced, got " + forced + " of " + CASES);
    }

    @Test
    void generatedTextReadsBackAsTheSameProblem() {
        RandomProblems corpus = new RandomProblems(SEED + 1, Forcing.MIXED);
        for (int i = 0; i < CASES; i++) {
            GeneratedProblem g = corpus.next(12);
            Problem read = ProblemParser.parse(g.text(), List.of(), null);
            assertEquals(g.problem().conditions(), read.conditions(), g.label() + ": " + g.text());
            assertEquals(g.problem().equation().coefficients(), read.equation().coefficients(), g.label() + ": " + g.text());
        }
    }
}
