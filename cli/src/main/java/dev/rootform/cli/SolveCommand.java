package dev.rootform.cli;

import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.symbolic.parse.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code rootform solve}: one equation in, one verified answer out. */
@Command(name = "solve", description = "Solve a linear constant-coefficient difference or differential equation exactly.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class SolveCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "EQUATION",
            description = "The equation, optionally followed by conditions, separated by ';', e.g. \"y'' + 2y' + 5y = 0; y(0)=1; y'(0)=0\".")
    String input;

    @Option(names = "--given", paramLabel = "COND", description = "A condition such as y(0)=1 or x[5]=8 (repeatable).")
    List<String> given = new ArrayList<>();

    @Option(names = "--var", paramLabel = "NAME", description = "Independent variable of a differential equation (default t).")
    String variable;

    @Mixin
    AnswerOptions answer;

    @Mixin
    CodeOptions code;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        try {
            Exporter exporter = Exporters.byName(answer.format).orElseThrow(() -> answer.unknownFormat(Exporters.names()));
            CodeNames names = code.names(answer.format);
            Options options = answer.options().variable(variable).build();
            Result result = Rootform.solve(SolveRequest.of(input, given).with(options));
            Optional<Report> report = result.answer();
            if (report.isEmpty()) {
                err.println(Diagnostics.describe(result));
                err.flush();
                return result instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT;
            }
            Rendering rendering = exporter.render(report.get(), names);
            if (code.header != null) {
                Output.write(spec.commandLine().getOut(), code.header, rendering.header().orElseThrow());
            }
            Output.write(spec.commandLine().getOut(), answer.output, rendering.text());
            return result instanceof Result.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED;
        } catch (InputException e) {
            err.println(Diagnostics.describe(e));
            err.flush();
            return ExitCode.BAD_INPUT;
        }
    }
}
