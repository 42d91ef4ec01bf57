package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.code.CodeModels;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.NumericFallback;
import dev.rootform.numeric.analysis.ValueRequests;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * One solve: parse, solve exactly, verify, analyse numerically, and classify the outcome. A
 * problem the numeric fallback covers ({@link NumericFallback#refusal}) gives the exact path
 * {@link #EXACT_SHARE} of the time limit; past it, the answer is computed numerically in the rest
 * ({@link Result.Numeric}). Other problems give the exact path the whole limit.
 */
final class SolveJob {
    /** The exact path's share of the time limit when a numeric fallback exists. */
    static final double EXACT_SHARE = 0.6;

    private SolveJob() {
    }

    static Result run(SolveRequest request) {
        Duration limit = request.options().timeLimit();
        return run(request, Duration.ofMillis(Math.max(1, (long) (limit.toMillis() * EXACT_SHARE))));
    }

    /** {@link #run(SolveRequest)} with the exact path's share of the time limit given (tests force the fallback with it). */
    static Result run(SolveRequest request, Duration share) {
        return TimeLimit.within(request.options().timeLimit(), () -> solve(request, share));
    }

    private static Result solve(SolveRequest request, Duration share) {
        Options options = request.options();
        try {
            List<Rational> points = Points.parse(options.points());
            Problem problem = problem(request.input(), options);
            if (options.allDigits() || NumericFallback.refusal(problem, points).isPresent()) {
                return exact(problem, points, options);
            }
            Optional<Result> exact = TimeLimit.within(share, () -> Optional.of(exact(problem, points, options)), Optional.empty());
            if (exact.isPresent()) {
                return exact.get();
            }
            return new Result.Numeric(NumericFallback.solve(problem, options.digits(), points, "the exact path did not finish within "
                    + share.toMillis() / 1000.0 + " s, its share of the " + options.timeLimit().toSeconds() + " s time limit"));
        } catch (ConditionsException e) {
            return unfit(e);
        } catch (InputException e) {
            return refused(e);
        }
    }

    /** The refusal of bad input: its message, the input it names ({@code ""} when none) and the place. */
    static Result.Refused refused(InputException e) {
        return new Result.Refused(e.getMessage(), e.source() == null ? "" : e.source(), e.position());
    }

    /** Conditions without one solution: contradictory, or leaving a solution free. */
    static Result unfit(ConditionsException e) {
        return e.contradictory() ? new Result.Contradictory(e.getMessage())
                : new Result.Underdetermined(e.getMessage(), e.freeSolution());
    }

    /** The exact path: solve, verify, analyse; bad input and unfit conditions pass through as exceptions. */
    private static Result exact(Problem problem, List<Rational> points, Options options) {
        Solution solution = Solver.solve(problem);
        Optional<String> refusal = ValueRequests.refusal(solution, points, options.allDigits());
        if (refusal.isPresent()) {
            return new Result.Refused(refusal.get(), "", -1);
        }
        Analysis analysis = new Analyzer(options.digits(), options.plots(), options.allDigits()).analyze(solution, points);
        Report report = new Report(solution, analysis, options.digits(), options.numeric());
        boolean code = options.code() && CodeRequests.fitted(report).isEmpty();
        return classify(code ? report.withCode(CodeModels.of(report)) : report);
    }

    private static Problem problem(SolveRequest.Input input, Options options) {
        if (input instanceof SolveRequest.Input.Text t) {
            return ProblemParser.parse(t.problem(), t.given(), options.variable().orElse(null));
        }
        if (input instanceof SolveRequest.Input.Model m) {
            return m.problem();
        }
        throw new AssertionError(input);
    }

    private static Result classify(Report report) {
        if (!report.verified()) {
            return new Result.CheckFailed(report, Stream.concat(report.solution().checks().stream(), report.numericChecks().stream())
                    .filter(Check::failed).map(Check::name).toList());
        }
        boolean general = report.solution().problem().conditions().isEmpty();
        return general ? new Result.General(report) : new Result.Solved(report);
    }
}
