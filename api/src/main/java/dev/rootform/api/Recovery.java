package dev.rootform.api;

import dev.rootform.symbolic.recover.RecoveredRecurrence;
import java.util.Objects;

/**
 * The outcome of {@link Rootform#recover}. Every expected outcome is a value of this sealed type,
 * never an exception.
 *
 * <pre>{@code
 * Recovery r = Rootform.recover(RecoverRequest.of("0, 1, 1, 2, 3, 5, 8, 13, 21, 34"));
 * if (r instanceof Recovery.Recovered rec && rec.result() instanceof Result.Solved s) {
 *     System.out.println(rec.equation() + "  ->  " + s.report().solution().closedForm());
 * }
 * }</pre>
 *
 * @since 0.2
 */
public sealed interface Recovery permits Recovery.Recovered, Recovery.TooFewTerms, Recovery.NotRecovered {

    /**
     * The shortest recurrence was found and confirmed, then solved: {@code result} is what
     * {@link Rootform#solve} gives for {@link #equation()}: solved and verified, a check failed, or
     * out of time (the points of the options are checked before, so bad points are
     * {@link NotRecovered}).
     *
     * @param recurrence the recurrence with its terms, order and confirming terms
     * @param result the solve answer for {@code recurrence.text()}
     */
    record Recovered(RecoveredRecurrence recurrence, Result result) implements Recovery {
        public Recovered {
            Objects.requireNonNull(recurrence, "recurrence");
            Objects.requireNonNull(result, "result");
        }

        /** The equation with its conditions in solve's input syntax: {@code x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1}. */
        public String equation() {
            return recurrence.text();
        }

        /** The order L of the recurrence. */
        public int order() {
            return recurrence.order();
        }

        /** N, the number of terms it was fitted to. */
        public int termsUsed() {
            return recurrence.termsUsed();
        }

        /** N − 2L, the terms beyond the 2L that determine it; at least 2. */
        public int confirmingTerms() {
            return recurrence.confirmingTerms();
        }
    }

    /**
     * The terms fit a recurrence of order {@code order}, which needs 2·order + 2 terms to be
     * confirmed; at least {@code termsNeeded} more are needed (more if further terms raise the order).
     */
    record TooFewTerms(int termsGiven, int order, int termsNeeded) implements Recovery {
        /** One line for a person. */
        public String message() {
            return termsGiven + (termsGiven == 1 ? " term is" : " terms are") + " too few: the shortest recurrence they fit has order "
                    + order + ", which needs 2·" + order + " + 2 = " + (2 * order + 2) + " terms to be confirmed; give at least "
                    + termsNeeded + " more";
        }
    }

    /**
     * No recurrence: the terms, their start index or the options' points were refused
     * ({@link Result.Refused}), or the time ran out ({@link Result.OutOfTime}).
     */
    record NotRecovered(Result result) implements Recovery {
        public NotRecovered {
            Objects.requireNonNull(result, "result");
            if (result.answer().isPresent()) {
                throw new IllegalArgumentException("result (" + result.getClass().getSimpleName() + ") carries an answer");
            }
        }
    }
}
