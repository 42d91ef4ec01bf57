package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.export.CodeNames;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * Thread safety of the front door: the seeded random corpus ({@link RandomProblems}, orders 1–8,
 * every root case, a third of it forced) solved from {@value #THREADS} threads at once gives, case
 * by case, the same outcome and the same JSON rendering as a sequential run (the rendering holds
 * no time-dependent field). The concurrent run goes through the corpus in reverse order, so the
 * threads meet shared state (library caches such as apfloat's π) in another order than the
 * sequential run. The seed is in every message; -Dtests.multiplier scales the count.
 */
class ConcurrentSolveTest {
    private static final long SEED = 9_2026_12_02L;
    private static final int CASES = 16 * Integer.getInteger("tests.multiplier", 1);
    private static final int MAX_ORDER = 8;
    private static final int THREADS = 8;

    @Test
    void eightThreadsGetTheSequentialResults() throws Exception {
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        List<GeneratedProblem> problems = new ArrayList<>();
        for (int i = 0; i < CASES; i++) {
            problems.add(corpus.next(MAX_ORDER));
        }
        List<String> sequential = new ArrayList<>();
        for (GeneratedProblem p : problems) {
            sequential.add(outcome(p));
        }
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        try {
            CountDownLatch start = new CountDownLatch(1);
            List<Future<String>> concurrent = new ArrayList<>();
            for (int i = problems.size() - 1; i >= 0; i--) {
                GeneratedProblem p = problems.get(i);
                concurrent.add(0, pool.submit(() -> {
                    start.await();
                    return outcome(p);
                }));
            }
            start.countDown();
            for (int i = 0; i < problems.size(); i++) {
                assertEquals(sequential.get(i), concurrent.get(i).get(), problems.get(i).label());
            }
        } finally {
            pool.shutdownNow();
            pool.awaitTermination(1, TimeUnit.MINUTES);
        }
    }

    /** The kind of result and its JSON rendering (or its explanation when there is no answer). */
    private static String outcome(GeneratedProblem p) {
        boolean sequence = p.problem().equation().domain() == Domain.DIFFERENCE;
        Result r = Rootform.solve(SolveRequest.of(p.text()).with(Options.builder().digits(20)
                .points(sequence ? List.of("25") : List.of("3/2")).build()));
        return r.getClass().getSimpleName() + "\n" + r.answer()
                .map(report -> Exporters.byName("json").orElseThrow().render(report, CodeNames.defaults()).text())
                .orElse(r.toString());
    }
}
