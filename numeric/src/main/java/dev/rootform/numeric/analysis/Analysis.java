package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.solve.Check;
import java.util.List;

/**
 * The numeric side of one answer: root values, values at requested points, numeric cross-checks,
 * steady-state responses to sinusoidal inputs (stable systems only) and warnings.
 *
 * @since 0.1
 */
public record Analysis(List<RootApproximation> roots, List<PointValue> values, List<Check> checks,
        List<SteadyState> steadyStates, List<String> warnings) {
    public Analysis {
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
        steadyStates = List.copyOf(steadyStates);
        warnings = List.copyOf(warnings);
    }
}
