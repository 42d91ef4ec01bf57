package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.work.Deadline;
import java.util.function.IntFunction;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The working-precision policy of the analysis: {@link #GUARD_DIGITS} digits above the requested
 * ones, at most {@link #MAX_EXTRA_DIGITS} above them, and the one loop that raises the precision until two
 * evaluations agree. Each round evaluates the quantity at p and at p + GUARD_DIGITS digits (the
 * cheaper first, so that a failure the evaluation reports, such as a singular system, is reported
 * at the lower precision); when the two agree, the more precise one is the answer, else p grows by
 * the caller's step. Each round checks the current {@link Deadline}.
 */
final class WorkingPrecision {
    /** Guard digits above the requested ones. */
    static final int GUARD_DIGITS = 20;
    /** Highest working precision tried, in digits above the requested ones. */
    static final int MAX_EXTRA_DIGITS = 5000;

    /** Whether the evaluations at {@code working} and {@code working + GUARD_DIGITS} digits agree. */
    interface Agreement<T> {
        boolean test(T low, T high, int working);
    }

    /** The next working precision after a round whose evaluations did not agree. */
    interface Step<T> {
        int next(int working, T high);
    }

    private WorkingPrecision() {
    }

    /**
     * The evaluation at the first precision where two agree, starting at {@code wanted + GUARD_DIGITS}.
     *
     * @param evaluate the quantity at a working precision in digits
     * @param what the quantity in words, for the failure message
     * @throws IllegalStateException if no two precisions up to {@link #MAX_EXTRA_DIGITS} above {@code wanted} agree
     */
    static <T> T settle(int wanted, IntFunction<T> evaluate, Agreement<T> agree, Step<T> step, String what) {
        int working = wanted + GUARD_DIGITS;
        int ceiling = wanted + MAX_EXTRA_DIGITS;
        while (working <= ceiling) {
            Deadline.checkCurrent();
            T low = evaluate.apply(working);
            T high = evaluate.apply(working + GUARD_DIGITS);
            if (agree.test(low, high, working)) {
                return high;
            }
            working = step.next(working, high);
        }
        throw new IllegalStateException(what + " did not settle within " + ceiling + " digits");
    }

    /**
     * Whether two evaluations {value, largest mode magnitude} agree to {@code wanted} digits, or to
     * the working precision's floor below the largest mode (a value that cancels to about 0).
     */
    static boolean agree(Apfloat[] low, Apfloat[] high, int working, int wanted) {
        Apfloat difference = ApfloatMath.abs(low[0].subtract(high[0]));
        Apfloat relative = ApfloatMath.abs(high[0]).multiply(new Apfloat("1e-" + (wanted + 2), working));
        Apfloat floor = high[1].multiply(new Apfloat("1e-" + (working - GUARD_DIGITS / 2), working));
        return difference.compareTo(relative) <= 0 || difference.compareTo(floor) <= 0;
    }
}
