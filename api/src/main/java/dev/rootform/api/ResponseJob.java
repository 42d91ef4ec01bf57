package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.code.CodeModels;
import dev.rootform.export.code.CodeRequests;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.ValueRequests;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.numeric.response.Frequency;
import dev.rootform.numeric.response.FrequencySweep;
import dev.rootform.numeric.response.StepFigureFinder;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.TransferParser;
import dev.rootform.symbolic.response.Input;
import dev.rootform.symbolic.response.ResponseBuilder;
import dev.rootform.symbolic.response.ResponsePlan;
import dev.rootform.symbolic.response.SolveSyntax;
import dev.rootform.symbolic.response.TransferFacts;
import dev.rootform.symbolic.response.TransformCheck;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * One response: read the transfer function and the input, state its exact facts, plan the
 * response as an initial-value problem, solve and verify it (plus the inverse-transform check),
 * and add the frequency response and step figures.
 */
final class ResponseJob {
    private ResponseJob() {
    }

    static ResponseResult run(ResponseRequest request) {
        Options o = request.options();
        return TimeLimit.within(o.timeLimit(), () -> respond(request), new ResponseResult.Unanswered(new Result.OutOfTime(o.timeLimit())));
    }

    private static ResponseResult respond(ResponseRequest request) {
        Options o = request.options();
        try {
            TransferFunction h = TransferParser.parse(request.transfer());
            Input input = Input.parse(request.input(), h.domain());
            List<Frequency> frequencies = Points.read(request.frequencies(), "frequency", Frequency::parse);
            List<Rational> points = Points.parse(o.points());
            points.stream().filter(p -> p.signum() < 0).findFirst().ifPresent(p -> {
                throw new InputException("value at " + p + ": the response starts at " + (h.continuous() ? "t" : "n")
                        + " = 0 (it is 0 before)", String.join(",", o.points()), -1);
            });
            TransferFacts facts = TransferFacts.of(h);
            ResponsePlan plan = ResponseBuilder.plan(h, input);
            Solution solution = withResponseParts(Solver.solve(plan.problem()), plan);
            Optional<String> refusal = ValueRequests.refusal(solution, points, o.allDigits());
            if (refusal.isPresent()) {
                return new ResponseResult.Unanswered(new Result.Refused(refusal.get(), "", -1));
            }
            Analysis analysis = new Analyzer(o.digits(), o.plots(), o.allDigits()).analyze(solution, points);
            Report analysed = new Report(solution, analysis, o.digits(), o.numeric());
            Report report = o.code() && CodeRequests.fitted(analysed).isEmpty() ? analysed.withCode(CodeModels.of(analysed)) : analysed;
            Optional<StepFigures> figures = stepFigures(h, input, facts, solution, o.digits());
            Optional<FrequencySweep> sweep = frequencies.isEmpty() && !o.plots() ? Optional.empty()
                    : Optional.of(new FrequencySweep(h.value(), h.continuous(), o.digits()));
            ResponseReport answer = new ResponseReport(request.transfer(), h, facts, values(facts.poleRoots(), report),
                    values(facts.zeroRoots(), report), plan, report, SolveSyntax.relation(h), SolveSyntax.problem(plan.problem()),
                    sweep.map(w -> w.at(frequencies)).orElse(List.of()), figures,
                    sweep.filter(w -> o.plots()).map(FrequencySweep::plot), warnings(h, input, facts));
            if (answer.verified()) {
                return new ResponseResult.Answered(answer);
            }
            return new ResponseResult.CheckFailed(answer, Stream.concat(solution.checks().stream(), report.numericChecks().stream())
                    .filter(c -> !c.passed()).map(Check::name).toList());
        } catch (InputException e) {
            return new ResponseResult.Unanswered(SolveJob.refused(e));
        }
    }

    /** The values of exact roots: those the solve report already has (the poles, mostly), the others computed. */
    private static List<RootApproximation> values(List<ExactRoot> roots, Report report) {
        Map<ExactRoot, RootApproximation> known = new HashMap<>();
        report.roots().forEach(r -> known.put(r.root(), r));
        List<ExactRoot> missing = roots.stream().filter(r -> !known.containsKey(r)).toList();
        Iterator<RootApproximation> computed = new Analyzer(report.digits()).approximate(missing).iterator();
        return roots.stream().map(r -> known.containsKey(r) ? known.get(r) : computed.next()).toList();
    }

    /** The solution with the inverse-transform check added and, when H has no poles, every term marked steady. */
    private static Solution withResponseParts(Solution s, ResponsePlan plan) {
        List<Check> checks = new ArrayList<>(s.checks());
        checks.add(TransformCheck.of(plan, s.exact().orElseThrow(() -> new IllegalStateException("no exact solution of "
                + plan.problem()))));
        ClosedForm f = s.closedForm();
        ClosedForm form = plan.split() == ResponsePlan.Split.STEADY_ONLY
                ? new ClosedForm(f.domain(), f.function(), f.variable(), f.origin(), f.validFrom(), f.leadingValues(), f.terms(),
                        f.freeConstants(), 0)
                : f;
        return new Solution(s.problem(), s.characteristic(), s.factors(), s.roots(), form, s.general(), s.exact(), s.particular(),
                s.radical(), s.numericParticular(), checks);
    }

    private static Optional<StepFigures> stepFigures(TransferFunction h, Input input, TransferFacts facts, Solution s, int digits) {
        if (!input.isStep() || !facts.stable() || facts.dcGain().isEmpty()) {
            return Optional.empty();
        }
        StepFigureFinder finder = new StepFigureFinder(digits);
        Rational last = facts.dcGain().get();
        return Optional.of(h.continuous() ? finder.continuous(s.exact().orElseThrow(), last)
                : finder.discrete(s.exact().orElseThrow(), last));
    }

    private static List<String> warnings(TransferFunction h, Input input, TransferFacts facts) {
        List<String> warnings = new ArrayList<>();
        for (TransferFacts.HiddenMode m : facts.hiddenModes()) {
            if (!m.stable()) {
                warnings.add("the cancelled factor " + m.factor().polynomial().toString(h.variable()) + " hides a mode that is not"
                        + " stable: it does not show in " + h.signature() + " but is still in the system (an internal"
                        + " instability that any disturbance or initial state inside the loop excites)");
            }
        }
        if (input.isStep() && !facts.stable()) {
            warnings.add("no step figures: " + h.signature() + " is not BIBO stable, so the step response has no final value");
        }
        return warnings;
    }
}
