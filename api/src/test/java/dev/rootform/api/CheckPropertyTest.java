package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ClaimReport;
import dev.rootform.export.document.ClaimText;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Properties of check over seeded random problems of order 1 to 8 from {@link RandomProblems} (all
 * root kinds, forced and unforced): solve's own answers hold exactly (and so does the claim as the
 * check read it back), and the same answers with
 * one coefficient moved by 1/1000 fail exactly (no false "holds"). The seed is printed on failure;
 * -Dtests.multiplier scales the counts (10 gives the 500 perturbed answers of the issue).
 */
class CheckPropertyTest {
    private static final long SEED = 20261210L;
    private static final int MULTIPLIER = Integer.getInteger("tests.multiplier", 1);
    private static final int ROUND_TRIPS = 50 * MULTIPLIER;
    private static final int MUTATIONS = 50 * MULTIPLIER;
    private static final Rational NUDGE = Rational.of(1, 1000);
    private static final int LABEL_WIDTH = 16;

    @Test
    void solveOutputChecksExactly() {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        int checked = 0;
        for (int i = 0; i < ROUND_TRIPS; i++) {
            GeneratedProblem g = corpus.next(8);
            Result solved = Rootform.solve(SolveRequest.of(g.text()));
            if (!(solved instanceof Result.Solved s)) {
                continue;
            }
            String text = Exporters.byName("text").orElseThrow().render(s.report(), CodeNames.defaults()).text();
            String claim = solutionLines(text);
            CheckResult r = Rootform.check(CheckRequest.of(g.text(), claim));
            if (!(r instanceof CheckResult.Holds h)) {
                fail(g.label() + ": " + g.text() + "\nclaim " + claim + "\n" + r.report().map(ClaimReport::toString).orElse(r.toString()));
                return;
            }
            assertTrue(h.checked().exact(), g.label() + ": not exact: " + h.checked().notes());
            String readBack = h.checked().asRead().map(ClaimText::of).orElseThrow();
            assertInstanceOf(CheckResult.Holds.class, Rootform.check(CheckRequest.of(g.text(), readBack)),
                    g.label() + ": the claim as read, " + readBack);
            checked++;
        }
        assertTrue(checked >= ROUND_TRIPS * 3 / 4, "only " + checked + " of " + ROUND_TRIPS + " solved (seed " + SEED + ")");
    }

    @Test
    void answersWithOneCoefficientMovedFail() {
        RandomProblems corpus = new RandomProblems(SEED + 1, Forcing.MIXED);
        Random pick = new Random(SEED + 2);
        int failed = 0;
        while (failed < MUTATIONS) {
            GeneratedProblem g = corpus.next(8);
            if (!(Rootform.solve(SolveRequest.of(g.text())) instanceof Result.Solved s)
                    || s.report().solution().closedForm().terms().isEmpty()) {
                continue;
            }
            ClosedForm moved = nudged(s.report().solution().closedForm(), pick);
            String claim = ClaimText.of(moved);
            CheckResult r = Rootform.check(CheckRequest.of(g.text(), claim));
            if (!(r instanceof CheckResult.Fails f)) {
                fail(g.label() + ": " + g.text() + "\nclaim " + claim + " did not fail: " + r);
                return;
            }
            assertTrue(f.checked().exact(), g.label() + ": not exact: " + f.checked().notes());
            assertFalse(f.checked().holds(), g.label());
            failed++;
        }
    }

    /** The closed form with one coefficient (of a random term, a random one of its coefficients) plus 1/1000. */
    private static ClosedForm nudged(ClosedForm f, Random pick) {
        List<Term> terms = new ArrayList<>(f.terms());
        int t = pick.nextInt(terms.size());
        List<Coefficient> cs = new ArrayList<>(terms.get(t).coefficients());
        int c = pick.nextInt(cs.size());
        Surd v = ((Coefficient.Exact) cs.get(c)).value();
        Surd moved = v.isRational() ? Surd.of(v.rational().add(NUDGE))
                : Surd.of(v.rational().add(NUDGE), v.coefficient(), Rational.of(v.radicand()));
        cs.set(c, new Coefficient.Exact(moved));
        terms.set(t, terms.get(t).withCoefficients(cs));
        return new ClosedForm(f.domain(), f.function(), f.variable(), f.origin(), f.validFrom(), f.leadingValues(), terms,
                f.freeConstants(), f.particularFrom());
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
        return String.join("\n", parts);
    }
}
