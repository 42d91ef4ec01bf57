package dev.rootform.cli;

import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.Analysis;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.ValueRequests;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import java.util.List;

/**
 * The whole job for one input: parse, solve exactly, verify, analyse numerically, and collect the
 * report that renderers format.
 *
 * @since 0.1
 */
public final class Pipeline {
    private Pipeline() {
    }

    /** {@link #run(String, List, String, int, List, boolean)} with exact presentation. */
    public static Report run(String text, List<String> given, String variable, int digits, List<Rational> points) {
        return run(text, given, variable, digits, points, false);
    }

    /**
     * @param text equation and optional conditions separated by {@code ;}
     * @param given further conditions, one per string
     * @param variable independent variable of a differential equation, or null for the default
     * @param digits significant digits of numeric output
     * @param points where to evaluate the solution
     * @param numeric show constants and roots as decimals only
     * @throws InputException for bad or out-of-scope input
     */
    public static Report run(String text, List<String> given, String variable, int digits, List<Rational> points,
            boolean numeric) {
        Problem problem = ProblemParser.parse(text, given, variable);
        Solution solution = Solver.solve(problem);
        ValueRequests.refusal(solution, points).ifPresent(message -> {
            throw new InputException(message, "", -1);
        });
        Analysis analysis = new Analyzer(digits).analyze(solution, points);
        return new Report(solution, analysis, digits, numeric);
    }
}
