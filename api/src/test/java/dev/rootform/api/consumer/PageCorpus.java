package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.DocumentOptions;
import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Report;
import dev.rootform.export.document.ParametricReport;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

/**
 * The problems whose pages the real consumers load: each kind of answer that stresses a layout
 * (scenarios of our own).
 */
final class PageCorpus {
    /** One problem, with a file-safe name and the points to mark. */
    record Case(String name, String problem, List<String> points) {
        @Override
        public String toString() {
            return name;
        }
    }

    /** An irreducible cubic: the answer is a sum over its three roots. */
    static final Case CUBIC = new Case("cubic-root-sum", "x[n+3] = x[n+1] + x[n]; x[0] = 1; x[1] = 1; x[2] = 1", List.of("10"));
    /** A drive at the natural frequency: the answer grows like t·cos(2t). */
    static final Case RESONANCE = new Case("forced-resonance", "y'' + 4y = sin(2t); y(0) = 0; y'(0) = 1", List.of("1", "5"));
    /** Conditions at two points: constants fixed numerically. */
    static final Case BOUNDARY = new Case("boundary-values", "y'' + y = 0; y(0) = 1; y(1) = 2", List.of("0.5"));
    /** A drive at a frequency qπ: the trial form's constants P1, P2 are fixed numerically. */
    static final Case TRIAL = new Case("trial-form", "y'' + 3y' + 2y = cos(pi t); y(0) = 0; y'(0) = 0", List.of());
    /** A sixth-order digital filter driven by a sampled cosine: long coefficients and a long sum. */
    static final Case FILTER = new Case("long-filter", "x[n+6] = 1/2 x[n+5] - 1/3 x[n+4] + 1/5 x[n+3] - 1/7 x[n+2] + 1/11 x[n+1]"
            + " - 1/13 x[n] + cos(pi n/3); x[0] = 1; x[1] = 0; x[2] = 0; x[3] = 0; x[4] = 0; x[5] = 0", List.of("8"));
    /** A damped oscillator driven below its natural frequency: transient and steady parts, a frequency response. */
    static final Case UNDERDAMPED = new Case("forced-underdamped", "y'' + 2y' + 10y = 3 sin(2t); y(0) = 1; y'(0) = 0",
            List.of("1", "2.5"));
    /** An unstable equation: a log axis. */
    static final Case GROWTH = new Case("growth", "y'' - y' - 2y = 0; y(0) = 1; y'(0) = 0", List.of());

    /** A problem with parameters, with a file-safe name (scenarios of our own). */
    record Parametric(String name, String problem, String parameters, String where) {
        @Override
        public String toString() {
            return name;
        }
    }

    private static final Map<String, Report> SOLVED = new ConcurrentHashMap<>();

    /**
     * The answers with parameters that stress a layout: a damped oscillator driven at a frequency w
     * (long coefficients over Q(m, c, k, F, w), three damping cases), a recurrence with one parameter
     * split into three cases, and an order-5 equation whose roots have no closed form (only its long
     * Routh–Hurwitz conditions are written).
     */
    static Stream<Parametric> parametricDocuments() {
        return Stream.of(
                new Parametric("params-forced-oscillator", "m y'' + c y' + k y = F cos(w t); y(0) = 0; y'(0) = 0", "m, c, k, F, w",
                        "m > 0, c >= 0, k > 0, w > 0"),
                new Parametric("params-recurrence-cases", "x[n+2] = a x[n+1] - x[n] + 1; x[0] = 0; x[1] = 1", "a", ""),
                new Parametric("params-order-5-stability", "y^(5) + a y'''' + b y''' + c y'' + d y' + f y = 0", "a, b, c, d, f", ""));
    }

    /** The answer of a problem with parameters, verified. */
    static ParametricReport report(Parametric p) {
        ParametricResult r = Rootform.solveWithParameters(ParametricRequest.of(p.problem(), p.parameters()).where(p.where()));
        assertTrue(r instanceof ParametricResult.Solved s && s.report().verified(), p.name() + ": " + r);
        return ((ParametricResult.Solved) r).report();
    }

    private PageCorpus() {
    }

    /** The cases the issue names, plus the forced underdamped one of the README picture. */
    static Stream<Case> documents() {
        return Stream.of(CUBIC, RESONANCE, BOUNDARY, TRIAL, FILTER, UNDERDAMPED);
    }

    /** Every case, also one that grows (a log axis). */
    static Stream<Case> pages() {
        return Stream.concat(documents(), Stream.of(GROWTH));
    }

    /** The verified report of a case, solved once with plot data. */
    static Report report(Case c) {
        return SOLVED.computeIfAbsent(c.name(), name -> {
            Result r = Rootform.solve(SolveRequest.of(c.problem()).with(Options.builder().points(c.points()).plots(true).build()));
            assertTrue(r instanceof Result.Solved, c.name() + ": " + r);
            return ((Result.Solved) r).report();
        });
    }

    /** The case in a format, laid out as {@code options} say. */
    static String render(Case c, String format, DocumentOptions options) {
        return Exporters.byName(format, options).orElseThrow().render(report(c), CodeNames.defaults()).text();
    }
}
