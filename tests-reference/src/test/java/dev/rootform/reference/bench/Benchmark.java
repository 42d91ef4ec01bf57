package dev.rootform.reference.bench;

import dev.rootform.reference.Answers;
import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomProblems;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The benchmark: warm per-problem time of the whole job over generated problems, cold time of the
 * packaged command, scaling with the order, and Symja's built-in RSolve/DSolve on the same
 * problems. Not part of the test run; started by the {@code bench} profile of tests-reference
 * (command in README "Performance"). Problems come from {@link RandomProblems} with fixed seeds.
 */
public final class Benchmark {
    private static final long SEED = 1_000L;
    private static final int WARM_UP = 150;
    private static final int PROBLEMS = Integer.getInteger("bench.problems", 1000);
    private static final int SIDE_BY_SIDE = Integer.getInteger("bench.symja", 200);
    private static final int[] ORDERS = {2, 4, 8, 16, 32, 64};
    private static final int PER_ORDER = 3;
    private static final List<Rational> INDICES = List.of(Rational.of(16), Rational.of(30));
    private static final List<Rational> TIMES = List.of(Rational.of(1, 2), Rational.of(3, 2));

    private Benchmark() {
    }

    public static void main(String[] args) throws Exception {
        System.out.printf("rootform benchmark — Java %s, %d CPUs%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors());
        warm();
        RecoverBenchmark.run();
        AccuracyBenchmark.run();
        ParametricBenchmark.run();
        cold(Path.of(args.length > 0 ? args[0] : "../rootform"));
        scaling();
        CheckBenchmark.run();
        sideBySide();
    }

    private static void warm() {
        RandomProblems warmUp = new RandomProblems(SEED - 1, Forcing.MIXED);
        for (int i = 0; i < WARM_UP; i++) {
            solve(warmUp.next(12));
        }
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        Timings timings = new Timings();
        int verified = 0;
        for (int i = 0; i < PROBLEMS; i++) {
            GeneratedProblem g = corpus.next(12);
            long start = System.nanoTime();
            boolean ok = solve(g).verified();
            timings.add(System.nanoTime() - start);
            verified += ok ? 1 : 0;
        }
        System.out.printf("warm, whole pipeline, %d problems (orders 1-12, seed %d, after %d warm-up): "
                + "median %.1f ms, p99 %.1f ms, max %.1f ms; verified %d/%d%n", PROBLEMS, SEED, WARM_UP,
                timings.medianMillis(), timings.quantileMillis(0.99), timings.quantileMillis(1), verified, PROBLEMS);
    }

    private static void cold(Path launcher) throws Exception {
        String input = "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0";
        Timings t = new ColdStart(launcher).measure(5, "solve", input, "--values-at", "1,2");
        System.out.printf("cold, ./rootform solve \"%s\" --values-at 1,2: median of 5 processes %.0f ms (min %.0f, max %.0f)%n",
                input, t.medianMillis(), t.quantileMillis(0), t.quantileMillis(1));
    }

    private static void scaling() {
        for (Domain domain : Domain.values()) {
            RandomProblems corpus = new RandomProblems(SEED + domain.ordinal() + 1, Forcing.NONE);
            StringBuilder line = new StringBuilder("scaling, " + domain + " (median of " + PER_ORDER + " problems):");
            for (int k : ORDERS) {
                Timings t = new Timings();
                int verified = 0;
                for (int i = 0; i < PER_ORDER; i++) {
                    GeneratedProblem g = corpus.next(domain, k);
                    long start = System.nanoTime();
                    verified += solve(g).verified() ? 1 : 0;
                    t.add(System.nanoTime() - start);
                }
                line.append(String.format(" k=%d %.0f ms (%d/%d verified);", k, t.medianMillis(), verified, PER_ORDER));
            }
            System.out.println(line);
        }
    }

    private static void sideBySide() {
        SymjaBaseline symja = SymjaBaseline.start();
        RandomProblems corpus = new RandomProblems(SEED + 10, Forcing.MIXED);
        int[] solved = new int[2];
        Map<Domain, Map<SymjaBaseline.Outcome, Integer>> outcomes = new EnumMap<>(Domain.class);
        int[] total = new int[2];
        int[] firstOrder = new int[2];
        List<Double> ratios = new ArrayList<>();
        for (int i = 0; i < SIDE_BY_SIDE; i++) {
            GeneratedProblem g = corpus.next(i % 4 == 0 ? 1 : 12);
            int d = g.problem().equation().domain().ordinal();
            total[d]++;
            firstOrder[d] += g.order() == 1 ? 1 : 0;
            long start = System.nanoTime();
            Report report = solve(g);
            long ours = System.nanoTime() - start;
            solved[d] += report.verified() ? 1 : 0;
            double[] reference = report.values().stream().mapToDouble(v -> v.value().doubleValue()).toArray();
            start = System.nanoTime();
            SymjaBaseline.Outcome outcome = symja.check(g.problem(), points(g), reference);
            long symjaTime = System.nanoTime() - start;
            outcomes.computeIfAbsent(g.problem().equation().domain(), x -> new EnumMap<>(SymjaBaseline.Outcome.class))
                    .merge(outcome, 1, Integer::sum);
            if (outcome == SymjaBaseline.Outcome.SOLVED && report.verified()) {
                ratios.add((double) symjaTime / ours);
            }
        }
        for (Domain domain : Domain.values()) {
            int d = domain.ordinal();
            System.out.printf("side by side, %s (%d problems, %d of order 1; seed %d): rootform verified %d, Symja %s %s%n",
                    domain, total[d], firstOrder[d], SEED + 10, solved[d], domain == Domain.DIFFERENCE ? "RSolve" : "DSolve",
                    outcomes.getOrDefault(domain, Map.of()));
        }
        ratios.sort(Double::compare);
        System.out.printf("side by side, time Symja / rootform on the %d problems both solve: %s%n", ratios.size(),
                ratios.isEmpty() ? "n/a" : String.format("median %.2f (min %.2f, max %.2f)",
                        ratios.get(ratios.size() / 2), ratios.get(0), ratios.get(ratios.size() - 1)));
    }

    private static Report solve(GeneratedProblem g) {
        return Answers.report(g.text(), 20, points(g));
    }

    /** Two indices past every condition (sequences) or two times (functions) to evaluate at. */
    private static List<Rational> points(GeneratedProblem g) {
        return g.problem().equation().domain() == Domain.DIFFERENCE ? INDICES : TIMES;
    }
}
