package dev.rootform.api;

import java.util.Objects;
import java.util.Optional;

/**
 * A problem with parameters to solve: the equation with its conditions, the parameter names, sign
 * assumptions and optionally values to specialise at. Immutable.
 *
 * <pre>{@code
 * ParametricResult r = Rootform.solveWithParameters(
 *         ParametricRequest.of("m y'' + c y' + k y = 0; y(0) = x0; y'(0) = 0", "m, c, k, x0")
 *                 .where("m > 0, c >= 0, k > 0").at("m = 2, c = 1/5, k = 8, x0 = 1/100"));
 * if (r instanceof ParametricResult.Solved s) {
 *     s.report().answer().cases().forEach(c -> System.out.println(c.when() + "  " + c.regimes()));
 * }
 * }</pre>
 *
 * @param problem the equation and {@code ;}-separated conditions
 * @param parameters the parameter names, comma-separated
 * @param where sign conditions on single parameters ({@code "m > 0, c >= 0"}), or empty
 * @param at values for every parameter ({@code "m=2, c=0.4"}), when the specialised answer is wanted
 * @param options digits, points (used at {@code at}), time limit, variable
 * @since 0.3
 */
public record ParametricRequest(String problem, String parameters, String where, Optional<String> at, Options options) {
    public ParametricRequest {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(parameters, "parameters");
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(options, "options");
    }

    public static ParametricRequest of(String problem, String parameters) {
        return new ParametricRequest(problem, parameters, "", Optional.empty(), Options.defaults());
    }

    public ParametricRequest where(String conditions) {
        return new ParametricRequest(problem, parameters, conditions, at, options);
    }

    public ParametricRequest at(String values) {
        return new ParametricRequest(problem, parameters, where, Optional.of(values), options);
    }

    public ParametricRequest with(Options other) {
        return new ParametricRequest(problem, parameters, where, at, other);
    }
}
