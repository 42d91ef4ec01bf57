package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Mismatch;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What the numeric check found, every part to a stated number of digits: the residual at sample
 * points, the conditions, and the comparison with the solution's values (for a sequence the first
 * index that differs, for a function the largest difference on the grid).
 *
 * @param verdict holds or fails, numerically
 * @param digits the significant digits the comparisons were made to
 * @param equation the residual at the sample points
 * @param conditions each condition, evaluated numerically
 * @param mismatch the first differing index (sequence) or the largest difference on the grid (function)
 * @param samples where the claim was sampled, e.g. "n = 0..23" or "t = 0, 0.5, …, 10"
 * @since 0.3
 */
public record NumericFindings(Decision verdict, int digits, EquationFinding equation, List<ConditionFinding> conditions,
        Optional<Mismatch> mismatch, String samples) {
    public NumericFindings {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(equation, "equation");
        conditions = List.copyOf(conditions);
        Objects.requireNonNull(mismatch, "mismatch");
        Objects.requireNonNull(samples, "samples");
    }
}
