package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.code.CodeModels;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.ValueRequests;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/** One solve: parse, solve exactly, verify, analyse numerically, and classify the outcome. */
final class SolveJob {
    private SolveJob() {
    }

    static Result run(SolveRequest request) {
        return TimeLimit.within(request.options().timeLimit(), () -> solve(request));
    }

    private static Result solve(SolveRequest request) {
        Options options = request.options();
        try {
            List<Rational> points = Points.parse(options.points());
            Problem problem = problem(request.input(), options);
            Solution solution = Solver.solve(problem);
            Optional<String> refusal = ValueRequests.refusal(solution, points);
            if (refusal.isPresent()) {
                return new Result.Refused(refusal.get(), "", -1);
            }
            Analysis analysis = new Analyzer(options.digits()).analyze(solution, points);
            Report report = new Report(solution, analysis, options.digits(), options.numeric());
            boolean code = options.code() && CodeRequests.fitted(report).isEmpty();
            return classify(code ? report.withCode(CodeModels.of(report)) : report);
        } catch (ConditionsException e) {
            return e.contradictory() ? new Result.Contradictory(e.getMessage())
                    : new Result.Underdetermined(e.getMessage(), e.freeSolution());
        } catch (InputException e) {
            return new Result.Refused(e.getMessage(), e.source() == null ? "" : e.source(), e.position());
        }
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
