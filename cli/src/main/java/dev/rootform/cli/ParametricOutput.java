package dev.rootform.cli;

import dev.rootform.api.ParametricExporters;
import dev.rootform.api.ParametricRequest;
import dev.rootform.api.ParametricResult;
import dev.rootform.api.ReportRenderer;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.symbolic.model.InputException;
import java.util.Optional;

/** {@code solve --params}: the answer with parameters in a format of {@link ParametricExporters}, and its exit code. */
final class ParametricOutput {
    private ParametricOutput() {
    }

    static int print(SolveCommand command) {
        if (command.params == null) {
            throw new InputException((command.where != null ? "--where" : "--at") + " needs --params", "", -1);
        }
        if (!command.given.isEmpty()) {
            throw new InputException("--given is not taken with --params: write the conditions after the equation", "", -1);
        }
        String format = command.out.format;
        ReportRenderer<ParametricReport> renderer = ParametricExporters.byName(format, command.out.documentOptions())
                .orElseThrow(() -> new InputException("--format " + format + " is not available with --params ("
                        + String.join(", ", ParametricExporters.names()) + ")", "", -1));
        CodeNames names = command.out.codeNames();
        ParametricRequest request = new ParametricRequest(command.input, command.params, command.where == null ? "" : command.where,
                Optional.ofNullable(command.at), command.out.options(command.variable));
        ParametricResult result = Rootform.solveWithParameters(request);
        if (result instanceof ParametricResult.NotSolved n) {
            return ErrorLine.print(command.spec.commandLine().getErr(), ErrorLine.describe(n.result()),
                    n.result() instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT);
        }
        ParametricReport report = ((ParametricResult.Solved) result).report();
        OutputOptions.refuse(renderer.refusal(report));
        return command.out.print(renderer.render(report, names), report.verified() ? ExitCode.VERIFIED : ExitCode.CHECK_FAILED,
                command.spec);
    }
}
