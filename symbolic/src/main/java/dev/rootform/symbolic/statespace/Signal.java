package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Problem;
import java.util.Objects;

/**
 * One state or output of a response as a scalar problem for the solver: the signal solves
 * μ(D)·s = forcing (or μ(E)·s = forcing) with its exact initial values, μ the minimal polynomial
 * of A.
 *
 * @param name {@code x1}, {@code y2}, …
 * @param problem the scalar equation with its conditions
 * @param start the first index the closed form describes: 1 for the pulse response of a discrete
 *     model (the pulse acts at n = 0), else 0
 * @param before the value at n = 0 when {@code start} is 1, else 0
 * @param delta the coefficient of δ(t) in a continuous output's impulse response (the direct
 *     feedthrough D), else 0
 * @since 0.3
 */
public record Signal(String name, Problem problem, int start, Rational before, Rational delta) {
    public Signal {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(delta, "delta");
    }
}
