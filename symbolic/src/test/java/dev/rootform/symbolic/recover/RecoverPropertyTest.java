package dev.rootform.symbolic.recover;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Random homogeneous recurrences of order 1 to 12 from {@link RandomProblems} (every root kind,
 * multiplicities up to 5, λ = 0 roots, decimals): 2r + 4 exact terms by rational iteration from the
 * random conditions, then recovery must give a recurrence of order at most r whose monic χ divides
 * the generator's (equal unless the random start happens to miss a mode), that reproduces every
 * term by iteration, is confirmed by at least 4 terms, and reads back through solve's parser as
 * the same equation and conditions. The seed is printed on failure; -Dtests.multiplier scales the count.
 */
class RecoverPropertyTest {
    private static final long SEED = 20261210L;
    private static final int CASES = 200 * Integer.getInteger("tests.multiplier", 1);

    @Test
    void randomRecurrencesAreRecoveredFromTwoRPlusFourTerms() {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.NONE);
        int equal = 0;
        for (int i = 0; i < CASES; i++) {
            GeneratedProblem g = corpus.next(Domain.DIFFERENCE, 1 + i % 12);
            int r = g.order();
            List<Rational> terms = iterate(g, 2 * r + 4);
            if (terms.stream().allMatch(Rational::isZero)) {
                continue;
            }
            int start = g.problem().conditions().get(0).at().toBigInteger().intValueExact();
            RecoveredRecurrence rec = Recoverer.recover(terms, start);
            RationalPolynomial chi = g.characteristic().monic();
            assertTrue(rec.order() <= r, g.label());
            assertTrue(chi.mod(rec.characteristic()).isZero(), g.label() + ": recovered " + rec.characteristic());
            assertEquals(terms, rec.iterate(terms.size()), g.label());
            assertTrue(rec.confirmingTerms() >= 4, g.label());
            equal += rec.characteristic().equals(chi) ? 1 : 0;
            var read = ProblemParser.parse(rec.text(), List.of(), null);
            assertEquals(rec.characteristic(), RationalPolynomial.of(read.equation().coefficients()).monic(),
                    g.label() + ": " + rec.text());
            for (int j = 0; j < rec.order(); j++) {
                Condition c = read.conditions().get(j);
                assertEquals(new Condition(0, Rational.of(rec.equationStart() + j), terms.get(j)), c, g.label() + ": " + rec.text());
            }
        }
        assertTrue(equal >= CASES * 9 / 10, "seed " + SEED + ": only " + equal + " of " + CASES + " recovered the generator's χ");
    }

    /** x[first] … x[first+count−1] by exact rational iteration from the k conditions. */
    private static List<Rational> iterate(GeneratedProblem g, int count) {
        LinearEquation eq = g.problem().equation();
        List<Rational> a = eq.coefficients();
        int k = eq.order();
        List<Rational> x = new ArrayList<>();
        g.problem().conditions().forEach(c -> x.add(c.value()));
        while (x.size() < count) {
            int m = x.size() - k;
            Rational sum = Rational.ZERO;
            for (int j = 0; j < k; j++) {
                sum = sum.subtract(a.get(j).multiply(x.get(m + j)));
            }
            x.add(sum.divide(a.get(k)));
        }
        return x;
    }
}
