package dev.rootform.symbolic.params;

import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Objects;

/**
 * A linear constant-coefficient equation whose coefficients, forcing and condition values lie in
 * Q(params): Σ_j a_j·D^j y = Σ g (differential) or Σ_j a_j·x[n + shift + j] = Σ g(n) (difference,
 * holding from n = max(0, −shift)).
 *
 * @param domain differential or difference
 * @param function the unknown's name
 * @param variable the independent variable's name
 * @param parameters the declared parameter names, in the order given
 * @param coefficients a_0 … a_N, ascending; a_N is not zero
 * @param shift the lowest shift of a recurrence (0 for a differential equation)
 * @param forcing the right-hand side's terms
 * @param conditions the conditions in the order written
 * @param source the text read
 * @param occurrences where each parameter was written in {@code source}
 * @since 0.3
 */
public record ParametricProblem(Domain domain, String function, String variable, List<String> parameters,
        List<ParamFunction> coefficients, int shift, List<ParamTerm> forcing, List<ParamCondition> conditions,
        String source, List<Occurrence> occurrences) {

    /** A parameter written at [start, end) of the source. */
    public record Occurrence(String name, int start, int end) { }

    public ParametricProblem {
        Objects.requireNonNull(domain, "domain");
        parameters = List.copyOf(parameters);
        coefficients = List.copyOf(coefficients);
        forcing = List.copyOf(forcing);
        conditions = List.copyOf(conditions);
        occurrences = List.copyOf(occurrences);
        if (coefficients.isEmpty() || coefficients.get(coefficients.size() - 1).isZero()) {
            throw new IllegalArgumentException("the leading coefficient must not be zero");
        }
    }

    /** The order N. */
    public int order() {
        return coefficients.size() - 1;
    }

    /** True when the equation has no forcing. */
    public boolean homogeneous() {
        return forcing.isEmpty();
    }
}
