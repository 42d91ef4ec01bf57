package dev.rootform.export;

import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.analysis.RootApproximation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything one answer shows: the exact solution, the numeric values of its roots, values at the
 * requested points, the numeric cross-checks and warnings. Renderers only format a report.
 *
 * @param solution the exact solution and its exact checks
 * @param roots numeric values of {@code solution.roots()}, in the same order
 * @param values values at the requested points, in request order
 * @param numericChecks independent numeric cross-checks (e.g. ODE integration)
 * @param warnings plain-language warnings
 * @param digits significant digits of the numeric parts
 * @param diagnostics stability, modes, sensitivity (empty when not computed)
 * @param numeric show constants and roots as decimals to {@code digits} instead of exact forms (a
 *     presentation choice; the solution stays exact)
 * @since 0.1
 */
public record Report(Solution solution, List<RootApproximation> roots, List<PointValue> values,
        List<Check> numericChecks, List<String> warnings, int digits, Optional<Diagnostics> diagnostics, boolean numeric) {
    public Report {
        Objects.requireNonNull(solution, "solution");
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        numericChecks = List.copyOf(numericChecks);
        warnings = List.copyOf(warnings);
        Objects.requireNonNull(diagnostics, "diagnostics");
    }

    /** A report without diagnostics, shown exactly. */
    public Report(Solution solution, List<RootApproximation> roots, List<PointValue> values,
            List<Check> numericChecks, List<String> warnings, int digits) {
        this(solution, roots, values, numericChecks, warnings, digits, Optional.empty(), false);
    }

    /** True when every exact and numeric check ran and held. */
    public boolean verified() {
        return solution.verified() && numericChecks.stream().allMatch(Check::passed);
    }
}
