package dev.rootform.symbolic.response;

import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.List;
import java.util.Objects;

/**
 * How the response y = h * u from zero initial state is obtained: the output transform
 * Y = H·U, its impulsive terms, and an initial-value problem whose solution is the rest of y.
 *
 * <p>Continuous time: y(t) for t &gt; 0 solves {@code problem}, a differential equation with
 * conditions y^(i)(0+) at t = 0+; the impulses act at t = 0 only. Discrete time: y[n] for every
 * n &ge; 0 is the solution of {@code problem} (whose first values, listed by solve, carry the
 * impulses); the impulses are also given apart to show the response as Σ c·δ[n − k] + modes.
 *
 * @param transfer the transfer function
 * @param input the input
 * @param output Y = H·U
 * @param problem the equation and initial values whose solution is the response
 * @param impulses the impulsive terms, by ascending order
 * @param split how the solution's terms divide into transient and steady parts
 * @since 0.3
 */
public record ResponsePlan(TransferFunction transfer, Input input, RationalFunction output, Problem problem,
        List<Impulse> impulses, Split split) {
    /** Whether the transient (natural) and steady (forced) parts are told apart. */
    public enum Split {
        /**
         * The problem's equation is the system's own, den(H)(L) y = g, with the forced part g as its
         * right-hand side: the solver's homogeneous terms are the transient, its particular terms the
         * steady response.
         */
        FORCED,
        /** H has no poles (apart from delays): the whole response is forced. */
        STEADY_ONLY,
        /** The input's modes have amplitudes that are not rational; the response is one sum of modes. */
        NONE
    }

    public ResponsePlan {
        Objects.requireNonNull(transfer, "transfer");
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(output, "output");
        Objects.requireNonNull(problem, "problem");
        impulses = List.copyOf(impulses);
        Objects.requireNonNull(split, "split");
    }
}
