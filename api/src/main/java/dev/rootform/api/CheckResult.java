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
public sealed interface CheckResult permits CheckResult.Checked, CheckResult.Unchecked {

    /**
     * The check's report, when the claim was checked.
     *
     * @return the report of {@link Holds} and {@link Fails}; empty for {@link Unchecked}
     */
    default Optional<ClaimReport> report() {
        return Optional.empty();
    }

    /** A claim that was checked: {@link Holds} or {@link Fails}. */
    sealed interface Checked extends CheckResult permits Holds, Fails {
        /**
         * The check's findings.
         *
         * @return the report
         */
        ClaimReport checked();

        @Override
        default Optional<ClaimReport> report() {
            return Optional.of(checked());
        }
    }

    /**
     * The claim is the solution (exactly, or to the stated digits when the report says numeric).
     *
     * @param checked the findings
     */
    record Holds(ClaimReport checked) implements Checked {
        /** @throws NullPointerException if the report is null */
        public Holds {
            Objects.requireNonNull(checked, "checked");
        }
    }

    /**
     * The claim is not the solution; the report explains where and why.
     *
     * @param checked the findings
     */
    record Fails(ClaimReport checked) implements Checked {
        /** @throws NullPointerException if the report is null */
        public Fails {
            Objects.requireNonNull(checked, "checked");
        }
    }

    /**
     * The claim was not checked.
     *
     * @param reason a {@link Result} without a checked claim: {@link Result.Refused} (bad problem or
     *     claim, with its position), {@link Result.Contradictory}, {@link Result.Underdetermined},
     *     {@link Result.CheckFailed} (the solver's own answer did not verify) or {@link Result.OutOfTime}
     */
    record Unchecked(Result reason) implements CheckResult {
        /** @throws NullPointerException if the reason is null */
        public Unchecked {
            Objects.requireNonNull(reason, "reason");
        }
    }
}
