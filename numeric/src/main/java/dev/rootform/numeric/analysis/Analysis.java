package dev.rootform.numeric.analysis;

import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.symbolic.solve.Check;
import java.util.List;
import java.util.Objects;

/**
 * The numeric side of one answer: root values, values at requested points, numeric cross-checks,
 * diagnostics and warnings (the diagnostics' warnings).
 *
 * @since 0.1
 */
public record Analysis(List<RootApproximation> roots, List<PointValue> values, List<Check> checks, Diagnostics diagnostics,
        List<String> warnings) {
    public Analysis {
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
        Objects.requireNonNull(diagnostics, "diagnostics");
        warnings = List.copyOf(warnings);
    }
}
