package dev.rootform.numeric.analysis;

import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.plot.Plots;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The numeric side of one answer: root values, values at requested points, numeric cross-checks,
 * the values of the free constants that are fixed numerically (by name, in order),
 * steady-state responses to sinusoidal inputs (stable systems only), diagnostics and warnings (the
 * diagnostics' warnings), plot data when asked for, and each conjugate sum of the closed form
 * written mode by mode in decimals (for the numeric presentation).
 *
 * @param conjugateSumModes for each conjugate sum with exact coefficients, in the order of the closed
 *     form's terms, its real modes and cos/sin pairs in decimals
 * @since 0.1
 */
public record Analysis(List<RootApproximation> roots, List<PointValue> values, List<Check> checks,
        Map<String, BigDecimal> constantValues, List<SteadyState> steadyStates, Optional<Diagnostics> diagnostics, List<String> warnings,
        Optional<Plots> plots, List<List<DecimalMode>> conjugateSumModes) {
    public Analysis {
        roots = List.copyOf(roots);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
        constantValues = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(constantValues));
        steadyStates = List.copyOf(steadyStates);
        Objects.requireNonNull(diagnostics, "diagnostics");
        warnings = List.copyOf(warnings);
        Objects.requireNonNull(plots, "plots");
        conjugateSumModes = conjugateSumModes.stream().map(List::copyOf).toList();
    }

    /** An analysis without plot data or decimal modes of conjugate sums. */
    public Analysis(List<RootApproximation> roots, List<PointValue> values, List<Check> checks,
            Map<String, BigDecimal> constantValues, List<SteadyState> steadyStates, Optional<Diagnostics> diagnostics,
            List<String> warnings) {
        this(roots, values, checks, constantValues, steadyStates, diagnostics, warnings, Optional.empty(), List.of());
    }
}
