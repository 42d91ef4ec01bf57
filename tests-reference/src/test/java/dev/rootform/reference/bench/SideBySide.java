package dev.rootform.reference.bench;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.testing.Forcing;
import dev.rootform.symbolic.testing.GeneratedProblem;
import dev.rootform.symbolic.testing.RandomPolynomials;
import dev.rootform.symbolic.testing.RandomProblems;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The previous release and the current build side by side in one JVM on the same inputs, for the
 * figures of README "Performance" (issue "Speed toward the limits"): warm solves of the generated
 * 1,000-problem corpus, order-64 equations with mixed multiplicities, certified roots of a
 * degree-200 polynomial to 50 digits, and cold {@code solve} processes through each build's
 * launcher. Every measurement alternates the two builds (which one goes first alternates too), so
 * that the load of a shared machine falls on both alike; the ratios are the point, absolute times
 * vary with the load (±50 %). Not part of the test run.
 *
 * <p>Usage: {@code SideBySide <previous rootform.jar> <current rootform.jar>} (each
 * {@code cli/target/rootform.jar} of a packaged checkout, {@code lib/} beside it; the launcher
 * {@code rootform} of the checkout, when present, serves the cold figure), or through the
 * {@code bench} profile (README "Performance"). System properties:
 * {@code bench.problems} (default 1000), {@code bench.figures} (default {@code warm,order64,roots,cold}).
 */
public final class SideBySide {
    private static final long SEED = 1_000L;
    private static final int WARM_UP = 150;
    private static final int PROBLEMS = Integer.getInteger("bench.problems", 1000);
    private static final List<String> FIGURES = List.of(System.getProperty("bench.figures", "warm,order64,roots,cold").split(","));
    /** (D+1)^8 (D^2+2D+5)^6 (D^3−D−1)^4 (D^5−D−1)^4 (D^4+D+1)^3: order 64, multiplicities 3 to 8. */
    private static final long[][] FACTORS = {{1, 1}, {5, 2, 1}, {-1, -1, 0, 1}, {-1, -1, 0, 0, 0, 1}, {1, 1, 0, 0, 1}};
    private static final int[] MULTIPLICITIES = {8, 6, 4, 4, 3};
    private static final int ROOT_DEGREE = 200;
    private static final int ROOT_DIGITS = 50;
    private static final long ROOT_SEED = 7;
    private static final String COLD = "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0";

    private SideBySide() {
    }

    /** A timed task on one build. */
    private interface Task {
        boolean run(Release release, int index) throws Exception;
    }

    /**
     * @param args the previous and the current {@code rootform.jar}; or, as the {@code bench} profile
     *     passes it, the current checkout's launcher alone, with the previous jar in the system
     *     property {@code bench.previous}
     */
    public static void main(String[] args) throws Exception {
        Path before = Path.of(args.length > 1 ? args[0] : System.getProperty("bench.previous", ""));
        Path now = args.length > 1 ? Path.of(args[1]) : Path.of(args[0]).toAbsolutePath().resolveSibling("cli/target/rootform.jar");
        Release previous = new Release("previous", before);
        Release current = new Release("current", now);
        System.out.printf("rootform side by side — Java %s, %d CPUs; previous %s, current %s%n",
                System.getProperty("java.version"), Runtime.getRuntime().availableProcessors(), before, now);
        System.out.println("| figure | previous | current | previous / current |");
        System.out.println("|---|---|---|---|");
        if (FIGURES.contains("warm")) {
            warm(previous, current);
        }
        if (FIGURES.contains("order64")) {
            for (Domain domain : Domain.values()) {
                String text = order64(domain);
                Timings[] t = alternate(previous, current, 1, 3, (r, i) -> r.solve(text, 30, List.of()));
                row("order 64, mixed multiplicities, " + domain.name().toLowerCase() + " (median of 3)", t, 0.5);
            }
        }
        if (FIGURES.contains("roots")) {
            long[] p = randomPolynomial();
            Timings[] t = alternate(previous, current, 2, 5, (r, i) -> r.roots(p, ROOT_DIGITS) == ROOT_DEGREE);
            row("degree-200 roots certified to 50 digits (median of 5)", t, 0.5);
        }
        if (FIGURES.contains("cold")) {
            cold(previous, current);
        }
    }

