package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.document.ClaimReport;
import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.NumericClaimCheck;
import dev.rootform.numeric.analysis.NumericFindings;
import dev.rootform.symbolic.claim.Claim;
import dev.rootform.symbolic.claim.ClaimChecker;
import dev.rootform.symbolic.claim.ClaimFindings;
import dev.rootform.symbolic.claim.ClaimParser;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Mismatch;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ConditionsException;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * One claim check: solve the problem exactly, read the claim, check it exactly where its numbers
 * allow ({@link ClaimChecker}), numerically for the rest and for a failing function's largest
 * difference on a grid ({@link NumericClaimCheck}), and put both into one {@link ClaimReport}. The
 * numeric analysis of the solution runs only when its constants are fixed numerically: the
 * solution's own exact checks stand for an exact one.
 */
final class CheckJob {
    private CheckJob() {
    }

    static CheckResult run(CheckRequest request) {
        Result.OutOfTime late = new Result.OutOfTime(request.options().timeLimit());
        return TimeLimit.within(request.options().timeLimit(), () -> check(request), new CheckResult.Unchecked(late));
    }

    private static CheckResult check(CheckRequest request) {
        Options options = request.options();
        try {
            Problem problem = ProblemParser.parse(request.problem(), request.given(), options.variable().orElse(null));
            LinearEquation eq = problem.equation();
            Solution solution = Solver.solve(problem);
            Claim claim = ClaimParser.parse(request.claim(), eq.domain(), eq.function(), eq.variable());
            ClaimFindings exact = ClaimChecker.check(solution, claim);
            boolean numeric = exact.verdict() == Decision.UNDECIDED;
            // the numeric analysis is needed only for constants that are fixed numerically
            Analysis analysis = solution.hasNumericConstants() ? new Analyzer(options.digits()).analyze(solution, List.of())
                    : new Analysis(List.of(), List.of(), List.of(), Map.of(), List.of(), Optional.empty(), List.of());
            Report report = new Report(solution, analysis, options.digits(), options.numeric());
            if (!report.verified()) {
                return new CheckResult.Unchecked(new Result.CheckFailed(report, Stream.concat(solution.checks().stream(),
                        report.numericChecks().stream()).filter(c -> !c.passed()).map(Check::name).toList()));
            }
            Map<String, BigDecimal> constants = analysis.constantValues();
            // a function claim that fails exactly is also measured on a grid; one that holds differs by 0
            boolean grid = eq.domain() == Domain.DIFFERENTIAL && exact.verdict() == Decision.FAILS;
            ClaimReport checked = numeric
                    ? withNumeric(report, claim, exact, NumericClaimCheck.check(solution, constants, claim, options.digits()))
                    : exactly(report, claim, exact, grid
                            ? NumericClaimCheck.largestDifference(solution, constants, claim, options.digits())
                            : exact.firstMismatch());
            return checked.holds() ? new CheckResult.Holds(checked) : new CheckResult.Fails(checked);
        } catch (ConditionsException e) {
            return new CheckResult.Unchecked(SolveJob.unfit(e));
        } catch (InputException e) {
            return new CheckResult.Unchecked(SolveJob.refused(e));
        } catch (UnsupportedOperationException e) {
            return new CheckResult.Unchecked(new Result.Refused(e.getMessage(), request.claim(), -1));
        }
    }

    /** Every part decided exactly; a function's largest difference on the grid is the one numeric figure. */
    private static ClaimReport exactly(Report report, Claim claim, ClaimFindings exact, Optional<Mismatch> mismatch) {
        return new ClaimReport(report, claim.text(), claim.formula().toString(), exact.asRead(),
                exact.verdict() == Decision.HOLDS, true, report.digits(), exact.equation(), exact.conditions(), mismatch,
                exact.slips(), List.of());
    }

    /** The exact parts where they were decided, the numeric ones for the rest. */
    private static ClaimReport withNumeric(Report report, Claim claim, ClaimFindings exact, NumericFindings numeric) {
        EquationFinding equation = exact.equation().decision() != Decision.UNDECIDED ? exact.equation() : numeric.equation();
        List<ConditionFinding> conditions = new ArrayList<>();
        for (int i = 0; i < exact.conditions().size(); i++) {
            ConditionFinding e = exact.conditions().get(i);
            // an exact undecided condition is one the claim does not cover
            conditions.add(e.decision() != Decision.UNDECIDED || e.exact() ? e : numeric.conditions().get(i));
        }
        List<String> notes = new ArrayList<>();
        exact.inexact().ifPresent(reason -> notes.add("numeric check, because " + reason + " (no exact form here)"));
        notes.add("compared to " + numeric.digits() + " significant digits at " + numeric.samples()
                + "; a numeric verdict is evidence at these points, not a proof");
        return new ClaimReport(report, claim.text(), claim.formula().toString(), exact.asRead(),
                numeric.verdict() == Decision.HOLDS, false, numeric.digits(), equation, conditions, numeric.mismatch(),
                List.of(), notes);
    }
}
