package dev.rootform.symbolic.params;

import java.util.List;
import java.util.Objects;

/**
 * The solution of an equation with parameters, split into cases, with the stability conditions.
 *
 * @param problem the problem as read
 * @param assumptions the {@code --where} conditions
 * @param cases the cases that can hold under the assumptions, generic case first
 * @param stability asymptotic stability as conditions on the parameters
 * @param notes special parameter values where the solution takes a form not derived here
 * @since 0.3
 */
public record ParametricAnswer(ParametricProblem problem, Assumptions assumptions, List<ParametricCase> cases,
        StabilityConditions stability, List<String> notes) {
    public ParametricAnswer {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(assumptions, "assumptions");
        cases = List.copyOf(cases);
        Objects.requireNonNull(stability, "stability");
        notes = List.copyOf(notes);
    }

    /** True when every case passed the exact check. */
    public boolean verified() {
        return cases.stream().allMatch(ParametricCase::verified);
    }
}