    private static void warm(Release previous, Release current) throws Exception {
        RandomProblems warmUp = new RandomProblems(SEED - 1, Forcing.MIXED);
        for (int i = 0; i < WARM_UP; i++) {
            GeneratedProblem g = warmUp.next(12);
            previous.solve(g.text(), 20, points(g));
            current.solve(g.text(), 20, points(g));
        }
        RandomProblems corpus = new RandomProblems(SEED, Forcing.MIXED);
        List<GeneratedProblem> problems = new ArrayList<>();
        for (int i = 0; i < PROBLEMS; i++) {
            problems.add(corpus.next(12));
        }
        Timings[] t = alternate(previous, current, 0, PROBLEMS, (r, i) -> r.solve(problems.get(i).text(), 20, points(problems.get(i))));
        row(String.format("warm solve, %d problems (seed %d, orders 1-12), median", PROBLEMS, SEED), t, 0.5);
        row("warm solve, p99", t, 0.99);
    }

    private static void cold(Release previous, Release current) throws Exception {
        Optional<Path> a = previous.launcher();
        Optional<Path> b = current.launcher();
        if (a.isEmpty() || b.isEmpty()) {
            System.out.println("| cold solve | no launcher beside a jar | | |");
            return;
        }
        ColdStart[] starts = {new ColdStart(a.get()), new ColdStart(b.get())};
        String[] command = {"solve", COLD};
        starts[0].measure(0, command);
        starts[1].measure(0, command);
        Timings[] t = {new Timings(), new Timings()};
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 2; j++) {
                int which = (i + j) % 2;
                t[which].add(starts[which].time(command));
            }
        }
        row("cold `./rootform solve \"" + COLD + "\"` (median of 5 processes)", t, 0.5);
    }

    /**
     * Runs {@code task} on both builds {@code warmUps} times untimed, then {@code runs} times timed
     * (index 0, 1, …; negative for the warm-ups), the two builds alternating and taking turns at
     * going first.
     *
     * @throws IllegalStateException if a run does not succeed (e.g. an answer not verified)
     */
    private static Timings[] alternate(Release previous, Release current, int warmUps, int runs, Task task) throws Exception {
        Release[] both = {previous, current};
        Timings[] t = {new Timings(), new Timings()};
        for (int i = 0; i < warmUps + runs; i++) {
            for (int j = 0; j < 2; j++) {
                int which = (i + j) % 2;
                long start = System.nanoTime();
                boolean ok = task.run(both[which], i - warmUps);
                long elapsed = System.nanoTime() - start;
                if (!ok) {
                    throw new IllegalStateException(both[which].name() + ": run " + i + " did not succeed");
                }
                if (i >= warmUps) {
                    t[which].add(elapsed);
                }
            }
        }
        return t;
    }

    private static void row(String figure, Timings[] t, double q) {
        double a = t[0].quantileMillis(q);
        double b = t[1].quantileMillis(q);
        System.out.printf("| %s | %s | %s | %.2f× |%n", figure, millis(a), millis(b), a / b);
    }

    private static String millis(double ms) {
        return ms >= 1000 ? String.format("%.2f s", ms / 1000) : String.format("%.1f ms", ms);
    }

    private static List<String> points(GeneratedProblem g) {
        return g.problem().equation().domain() == Domain.DIFFERENCE ? List.of("16", "30") : List.of("1/2", "3/2");
    }

    /** The order-64 equation with the characteristic polynomial Π FACTORS^MULTIPLICITIES, all initial values 1. */
    static String order64(Domain domain) {
        RationalPolynomial chi = RationalPolynomial.ofIntegers(1);
        for (int i = 0; i < FACTORS.length; i++) {
            for (int m = 0; m < MULTIPLICITIES[i]; m++) {
                chi = chi.multiply(RationalPolynomial.ofIntegers(FACTORS[i]));
            }
        }
        StringBuilder text = new StringBuilder();
        for (int j = chi.degree(); j >= 0; j--) {
            Rational c = chi.coefficient(j);
            if (c.isZero()) {
                continue;
            }
            String sign = c.signum() < 0 ? "-" : "+";
            text.append(text.length() == 0 ? (c.signum() < 0 ? "-" : "") : " " + sign + " ");
            text.append(c.abs().isOne() ? "" : c.abs().toString()).append(unknown(domain, j));
        }
        text.append(" = 0");
        for (int j = 0; j < chi.degree(); j++) {
            text.append("; ").append(domain == Domain.DIFFERENCE ? "x[" + j + "]" : unknown(domain, j) + "(0)").append(" = 1");
        }
        return text.toString();
    }

    private static String unknown(Domain domain, int j) {
        if (domain == Domain.DIFFERENCE) {
            return j == 0 ? "x[n]" : "x[n+" + j + "]";
        }
        return j == 0 ? "y" : "y^(" + j + ")";
    }

    /** The seeded random polynomial of the numeric module's RootBenchmark. */
    private static long[] randomPolynomial() {
        return RandomPolynomials.integerCoefficients(ROOT_DEGREE, ROOT_SEED);
    }
}
