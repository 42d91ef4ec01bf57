package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.solve.Check;
import java.util.List;

/**
 * The numeric side of one answer: root values, values at requested points, numeric cross-checks
 * and warnings.
 *
 * @since 0.1
 */
public record Analysis(List<RootApproximation> roots, List<PointValue> values, List<Check> checks, List<String> warnings) {
    public Analysis {
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
        warnings = List.copyOf(warnings);
    }
}
