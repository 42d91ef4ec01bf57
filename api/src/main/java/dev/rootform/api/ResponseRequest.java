package dev.rootform.api;

import java.util.List;
import java.util.Objects;

/**
 * One transfer function and what to compute about it. Immutable.
 *
 * <p>The step response of a second-order section with a zero, its values at t = 1 and 2.5, its
 * frequency response at 0, 2 and 10 rad/s, and its overshoot, to 12 digits:
 *
 * <pre>{@code
 * ResponseRequest r = ResponseRequest.of("H(s) = (s + 3)/(s^2 + 2s + 5)").to("step")
 *         .frequencies(List.of("0", "2", "10")).with(Options.builder().digits(12).points("1", "2.5").build());
 * Rootform.response(r).answer().ifPresent(report ->
 *         System.out.println("overshoot " + report.stepFigures().orElseThrow().overshootPercent().orElseThrow() + " %"));
 * }</pre>
 *
 * @param transfer the transfer function, e.g. {@code H(s) = (s + 3)/(s^2 + 2s + 5)} or
 *     {@code G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)}
 * @param input {@code impulse}, {@code step}, {@code ramp} or a forcing such as {@code sin(2t)} or
 *     {@code (1/2)^n}, applied from zero initial state
 * @param frequencies where to evaluate the frequency response: rad/s for s, rad/sample for z
 *     ({@code 0.5}, {@code pi/4})
 * @param options digits, points (times t &ge; 0 or indices n &ge; 0 for the response's values), time limit
 * @since 0.3
 */
public record ResponseRequest(String transfer, String input, List<String> frequencies, Options options) {
    /** The input when none is given. */
    public static final String DEFAULT_INPUT = "impulse";

    public ResponseRequest {
        Objects.requireNonNull(transfer, "transfer");
        Objects.requireNonNull(input, "input");
        frequencies = List.copyOf(frequencies);
        Objects.requireNonNull(options, "options");
    }

    /** The impulse response of {@code transfer}, with default options and no frequencies. */
    public static ResponseRequest of(String transfer) {
        return new ResponseRequest(transfer, DEFAULT_INPUT, List.of(), Options.defaults());
    }

    /** This request with another input. */
    public ResponseRequest to(String otherInput) {
        return new ResponseRequest(transfer, otherInput, frequencies, options);
    }

    /** This request with frequencies for the frequency response. */
    public ResponseRequest frequencies(List<String> list) {
        return new ResponseRequest(transfer, input, list, options);
    }

    /** This request with other options. */
    public ResponseRequest with(Options other) {
        return new ResponseRequest(transfer, input, frequencies, other);
    }
}
