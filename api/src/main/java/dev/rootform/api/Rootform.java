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
     * Checks a claimed solution of a problem: exactly where the claim's numbers are exact, else
     * numerically to {@link Options#digits()} digits; with the equation part, each condition,
     * where claim and solution differ, named slips and the correct solution.
     *
     * @since 0.3
     */
    public static CheckResult check(CheckRequest request) {
        return CheckJob.run(request);
    }
}
