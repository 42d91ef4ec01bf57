package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import dev.rootform.symbolic.solve.SinusoidSolution;
import dev.rootform.symbolic.solve.Solution;
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
        long limit = sequence ? Limits.MAX_INDEX : Limits.MAX_POINT;
        for (Rational at : points) {
            if (at.abs().compareTo(Rational.of(limit)) > 0) {
                return Optional.of("value at " + shown(at) + ": " + (sequence ? "indices" : "points") + " up to " + limit
                        + " in size are accepted");
            }
        }
        return refusalOfAnySize(solution, points);
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
