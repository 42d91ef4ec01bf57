package dev.rootform.api.batch;

import dev.rootform.api.ParametricExporters;
import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.ReportRenderer;
import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.symbolic.model.InputException;
import java.time.Duration;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * A {@code solve} line with parameters, as {@code rootform solve --params}: {@code problem} (the
 * conditions after the equation; {@code given} is not taken), {@code params} (the names,
 * comma-separated), {@code where} (sign conditions), {@code at} (values of every parameter), {@code var}
 * and the {@link OutputFields} ({@code valuesAt} are used at {@code at}). The answer is
 * {@link Rootform#solveWithParameters}'s in a format of {@link ParametricExporters} (default its JSON);
 * exit codes as on the command line: 0 verified, 3 a check failed, 2 bad input or out of scope,
 * 1 out of time.
 */
final class ParametricLine {
    private ParametricLine() {
    }

    /** Whether the line asks for parameters: it has {@code params}, {@code where} or {@code at}. */
    static boolean asked(Fields f) {
        return f.text("params").isPresent() || f.text("where").isPresent() || f.text("at").isPresent();
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        String parameters = f.text("params").orElseThrow(() -> new InputException(
                "\"" + (f.text("where").isPresent() ? "where" : "at") + "\" needs \"params\"", "", -1));
        String problem = f.requiredText("problem");
        if (!f.texts("given", false).isEmpty()) {
            throw new InputException("\"given\" is not taken with \"params\": write the conditions after the equation", "", -1);
        }
        String format = f.text("format").orElse("json");
        ReportRenderer<ParametricReport> renderer = ParametricExporters.byName(format).orElseThrow(() -> new InputException(
                "\"format\" " + format + " is not available with \"params\" (" + String.join(", ", ParametricExporters.names()) + ")",
                "", -1));
        if (f.text("header").isPresent()) {
            throw new InputException("\"header\" is not taken with \"params\" (the C function has no header file)", "", -1);
        }
        OutputFields.Output output = OutputFields.output(f);
        ParametricRequest request = new ParametricRequest(problem, parameters, f.text("where").orElse(""), f.text("at"),
                OutputFields.options(f, defaultTimeLimit, false).variable(f.text("var").orElse(null)).build());
        return () -> reply(Rootform.solveWithParameters(request), output, renderer);
    }

    private static Reply reply(ParametricResult result, OutputFields.Output output, ReportRenderer<ParametricReport> renderer) {
        if (result instanceof ParametricResult.NotSolved n) {
            return new Reply.Failed(ResultText.explain(n.result()), n.result() instanceof Result.OutOfTime ? 1 : 2);
        }
        ParametricReport report = ((ParametricResult.Solved) result).report();
        Optional<String> refusal = renderer.refusal(report);
        if (refusal.isPresent()) {
            return new Reply.Failed(refusal.get(), 2);
        }
        return output.rendered(renderer.render(report, output.names()), report.verified() ? 0 : 3);
    }
}
