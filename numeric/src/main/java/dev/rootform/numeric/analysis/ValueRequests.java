package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.solve.SinusoidSolution;
import dev.rootform.symbolic.solve.Solution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Optional;

/**
 * The precondition of {@link Analyzer#analyze}: whether a solution has values at the requested
 * points. A general solution (free constants, no conditions) has none; a sequence has values only
 * at integer indices from its first index on. Callers run this check first and report a refusal as
 * bad input; the analyzer rejects a request that fails it.
 *
 * @since 0.2
 */
public final class ValueRequests {
    private ValueRequests() {
    }

    /**
     * Why values at {@code points} cannot be given, as one line naming the first offending request
     * (e.g. {@code "value at 3/2: a sequence has values only at integer indices"}); empty when all
     * can.
     */
    public static Optional<String> refusal(Solution solution, List<Rational> points) {
        if (!points.isEmpty() && solution.exact().isEmpty() && solution.radical().isEmpty()
                && solution.sinusoid().isEmpty() && solution.problem().conditions().isEmpty()) {
            return Optional.of("values need conditions: the general solution has free constants");
        }
        boolean sequence = solution.problem().equation().domain() == Domain.DIFFERENCE;
        return beyond(points, sequence ? Limits.MAX_INDEX : Limits.MAX_POINT, sequence ? "indices" : "points")
                .or(() -> refusalOfAnySize(solution, points));
    }

    /**
     * {@link #refusal}, or when {@code allDigits}, why the values cannot be given exactly with all
     * their digits: only a sequence with rational values has them (not a function, not values in
     * Q(√r) or with cos ω of a frequency that is not a rational multiple of π, not constants known only
     * numerically), at indices up to {@link Limits#MAX_EXACT_INDEX} and of at most
     * {@link Limits#MAX_EXACT_DIGITS} digits (estimated from the largest root modulus).
     *
     * @since 0.3
     */
    public static Optional<String> refusal(Solution solution, List<Rational> points, boolean allDigits) {
        return refusal(solution, points, allDigits, new RootCache());
    }

    /** {@link #refusal(Solution, List, boolean)}, sizing values with the roots of {@code cache} (an analysis's). */
    static Optional<String> refusal(Solution solution, List<Rational> points, boolean allDigits, RootCache cache) {
        if (!allDigits || points.isEmpty()) {
            return refusal(solution, points);
        }
        if (solution.problem().equation().domain() != Domain.DIFFERENCE) {
            return Optional.of("values with all their digits are for sequences: a function's values are irrational in general");
        }
        if (solution.hasNumericConstants() || solution.exact().isEmpty()) {
            String why = solution.radical().isPresent() ? "they lie in Q(√" + solution.radical().get().radicand() + ")"
                    : solution.sinusoid().isPresent() ? "the forcing's cos ω, sin ω are transcendental"
                    : solution.hasNumericConstants() ? "the constants are known only numerically"
                    : "the general solution has free constants";
            return Optional.of("values with all their digits need exact rational values: " + why);
        }
        Optional<String> refused = beyond(points, Limits.MAX_EXACT_INDEX, "indices").or(() -> refusalOfAnySize(solution, points));
        if (refused.isPresent()) {
            return refused;
        }
        ExactSolution s = solution.exact().get();
        for (Rational at : points) {
            long n = at.toBigInteger().longValueExact();
            double size = n < s.validFrom() ? 0 : SequenceSum.exactDigits(s, n, cache);
            if (size > Limits.MAX_EXACT_DIGITS) {
                return Optional.of("value at " + shown(at) + ": about " + new BigDecimal(size).round(new MathContext(2)).toString()
                        + " digits, more than the " + Limits.MAX_EXACT_DIGITS + " that a value with all its digits may have");
            }
        }
        return Optional.empty();
    }

    /** The first point larger than {@code limit} in size, refused; empty when none is. */
    private static Optional<String> beyond(List<Rational> points, long limit, String what) {
        for (Rational at : points) {
            if (at.abs().compareTo(Rational.of(limit)) > 0) {
                return Optional.of("value at " + shown(at) + ": " + what + " up to " + limit + " in size are accepted");
            }
        }
        return Optional.empty();
    }

    /**
     * {@link #refusal} without the size limit of requests: for points that rootform chose itself
     * (the sample of generated code's accuracy, which reaches n = 10^15), whose values it computes by
     * certified evaluation.
     */
    static Optional<String> refusalOfAnySize(Solution solution, List<Rational> points) {
        if (!points.isEmpty() && solution.exact().isEmpty() && solution.radical().isEmpty()
                && solution.sinusoid().isEmpty() && solution.problem().conditions().isEmpty()) {
            return Optional.of("values need conditions: the general solution has free constants");
        }
        Optional<Rational> first = firstIndex(solution);
        if (first.isPresent()) {
            for (Rational at : points) {
                if (!at.isInteger()) {
                    return Optional.of("value at " + at + ": a sequence has values only at integer indices");
                }
                if (at.compareTo(first.get()) < 0) {
                    return Optional.of("value at " + at.toBigInteger() + ": below the first index " + first.get());
                }
            }
        }
        return Optional.empty();
    }

    /** {@code at} for a message: as written when short, else in scientific notation. */
    private static String shown(Rational at) {
        String text = at.toString();
        return text.length() <= 40 ? text : at.toBigDecimal(new MathContext(6)).toString();
    }

    /** The first index of a fitted sequence, exact or in Q(√r) parts; empty for functions and general solutions. */
    private static Optional<Rational> firstIndex(Solution s) {
        if (s.problem().equation().domain() != Domain.DIFFERENCE) {
            return Optional.empty();
        }
        return s.exact().or(() -> s.radical().map(RadicalSolution::rational)).or(() -> s.sinusoid().map(SinusoidSolution::rest))
                .map(ExactSolution::origin);
    }
}
