package dev.rootform.api;

import dev.rootform.numeric.analysis.ApfloatStartup;

/**
 * The front door of rootform as a library: one {@link SolveRequest} in, one {@link Result} out.
 *
 * <p>A damped oscillator let go at 1 with no speed, and its position at t = 1/2 and t = 2 to 20
 * digits:
 *
 * <pre>{@code
 * Result result = Rootform.solve(SolveRequest.of("y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0")
 *         .with(Options.builder().digits(20).points("1/2", "2").build()));
 * if (result instanceof Result.Solved solved) {
 *     solved.report().values().forEach(v -> System.out.println("y(" + v.at() + ") = " + v.value()));
 * }
 * }</pre>
 *
 * <p>Thread-safe and stateless: calls from many threads at once are independent. Expected
 * outcomes (bad input, contradictory or underdetermined conditions, a failed check, the time
 * limit) are values of {@link Result}, never exceptions; an exception means a bug.
 *
 * <p>The work runs on the calling thread. When {@link Options#timeLimit()} passes, it stops
 * within one step of its current loop and the result is {@link Result.OutOfTime}; nothing keeps
 * computing after the call returns. To stop it, a shared daemon thread ({@code rootform-watchdog},
 * ending when idle) interrupts the calling thread at the limit; the call clears that interrupt
 * again before it returns. An interrupt of the calling thread from elsewhere also stops the work
 * with {@link Result.OutOfTime}, and that interrupt status is left set.
 *
 * @since 0.2
 */
public final class Rootform {
    static {
        // before any call can run on two threads at once: apfloat's classes deadlock when first used concurrently
        ApfloatStartup.initialize();
    }

    private Rootform() {
    }

    /**
     * Solves one problem exactly, verifies the answer and analyses it numerically.
     *
     * @param request the problem and the options to solve it with
     * @return the outcome; {@link Result#answer()} holds the finished answer when there is one
     */
    public static Result solve(SolveRequest request) {
        return SolveJob.run(request);
    }

    /**
     * Recovers the shortest linear recurrence with constant rational coefficients that generates
     * the given exact terms (confirmed by at least two terms beyond twice its order), writes it in
     * solve's input syntax and solves that text.
     */
    public static Recovery recover(RecoverRequest request) {
        return RecoverJob.run(request);
    }

    /**
     * Analyses a state-space model exactly: e^(At) or A^n entry by entry, the transfer matrix, the
     * response to x0 and the input, stability and the Kalman ranks, all verified.
     *
     * @since 0.3
     */
    public static SystemResult system(SystemRequest request) {
        return SystemJob.run(request);
    }

    /**
     * Checks a claimed solution of a problem: exactly where the claim's numbers are exact, else
     * numerically to {@link Options#digits()} digits; with the equation part, each condition,
     * where claim and solution differ, named slips and the correct solution.
     *
     * @param request the problem, the claim and the options
     * @return whether the claim holds, with the explanation, or why it was not checked
     * @since 0.3
     */
    public static CheckResult check(CheckRequest request) {
        return CheckJob.run(request);
    }

    /**
     * Analyses a transfer function exactly (lowest terms, poles and zeros, DC gain, properness,
     * stability) and computes its response to the request's input in closed form, verified, with
     * the frequency response and, for a step into a stable system, the step figures.
     */
    public static ResponseResult response(ResponseRequest request) {
        return ResponseJob.run(request);
    }

    /**
     * Solves a problem with parameters exactly over the rational functions in them, split into the
     * cases where the form of the solution changes, with stability as conditions on the parameters;
     * checks the cases against the ordinary solver at rational parameter points and, with values,
     * gives the specialised answer.
     *
     * @param request the problem, the parameter names, assumptions, values and options
     * @return the cases, or why there are none
     * @since 0.3
     */
    public static ParametricResult solveWithParameters(ParametricRequest request) {
        return ParametricJob.run(request);
    }
}
