package dev.rootform.api;

import java.util.Objects;
import java.util.Optional;

/**
 * One state-space model to analyse, with the matrices as JSON arrays of exact numbers, and the
 * options to analyse it with. Immutable; start with {@link #continuous(String)} or
 * {@link #discrete(String)} and add parts with the {@code with…} methods.
 *
 * <pre>{@code
 * SystemResult r = Rootform.system(SystemRequest.continuous("[[0,1],[-5,-2]]")
 *         .withB("[[0],[1]]").withC("[[1,0]]").withInput("step"));
 * r.answer().ifPresent(a -> System.out.println("G(s) = " + a.transfer().orElseThrow().entries()));
 * }</pre>
 *
 * @param continuous true for x' = Ax + Bu, false for x[n+1] = Ax[n] + Bu[n]
 * @param a the n×n matrix A, e.g. {@code [[0,1],[-5,-2]]}
 * @param b the n×m input matrix; empty for a model without inputs
 * @param c the p×n output matrix; empty for a model without outputs
 * @param d the p×m feedthrough matrix; empty for zero
 * @param x0 the initial state as an array of n numbers; empty for zero
 * @param input {@code impulse}, {@code step} or a forcing in solve's syntax ({@code sin(2t)},
 *     {@code (1/2)^n}), applied to every input channel; empty for none
 * @param options digits, points (t or n values of the response), time limit
 * @since 0.3
 */
public record SystemRequest(boolean continuous, String a, Optional<String> b, Optional<String> c, Optional<String> d,
        Optional<String> x0, Optional<String> input, Options options) {
    public SystemRequest {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
        Objects.requireNonNull(c, "c");
        Objects.requireNonNull(d, "d");
        Objects.requireNonNull(x0, "x0");
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(options, "options");
    }

    /** A continuous-time model x' = Ax with nothing else given yet. */
    public static SystemRequest continuous(String a) {
        return new SystemRequest(true, a, Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), Options.defaults());
    }

    /** A discrete-time model x[n+1] = Ax[n] with nothing else given yet. */
    public static SystemRequest discrete(String a) {
        return new SystemRequest(false, a, Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), Options.defaults());
    }

    public SystemRequest withB(String matrix) {
        return new SystemRequest(continuous, a, Optional.of(matrix), c, d, x0, input, options);
    }

    public SystemRequest withC(String matrix) {
        return new SystemRequest(continuous, a, b, Optional.of(matrix), d, x0, input, options);
    }

    public SystemRequest withD(String matrix) {
        return new SystemRequest(continuous, a, b, c, Optional.of(matrix), x0, input, options);
    }

    public SystemRequest withX0(String vector) {
        return new SystemRequest(continuous, a, b, c, d, Optional.of(vector), input, options);
    }

    public SystemRequest withInput(String signal) {
        return new SystemRequest(continuous, a, b, c, d, x0, Optional.of(signal), options);
    }

    public SystemRequest with(Options replacement) {
        return new SystemRequest(continuous, a, b, c, d, x0, input, replacement);
    }
}
