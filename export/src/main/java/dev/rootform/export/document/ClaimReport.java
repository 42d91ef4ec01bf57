package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Mismatch;
import dev.rootform.symbolic.claim.Slip;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything the answer to a claim check shows; renderers only format it.
 *
 * @param solution the correct solution, as solve answers it
 * @param claim the claim as typed
 * @param reading the claim's formula as read, with every grouping explicit
 * @param asRead the claim in the tool's closed form, when it has one
 * @param holds the verdict
 * @param exact true when the verdict and every part were decided exactly
 * @param digits significant digits of the numeric parts
 * @param equation whether the claim satisfies the equation, and the residual if not
 * @param conditions each condition, claimed against required
 * @param mismatch the first index where claim and solution differ (sequence) or the largest
 *     difference on the grid (function)
 * @param slips named mistakes whose correction checks
 * @param notes what was numeric and why, and the sample points
 * @since 0.3
 */
public record ClaimReport(Report solution, String claim, String reading, Optional<ClosedForm> asRead, boolean holds,
        boolean exact, int digits, EquationFinding equation, List<ConditionFinding> conditions, Optional<Mismatch> mismatch,
        List<Slip> slips, List<String> notes) {
    public ClaimReport {
        Objects.requireNonNull(solution, "solution");
        Objects.requireNonNull(claim, "claim");
        Objects.requireNonNull(reading, "reading");
        Objects.requireNonNull(asRead, "asRead");
        Objects.requireNonNull(equation, "equation");
        conditions = List.copyOf(conditions);
        Objects.requireNonNull(mismatch, "mismatch");
        slips = List.copyOf(slips);
        notes = List.copyOf(notes);
    }

    /** True for a sequence (difference equation), false for a function. */
    public boolean sequence() {
        return problem().domain() == Domain.DIFFERENCE;
    }

    /** The equation the claim is about. */
    public LinearEquation problem() {
        return solution.solution().problem().equation();
    }
}
