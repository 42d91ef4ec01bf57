package dev.rootform.api;

import dev.rootform.export.document.ClaimReport;
import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of a claim check: the claim holds, it fails (explained), or it could not be checked
 * because the problem or the claim was refused, the conditions have no unique solution, or the time
 * ran out — the {@link Result} that says so.
 *
 * <pre>{@code
 * CheckResult r = Rootform.check(CheckRequest.of("x[n+1] = 2x[n] + 1; x[0] = 1", "2^(n+2) - 1"));
 * if (r instanceof CheckResult.Fails f) {
 *     f.checked().slips().forEach(slip -> System.out.println(slip.explanation()));
 * }
 * }</pre>
 *
 * @since 0.3
 */
public sealed interface CheckResult permits CheckResult.Holds, CheckResult.Fails, CheckResult.Unchecked {

    /** The check's report, when the claim was checked. */
    default Optional<ClaimReport> report() {
        return Optional.empty();
    }

    /** The claim is the solution (exactly, or to the stated digits when the report says numeric). */
    record Holds(ClaimReport checked) implements CheckResult {
        public Holds {
            Objects.requireNonNull(checked, "checked");
        }

        @Override
        public Optional<ClaimReport> report() {
            return Optional.of(checked);
        }
    }

    /** The claim is not the solution; the report explains where and why. */
    record Fails(ClaimReport checked) implements CheckResult {
        public Fails {
            Objects.requireNonNull(checked, "checked");
        }

        @Override
        public Optional<ClaimReport> report() {
            return Optional.of(checked);
        }
    }

    /**
     * The claim was not checked: {@code reason} is a {@link Result} without a checked claim —
     * {@link Result.Refused} (bad problem or claim, with its position), {@link Result.Contradictory},
     * {@link Result.Underdetermined}, {@link Result.CheckFailed} (the solver's own answer did not
     * verify) or {@link Result.OutOfTime}.
     */
    record Unchecked(Result reason) implements CheckResult {
        public Unchecked {
            Objects.requireNonNull(reason, "reason");
        }
    }
}
