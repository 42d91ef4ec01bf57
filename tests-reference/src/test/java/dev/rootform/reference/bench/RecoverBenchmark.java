package dev.rootform.reference.bench;

import dev.rootform.api.Options;
import dev.rootform.api.RecoverRequest;
import dev.rootform.api.Recovery;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.recover.RecoveredRecurrence;
import dev.rootform.symbolic.recover.Recoverer;
import dev.rootform.symbolic.recover.TermsReader;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Warm time of {@code rootform recover} on 40 exact terms of order-8 sequences: random recurrences
 * from {@link RandomProblems} (every root kind, fixed seed) whose terms come from exact iteration,
 * plus the integer sequence x[n+8] = x[n+7] + … + x[n] from seven zeros and a one. Two figures: the
 * recovery alone (read the terms, Berlekamp–Massey, iteration check) and the whole
 * {@link Rootform#recover} (recovery, then solve, verification and analysis of the recovered text).
 */
public final class RecoverBenchmark {
    private static final long SEED = 8_040L;
    private static final int ORDER = 8;
    private static final int TERMS = 40;
    private static final int SEQUENCES = 20;
    private static final int WARM_UP = 8;
    private static final int REPEATS = 5;
    private static final Options DIGITS = Options.builder().digits(20).build();

    private RecoverBenchmark() {
    }

    public static void main(String[] args) {
        run();
    }

    /** Prints the two medians. */
    static void run() {
        List<String> inputs = inputs();
        Timings recovery = new Timings();
        Timings whole = new Timings();
        Timings solve = new Timings();
        int verified = 0;
        for (int round = 0; round < WARM_UP + REPEATS; round++) {
            for (String terms : inputs) {
                long start = System.nanoTime();
                RecoveredRecurrence r = Recoverer.recover(TermsReader.read(terms), 0);
                long middle = System.nanoTime();
                Recovery full = Rootform.recover(RecoverRequest.of(terms).with(DIGITS));
                long end = System.nanoTime();
                Rootform.solve(SolveRequest.of(r.text()).with(DIGITS));
                long solved = System.nanoTime();
                if (round >= WARM_UP) {
                    recovery.add(middle - start);
                    whole.add(end - middle);
                    solve.add(solved - end);
                    boolean ok = r.order() == ORDER && full instanceof Recovery.Recovered rec && rec.result() instanceof Result.Solved;
                    verified += ok ? 1 : 0;
                }
            }
        }
        System.out.printf("recover, %d terms of %d order-%d sequences (seed %d, %d runs each after %d warm-up): "
                + "recovery median %.2f ms (max %.2f); whole Rootform.recover (recovery + solve + analysis, 20 digits) "
                + "median %.1f ms (p90 %.1f, max %.1f), of which Rootform.solve of the recovered text alone median %.1f ms; "
                + "order %d recovered and verified %d/%d%n",
                TERMS, inputs.size(), ORDER, SEED, REPEATS, WARM_UP, recovery.medianMillis(), recovery.quantileMillis(1),
                whole.medianMillis(), whole.quantileMillis(0.9), whole.quantileMillis(1), solve.medianMillis(), ORDER, verified,
                recovery.count());
    }

    /** The 40 terms of each benchmark sequence, as text. */
    private static List<String> inputs() {
        List<String> inputs = new ArrayList<>();
        RandomProblems corpus = new RandomProblems(SEED, Forcing.NONE);
        while (inputs.size() < SEQUENCES - 1) {
            GeneratedProblem g = corpus.next(Domain.DIFFERENCE, ORDER);
            if (g.problem().conditions().stream().allMatch(c -> c.value().isZero())) {
                continue;
            }
            List<Rational> start = g.problem().conditions().stream().map(Condition::value).toList();
            inputs.add(text(new RecoveredRecurrence(start, 0, g.characteristic().monic()).iterate(TERMS)));
        }
        List<Rational> octanacci = new ArrayList<>(List.of(Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.ZERO,
                Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.ONE));
        while (octanacci.size() < TERMS) {
            int n = octanacci.size();
            octanacci.add(octanacci.subList(n - ORDER, n).stream().reduce(Rational.ZERO, Rational::add));
        }
        inputs.add(text(octanacci));
        return inputs;
    }

    private static String text(List<Rational> terms) {
        return terms.stream().map(Rational::toString).collect(Collectors.joining(", "));
    }
}
