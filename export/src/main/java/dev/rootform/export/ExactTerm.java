package dev.rootform.export;

import java.math.BigInteger;
import java.util.List;

/**
 * The exact term of an integer-valued recurrence as generated C computes it on 64-bit integers:
 * x[m + k] = Σ_{j&lt;k} step_j·x[m + j] iterated from x[first .. first + k − 1], each product and
 * partial sum checked before it is formed, so that the C function reports overflow instead of
 * wrapping. All numbers are exact; rootform found {@link #reach} by running the same steps on exact
 * integers.
 *
 * @param step step_0 .. step_{k−1}, each in the range of the integer type
 * @param start x[first] .. x[first + k − 1], each in the range of the integer type
 * @param first the first index
 * @param unsigned whether the type is {@code uint64_t} (every step and start value ≥ 0, so every
 *     value and intermediate is ≥ 0) rather than {@code int64_t}
 * @param low per step: the smallest x with step·x in range (the type's minimum when step is 0)
 * @param high per step: the largest x with step·x in range (the type's maximum when step is 0)
 * @param reach how far the term is known to fit
 * @since 0.3
 */
public record ExactTerm(List<BigInteger> step, List<BigInteger> start, long first, boolean unsigned, List<BigInteger> low,
        List<BigInteger> high, Reach reach) {
    public ExactTerm {
        step = List.copyOf(step);
        start = List.copyOf(start);
        low = List.copyOf(low);
        high = List.copyOf(high);
        java.util.Objects.requireNonNull(reach, "reach");
    }

    /** The order k. */
    public int order() {
        return step.size();
    }

    /** The smallest value of the integer type: −2^63, or 0 when unsigned. */
    public BigInteger minimum() {
        return minimum(unsigned);
    }

    /** The largest value of the integer type: 2^63 − 1, or 2^64 − 1 when unsigned. */
    public BigInteger maximum() {
        return maximum(unsigned);
    }

    /** The smallest value of {@code int64_t}, or of {@code uint64_t} when {@code unsigned}. */
    public static BigInteger minimum(boolean unsigned) {
        return unsigned ? BigInteger.ZERO : BigInteger.ONE.shiftLeft(63).negate();
    }

    /** The largest value of {@code int64_t}, or of {@code uint64_t} when {@code unsigned}. */
    public static BigInteger maximum(boolean unsigned) {
        return BigInteger.ONE.shiftLeft(unsigned ? 64 : 63).subtract(BigInteger.ONE);
    }

    /** How far the term fits: the kinds of knowledge rootform can have about it. */
    public sealed interface Reach {
        /**
         * Exactly known: the term fits for every n &le; last, and computing x[last + 1] leaves the type,
         * so the term reports overflow for every n &gt; last.
         *
         * @param last the largest safe index
         * @param valueOverflows whether x[last + 1] itself leaves the type (else only an intermediate
         *     product or partial sum does)
         */
        record Exact(long last, boolean valueOverflows) implements Reach {
        }

        /**
         * Never overflows: from index first + from on the values repeat with this period, and every
         * value and intermediate up to there fits; the C function reduces n by the period.
         *
         * @param from offset of the first index of the repeating part from the first index
         * @param period the period
         */
        record Periodic(long from, long period) implements Reach {
        }

        /**
         * Bounded analytically: the sequence is a quasi-polynomial (on each residue class mod period,
         * a polynomial of the given degree in the class index), and a bound on every value and
         * intermediate keeps them in range for n &le; last; past it the term may report overflow.
         *
         * @param last index up to which the term is proved to fit ({@link Long#MAX_VALUE} when it
         *     fits for every long)
         * @param degree the degree of growth
         * @param period the period of the residue classes
         */
        record Bounded(long last, int degree, long period) implements Reach {
        }

        /**
         * Checked: every step up to last was run exactly and fits; past it nothing is known beyond the
         * C function's own checks.
         *
         * @param last the last index checked
         */
        record Checked(long last) implements Reach {
        }
    }
}
