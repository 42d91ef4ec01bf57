package dev.rootform.export;

import dev.rootform.symbolic.algebra.Rational;
import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What rootform measured about the floating-point formula of generated code in one C variant (the
 * double one is also the Java code's): the input range where every term stays finite, the largest a
 * normal number of the variant's type and the rounding of rates and angles cannot make the phase or
 * growth drift by more than {@link #driftLimit}; the time scales of the problem; and
 * the worst errors against values to 30 significant digits over a sample of points chosen from those
 * time scales inside that range ({@link Accuracy}), separately forward (t &ge; t0, or every index of
 * a sequence) and backward (t &lt; t0).
 *
 * @param low smallest valid input: v = t − t0 (differential) or the first index n
 * @param high largest valid input, in the same terms
 * @param lowLimit what ends the range below
 * @param highLimit what ends the range above
 * @param timeScales the problem's time scales the sample was built from (time constants 1/|σ| and
 *     1/ω of the modes; for sequences steps 1/|ln ρ| and periods 2π/θ), ascending
 * @param points the sample points (t or n, exactly the inputs the code was called with)
 * @param exact the values there to 30 significant digits
 * @param forward the errors at the points t &ge; t0 (all points of a sequence)
 * @param backward the errors at the points t &lt; t0 (differential only; empty when the range has none)
 * @since 0.2
 */
public record CodeFacts(double low, double high, Limit lowLimit, Limit highLimit, List<Double> timeScales,
        List<Rational> points, List<BigDecimal> exact, Accuracy forward, Optional<Accuracy> backward) {
    /** Farthest input examined when searching the valid range in double ({@link CType#cap()}). */
    public static final double CAP = 1e15;
    /**
     * Largest drift of phase or growth (radians, or relative) from rates and angles rounded to double
     * inside the valid range: about 6 of its 16 digits.
     */
    public static final double DRIFT_LIMIT = 1e-10;
    /** The same for float: about 2 of its 7 digits. */
    public static final double FLOAT_DRIFT_LIMIT = 1e-5;
    /** Factor between the worst measured errors and the stated bounds. */
    public static final double MARGIN = 2;
    /** A value below 1/CANCELLATION of the largest term counts as cancelling (its relative error is not meaningful). */
    public static final double CANCELLATION = 16;

    /** What ends the valid input range on one side. */
    public enum Limit {
        /** The first index of a sequence. */
        FIRST_INDEX,
        /** The largest term would overflow a double. */
        OVERFLOW,
        /** Every term would fall below the smallest normal double. */
        UNDERFLOW,
        /** The rounding of a rate or angle would make the phase or growth drift by more than {@link #driftLimit}. */
        DRIFT,
        /** The search stopped at the type's {@link CType#cap()}. */
        CAP
    }

    /**
     * The worst errors over some of the sample points, and where they occur: relative error where the
     * terms the code adds up do not cancel (|exact| at least 1/{@link #CANCELLATION} of the largest
     * term), absolute error, and absolute error in units of the largest term (which bounds the error
     * where they cancel). The stated bounds ({@link #relativeBound}, {@link #termBound}) are the
     * worst measured times {@link #MARGIN}, for inputs between the samples; the one in units of L is
     * at least {@link #MARGIN} times the drift that the rounding of rates and angles can cause at the
     * samples (errors between samples vary with that rounding, not smoothly).
     *
     * @param points how many sample points were measured
     * @param maxRelativeError max |value − exact|/|exact| over the points where |exact| is at least
     *     1/{@link #CANCELLATION} of the largest term
     * @param worstRelativeAt where that maximum occurs; empty when no point has such a value (the
     *     terms cancel at every point, as in 10^9·(1 - 0.999999999^n) over its valid range)
     * @param maxAbsoluteError max |value − exact|
     * @param worstAbsoluteAt where that maximum occurs
     * @param maxTermError max |value − exact|/L, L the largest term the code adds up there
     *     ({@link NumericForm#largestTerm})
     * @param worstTermAt where that maximum occurs
     * @param maxDrift the largest drift, in units of L, that the rounding of rates and angles can cause
     *     at the points (|v|·Σ size·(rate and angle rounding) by first-order error propagation)
     */
    public record Accuracy(int points, double maxRelativeError, Optional<Rational> worstRelativeAt, double maxAbsoluteError,
            Rational worstAbsoluteAt, double maxTermError, Rational worstTermAt, double maxDrift) {
        public Accuracy {
            Objects.requireNonNull(worstRelativeAt, "worstRelativeAt");
            Objects.requireNonNull(worstAbsoluteAt, "worstAbsoluteAt");
            Objects.requireNonNull(worstTermAt, "worstTermAt");
        }

        /** The stated relative error bound: {@link #MARGIN} times the worst measured. */
        public double relativeBound() {
            return MARGIN * maxRelativeError;
        }

        /** The stated error bound in units of the largest term: {@link #MARGIN} times the worst measured or the drift. */
        public double termBound() {
            return MARGIN * Math.max(maxTermError, maxDrift);
        }
    }

    /** The largest drift allowed in the valid range of {@code type}: {@link #DRIFT_LIMIT} or {@link #FLOAT_DRIFT_LIMIT}. */
    public static double driftLimit(CType type) {
        return type == CType.FLOAT ? FLOAT_DRIFT_LIMIT : DRIFT_LIMIT;
    }

    public CodeFacts {
        Objects.requireNonNull(lowLimit, "lowLimit");
        Objects.requireNonNull(highLimit, "highLimit");
        timeScales = List.copyOf(timeScales);
        points = List.copyOf(points);
        exact = List.copyOf(exact);
        Objects.requireNonNull(forward, "forward");
        Objects.requireNonNull(backward, "backward");
    }
}
