package dev.rootform.export;

import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import java.util.Optional;

/** Equations for the exporter tests (of every export package), each solved by the exact solver. */
public final class Corpus {
    /**
     * Difference equations: real, surd, repeated, complex (root of unity and surd modulus), conjugate
     * sums, λ = 0, non-integer; forced (constant, resonant exponential, polynomial, oscillating, and
     * oscillating with values in Q(√2)).
     */
    public static final List<String> SEQUENCES = List.of(
            "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1",
            "x[n] = 3x[n-1] - 2x[n-2]; x[0] = 1; x[1] = 5",
            "x[n+2] = 4x[n+1] - 4x[n]; x[0] = 1; x[1] = 3",
            "x[n+2] = -x[n]; x[0] = 1; x[1] = 2",
            "x[n+2] = 2x[n+1] - 3x[n]; x[0] = 1; x[1] = 0",
            "x[n+3] = x[n+1] + x[n]; x[0] = 3; x[1] = 0; x[2] = 2",
            "x[n+5] = x[n+1] + x[n]; x[0] = 1; x[1] = 2; x[2] = 3; x[3] = 4; x[4] = 5",
            "x[n+3] = 2x[n+1]; x[0] = 1; x[1] = 2; x[2] = 3",
            "2x[n+1] = x[n]; x[-2] = 3",
            "x[n] = 2x[n-1] + 1; x[0] = 0",
            "x[n+1] = 2x[n] + 2^n; x[0] = 1",
            "x[n+2] - 2x[n+1] + x[n] = 1; x[0] = 0; x[1] = 0",
            "x[n+1] = x[n]/2 + cos(pi n/3) + 2; x[0] = 1",
            "x[n+1] = x[n]/2 + cos(pi n/4) + 2; x[0] = 1");
    /** Differential equations: complex, real, repeated, conjugate sum, shifted origin; forced (resonant and not). */
    public static final List<String> FUNCTIONS = List.of(
            "y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0",
            "y'' - y = 0; y(0) = 2; y'(0) = 1",
            "(D+1)^2 y = 0; y(0) = 1; y'(0) = 2",
            "y''' - y' - y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0",
            "y'' + 4y = 0; y(3/2) = 1; y'(3/2) = 0",
            "y'' + 4y = sin(2t); y(0) = 0; y'(0) = 0",
            "q'' + 3q' + 2q = 5 + t e^(-t); q(0) = 0; q'(0) = 0");

    private Corpus() {
    }

    /** Code reports already built, shared by the test classes of one run (reports are immutable). */
    private static final java.util.Map<String, Report> CODE_REPORTS = new java.util.concurrent.ConcurrentHashMap<>();

    /** {@link #report} with its generated-code model, as the API builds it for the code formats. */
    public static Report codeReport(String input) {
        return CODE_REPORTS.computeIfAbsent(input, i -> {
            Report r = report(i);
            return r.withCode(dev.rootform.export.code.CodeModels.of(r));
        });
    }

    public static Report report(String input) {
        return new Report(Solver.solve(ProblemParser.parse(input, List.of(), null)),
                new Analysis(List.of(), List.of(), List.of(), java.util.Map.of(), List.of(), Optional.empty(), List.of()), 20);
    }
}
