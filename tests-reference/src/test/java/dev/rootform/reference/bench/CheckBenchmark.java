package dev.rootform.reference.bench;

import dev.rootform.api.CheckRequest;
import dev.rootform.api.CheckResult;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.document.ClaimText;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;

/**
 * The check benchmark: warm time of {@code Rootform.check} (solve included) for claims about
 * order-4 problems of both domains from {@link RandomProblems}: solve's own answer (the claim holds)
 * and the same answer with its first coefficient moved by 1/1000 (the claim fails; slips are
 * searched, and a function is measured on its grid). Run with the bench profile (README
 * "Performance") or on its own through {@link #main}.
 */
public final class CheckBenchmark {
    private static final long SEED = 4_000L;
    private static final int WARM_UP = 60;
    private static final int CLAIMS = Integer.getInteger("bench.claims", 200);
    private static final int ORDER = 4;

    private CheckBenchmark() {
    }

    public static void main(String[] args) {
        run();
    }

    static void run() {
        List<String[]> warmUp = claims(SEED - 1, WARM_UP);
        warmUp.forEach(c -> check(c[0], c[1]));
        warmUp.forEach(c -> check(c[0], c[2]));
        List<String[]> claims = claims(SEED, CLAIMS);
        Timings holding = new Timings();
        Timings failing = new Timings();
        int held = 0;
        int failed = 0;
        for (String[] c : claims) {
            long start = System.nanoTime();
            held += check(c[0], c[1]) instanceof CheckResult.Holds ? 1 : 0;
            holding.add(System.nanoTime() - start);
            start = System.nanoTime();
            failed += check(c[0], c[2]) instanceof CheckResult.Fails ? 1 : 0;
            failing.add(System.nanoTime() - start);
        }
        System.out.printf("check, order-%d claims (%d problems, both domains, seed %d, after %d warm-up): "
                + "claim holds median %.1f ms (p90 %.1f), %d/%d hold; claim fails median %.1f ms (p90 %.1f), %d/%d fail%n",
                ORDER, claims.size(), SEED, WARM_UP, holding.medianMillis(), holding.quantileMillis(0.9), held, claims.size(),
                failing.medianMillis(), failing.quantileMillis(0.9), failed, claims.size());
    }

    private static CheckResult check(String problem, String claim) {
        return Rootform.check(CheckRequest.of(problem, claim));
    }

    /** {problem, solve's answer as a claim, that answer with its first coefficient moved by 1/1000}. */
    private static List<String[]> claims(long seed, int count) {
        RandomProblems corpus = new RandomProblems(seed, Forcing.MIXED);
        List<String[]> claims = new ArrayList<>();
        int i = 0;
        while (claims.size() < count) {
            GeneratedProblem g = corpus.next(i++ % 2 == 0 ? Domain.DIFFERENCE : Domain.DIFFERENTIAL, ORDER);
            if (Rootform.solve(SolveRequest.of(g.text())) instanceof Result.Solved s && !s.report().solution().closedForm().terms().isEmpty()) {
                ClosedForm f = s.report().solution().closedForm();
                claims.add(new String[] {g.text(), ClaimText.of(f), ClaimText.of(moved(f))});
            }
        }
        return claims;
    }

    private static ClosedForm moved(ClosedForm f) {
        List<Term> terms = new ArrayList<>(f.terms());
        List<Coefficient> cs = new ArrayList<>(terms.get(0).coefficients());
        Surd v = ((Coefficient.Exact) cs.get(0)).value();
        Rational nudge = Rational.of(1, 1000);
        cs.set(0, new Coefficient.Exact(v.isRational() ? Surd.of(v.rational().add(nudge))
                : Surd.of(v.rational().add(nudge), v.coefficient(), Rational.of(v.radicand()))));
        terms.set(0, terms.get(0).withCoefficients(cs));
        return new ClosedForm(f.domain(), f.function(), f.variable(), f.origin(), f.validFrom(), f.leadingValues(), terms,
                f.freeConstants(), f.particularFrom());
    }
}
