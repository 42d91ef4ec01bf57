/**
 * rootform as a library: exact closed forms of linear constant-coefficient difference and
 * differential equations, verified, behind one call. {@link dev.rootform.api.Rootform#solve} takes a
 * {@link dev.rootform.api.SolveRequest} (the problem as text or as a model built in code, plus
 * {@link dev.rootform.api.Options}) and returns one {@link dev.rootform.api.Result};
 * {@link dev.rootform.api.Exporters} writes a finished answer as text, JSON, LaTeX, MathML, Java or C.
 * {@link dev.rootform.api.Rootform#system} takes a state-space model as a
 * {@link dev.rootform.api.SystemRequest} and returns one {@link dev.rootform.api.SystemResult}
 * (e^(At) or A^n entry by entry, the transfer matrix, the response, stability and the Kalman ranks,
 * each scalar part solved through the same exact solver); {@link dev.rootform.api.SystemExporters}
 * writes it.
 *
 * <h2>Data flow</h2>
 * Each stage makes an immutable value from the one before it and never reaches back:
 * <ol>
 *   <li><b>text → {@code Problem}</b> (symbolic): the parser reads the equation and its conditions
 *       (a request built from a {@code Problem} starts here); bad input becomes
 *       {@link dev.rootform.api.Result.Refused} with the position;</li>
 *   <li><b>{@code Problem} → {@code Solution}</b> (symbolic): the characteristic polynomial is
 *       factored over the rationals, the constants are fitted in the number field of each root and
 *       the closed form is verified exactly; conditions that fix no single solution become
 *       {@link dev.rootform.api.Result.Contradictory} (with the relation every solution obeys) or
 *       {@link dev.rootform.api.Result.Underdetermined} (with a free solution);</li>
 *   <li><b>{@code Solution} → {@code Analysis}</b> (numeric): certified root enclosures, values at
 *       the requested points, constants that only a numeric solve can fix (boundary values, trial
 *       forms) with their accuracy, the independent cross-checks and the diagnostics;</li>
 *   <li><b>{@code Solution} + {@code Analysis} → {@code Report}</b> (export): everything an answer
 *       shows; the result is {@link dev.rootform.api.Result.Solved},
 *       {@link dev.rootform.api.Result.General} (no conditions, free constants) or
 *       {@link dev.rootform.api.Result.CheckFailed} when a check did not hold;</li>
 *   <li><b>{@code Report} → {@code Exporter}</b> (export): each format only formats the report and
 *       computes no mathematics.</li>
 * </ol>
 * Past the time limit of the options, the work stops and the result is
 * {@link dev.rootform.api.Result.OutOfTime}.
 * Expected outcomes are values of the sealed {@link dev.rootform.api.Result}, never exceptions;
 * {@link dev.rootform.api.Rootform} shows a whole call.
 *
 * <h2>Thread safety</h2>
 * {@link dev.rootform.api.Rootform#solve} keeps no state between calls and may be called from any
 * number of threads at once. Each call does its work on the calling thread and starts none of its
 * own: every long loop checks the call's deadline, and one shared daemon thread
 * ({@code rootform-watchdog}, ending when idle) interrupts the calling thread when the time limit
 * passes, so that factoring stops too; the call clears that interrupt before it returns. Nothing
 * keeps computing after a call returns. Requests, options, results, reports and exporters are
 * immutable or stateless and may be shared between threads; only
 * {@link dev.rootform.api.Options.Builder} is not thread-safe.
 *
 * <h2>Dependencies</h2>
 * The public signatures of this package name only JDK and rootform types: no type of the libraries
 * used inside (JAS, Symja, apfloat, Commons Math, Jackson) appears in them. The architecture tests
 * in the {@code cli} module check this and the one-way arrows
 * {@code cli → api → export → numeric → symbolic}.
 *
 * @since 0.2
 */
package dev.rootform.api;
