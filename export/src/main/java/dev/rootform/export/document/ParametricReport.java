package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.params.ParametricAnswer;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything an answer with parameters shows: the cases and stability conditions, the checks of the
 * case formulas against the ordinary solver at parameter points, and the answer at {@code --at}.
 *
 * @param answer the cases, stability conditions and notes
 * @param checks the specialisation checks (random rational points, and the {@code --at} point)
 * @param at the specialised answer, when values were given
 * @since 0.3
 */
public record ParametricReport(ParametricAnswer answer, List<Agreement> checks, Optional<Specialisation> at) {
    public ParametricReport {
        Objects.requireNonNull(answer, "answer");
        checks = List.copyOf(checks);
        Objects.requireNonNull(at, "at");
    }

    /** True when every case passed the exact check and every specialisation agreed. */
    public boolean verified() {
        return answer.verified() && checks.stream().allMatch(Agreement::agreed);
    }

    /**
     * One comparison of a case formula with the ordinary exact solver on the problem with the
     * parameters put in.
     *
     * @param values the parameter values
     * @param caseNumber the case that holds there, from 1
     * @param points the points compared
     * @param largestDifference the largest |difference| (relative to max(1, |value|)), as text
     * @param agreed true when it is within the tolerance ({@code exact} for recurrences: equal)
     */
    public record Agreement(Map<String, Rational> values, int caseNumber, List<String> points, String largestDifference,
            boolean agreed) {
        public Agreement {
            values = Map.copyOf(values);
            points = List.copyOf(points);
        }
    }

    /**
     * The answer at given parameter values.
     *
     * @param values the values, in the order of the parameters
     * @param caseNumber the case that holds, from 1 (0 when no case formula was derived)
     * @param problem the problem text with the values put in
     * @param report the ordinary solver's answer to it
     */
    public record Specialisation(Map<String, Rational> values, int caseNumber, String problem, Report report) {
        public Specialisation {
            values = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(values));
            Objects.requireNonNull(problem, "problem");
            Objects.requireNonNull(report, "report");
        }
    }
}
