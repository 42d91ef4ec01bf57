package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.params.Assumptions;
import dev.rootform.symbolic.params.ParameterValues;
import dev.rootform.symbolic.params.ParametricAnswer;
import dev.rootform.symbolic.params.ParametricProblem;
import dev.rootform.symbolic.params.ParametricSolver;
import dev.rootform.symbolic.parse.ParametricParser;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** One solve with parameters: read, solve in cases, check by specialisation, specialise at {@code at}. */
final class ParametricJob {
    private ParametricJob() {
    }

    static ParametricResult run(ParametricRequest request) {
        ParametricResult late = new ParametricResult.NotSolved(new Result.OutOfTime(request.options().timeLimit()));
        return TimeLimit.within(request.options().timeLimit(), () -> solve(request), late);
    }

    private static ParametricResult solve(ParametricRequest request) {
        try {
            List<String> names = ParametricParser.names(request.parameters());
            Assumptions where = Assumptions.parse(request.where(), names);
            Optional<Map<String, Rational>> at = request.at().map(text -> ParameterValues.parse(text, names));
            if (at.isPresent() && !where.holdAt(at.get())) {
                throw new InputException("the values of --at do not satisfy --where (" + where + ")", request.at().get(), 0);
            }
            Points.parse(request.options().points());
            ParametricProblem problem = ParametricParser.parse(request.problem(), names, request.options().variable().orElse(null));
            ParametricAnswer answer = ParametricSolver.solve(problem, where);
            List<ParametricReport.Agreement> checks = new ArrayList<>(Specialiser.randomChecks(answer));
            Optional<ParametricReport.Specialisation> specialised = Optional.empty();
            if (at.isPresent()) {
                int number = Specialiser.caseAt(answer, at.get());
                if (number == 0 && !answer.cases().isEmpty()) {
                    throw new InputException("no derived case holds at " + request.at().get()
                            + (answer.notes().isEmpty() ? "" : " (" + String.join("; ", answer.notes()) + ")"), request.at().get(), 0);
                }
                String text = ParametricParser.substitute(problem, at.get());
                Result result = Rootform.solve(SolveRequest.of(text).with(request.options()));
                Optional<Report> report = result.answer();
                if (report.isEmpty()) {
                    return new ParametricResult.NotSolved(result);
                }
                specialised = Optional.of(new ParametricReport.Specialisation(at.get(), number, text, report.get()));
                Specialiser.agreement(answer, at.get(), number, request.options()).ifPresent(checks::add);
            }
            return new ParametricResult.Solved(new ParametricReport(answer, checks, specialised));
        } catch (InputException e) {
            return new ParametricResult.NotSolved(SolveJob.refused(e));
        }
    }
}
