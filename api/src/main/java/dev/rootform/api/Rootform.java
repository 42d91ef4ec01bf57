package dev.rootform.api;

/**
 * The front door of rootform as a library: one request in, one {@link Result} out.
 *
 * <pre>{@code
 * Result r = Rootform.solve(SolveRequest.of("y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 0")
 *         .with(Options.builder().digits(20).points("0.5", "2").build()));
 * if (r instanceof Result.Solved s) {
 *     String text = Exporters.byName("text").orElseThrow().render(s.report(), CodeNames.defaults()).text();
 * }
 * }</pre>
 *
 * <p>Thread-safe and stateless: calls from many threads at once are independent. Expected
 * outcomes (bad input, contradictory or underdetermined conditions, a failed check, the time
 * limit) are values of {@link Result}, never exceptions; an exception means a bug.
 *
 * @since 0.2
 */
public final class Rootform {
    private Rootform() {
    }

    /** Solves one problem exactly, verifies the answer and analyses it numerically. */
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
}
