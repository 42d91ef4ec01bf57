package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.closedform.ClosedForm;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What the exact check found. Parts it could not decide exactly are {@link Decision#UNDECIDED};
 * the numeric check (numeric layer) decides them.
 *
 * @param verdict the claim holds, fails, or is left to the numeric check
 * @param inexact why the exact check stopped short, when it did
 * @param asRead the claim's formula brought to the tool's closed form, when it has one
 * @param equation whether the claim satisfies the equation
 * @param conditions each condition, claimed against required
 * @param firstMismatch for a sequence, the first index where claim and solution differ
 * @param slips named mistakes whose correction checks
 * @since 0.3
 */
public record ClaimFindings(Decision verdict, Optional<String> inexact, Optional<ClosedForm> asRead,
        EquationFinding equation, List<ConditionFinding> conditions, Optional<Mismatch> firstMismatch, List<Slip> slips) {
    public ClaimFindings {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(inexact, "inexact");
        Objects.requireNonNull(asRead, "asRead");
        Objects.requireNonNull(equation, "equation");
        conditions = List.copyOf(conditions);
        Objects.requireNonNull(firstMismatch, "firstMismatch");
        slips = List.copyOf(slips);
    }

    /** True when every part was decided exactly. */
    public boolean exact() {
        return inexact.isEmpty();
    }
}
