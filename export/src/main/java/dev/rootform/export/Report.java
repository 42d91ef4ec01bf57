package dev.rootform.export;

import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.analysis.SteadyState;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything one answer shows: the exact solution with its exact checks, and the numeric analysis
 * (root values, values at the requested points, cross-checks, steady states, warnings). Renderers
 * only format a report.
 *
 * @param solution the exact solution and its exact checks
 * @param analysis the numeric side; its roots are in the order of {@code solution.roots()}
 * @param digits significant digits of the numeric parts
 * @param numeric show constants and roots as decimals to {@code digits} instead of exact forms (a
 *     presentation choice; the solution stays exact)
 * @param code the floating-point model that generated code evaluates, with its measured range and
 *     accuracy per C variant and the exact 64-bit term of an integer recurrence; present when it was
 *     asked for with the answer (a fitted solution only)
 * @since 0.1
 */
public record Report(Solution solution, Analysis analysis, int digits, boolean numeric, Optional<CodeModel> code) {
    public Report {
        Objects.requireNonNull(solution, "solution");
        Objects.requireNonNull(analysis, "analysis");
        Objects.requireNonNull(code, "code");
    }

    /** A report without a code model. */
    public Report(Solution solution, Analysis analysis, int digits, boolean numeric) {
        this(solution, analysis, digits, numeric, Optional.empty());
    }

    /** A report shown exactly, without a code model. */
    public Report(Solution solution, Analysis analysis, int digits) {
        this(solution, analysis, digits, false);
    }

    /** This report with its code model. */
    public Report withCode(CodeModel model) {
        return new Report(solution, analysis, digits, numeric, Optional.of(model));
    }

    public List<RootApproximation> roots() {
        return analysis.roots();
    }

    public List<PointValue> values() {
        return analysis.values();
    }

    public List<Check> numericChecks() {
        return analysis.checks();
    }

    public List<SteadyState> steadyStates() {
        return analysis.steadyStates();
    }

    /** Stability, modes, sensitivity; empty when not computed. */
    public Optional<Diagnostics> diagnostics() {
        return analysis.diagnostics();
    }

    /** The data of the report page's plots; empty unless it was asked for ({@code Options.plots}). */
    public Optional<Plots> plots() {
        return analysis.plots();
    }

    public List<String> warnings() {
        return analysis.warnings();
    }

    /**
     * True when every exact check held and no numeric check failed; a numeric cross-check that
     * could not run ({@link Check#ran()} false) is stated in the answer, never counted as passed.
     */
    public boolean verified() {
        return solution.verified() && numericChecks().stream().noneMatch(Check::failed);
    }
}
