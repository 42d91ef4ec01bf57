package dev.rootform.export;

import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.analysis.RootApproximation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.util.List;
import java.util.Objects;

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
 * @since 0.1
 */
public record Report(Solution solution, List<RootApproximation> roots, List<PointValue> values,
        List<Check> numericChecks, List<String> warnings, int digits) {
    public Report {
        Objects.requireNonNull(solution, "solution");
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        numericChecks = List.copyOf(numericChecks);
        warnings = List.copyOf(warnings);
    }

    /** True when every exact and numeric check ran and held. */
    public boolean verified() {
        return solution.verified() && numericChecks.stream().allMatch(Check::passed);
    }
}
