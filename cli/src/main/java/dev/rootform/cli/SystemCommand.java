package dev.rootform.cli;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SystemExporters;
import dev.rootform.api.SystemRequest;
import dev.rootform.api.SystemResult;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Identifiers;
import dev.rootform.export.Rendering;
import dev.rootform.export.document.SystemReport;
import dev.rootform.symbolic.parse.InputException;
import java.io.PrintWriter;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code rootform system}: a state-space model in, e^(At) or A^n, transfer matrix and response out. */
@Command(name = "system", description = "Analyse a linear state-space model exactly: e^(At) or A^n, transfer matrix, response, stability, controllability and observability.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class SystemCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--a", required = true, paramLabel = "MATRIX", description = "The n×n matrix A as a JSON array of rows, e.g. \"[[0,1],[-5,-2]]\".")
    String a;

    @Option(names = "--b", paramLabel = "MATRIX", description = "The n×m input matrix B, e.g. \"[[0],[1]]\".")
    String b;

    @Option(names = "--c", paramLabel = "MATRIX", description = "The p×n output matrix C, e.g. \"[[1,0]]\".")
    String c;

    @Option(names = "--d", paramLabel = "MATRIX", description = "The p×m feedthrough matrix D (default 0).")
    String d;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Mode mode;

    @Option(names = "--x0", paramLabel = "VECTOR", description = "The initial state, e.g. \"[1,0]\" (default 0).")
    String x0;

    @Option(names = "--to", paramLabel = "INPUT", description = "The input on every input channel: impulse, step, or a forcing such as \"sin(2t)\" or \"(1/2)^n\".")
    String to;

    @Option(names = "--values-at", paramLabel = "LIST", description = "Comma-separated times t or indices n at which to print the states and outputs.")
    String valuesAt;

    @Option(names = "--digits", paramLabel = "N", description = "Significant digits of numeric output (default ${DEFAULT-VALUE}).")
    int digits = Options.DEFAULT_DIGITS;

    @Option(names = "--format", paramLabel = "FORMAT", description = "Output format: text, json, latex, mathml, java, c (default ${DEFAULT-VALUE}).")
    String format = "text";

    @Option(names = "--class", paramLabel = "NAME", description = "Name of the generated Java class (default ${DEFAULT-VALUE}).")
    String className = CodeNames.DEFAULT_CLASS;

    @Option(names = "--function", paramLabel = "NAME", description = "Name of the generated C function (default ${DEFAULT-VALUE}).")
    String function = CodeNames.DEFAULT_FUNCTION;

    @Option(names = "--time-limit", paramLabel = "SECONDS", description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    /** Exactly one of --continuous and --discrete. */
    static final class Mode {
        @Option(names = "--continuous", required = true, description = "x' = Ax + Bu, y = Cx + Du.")
        boolean continuous;

        @Option(names = "--discrete", required = true, description = "x[n+1] = Ax[n] + Bu[n], y[n] = Cx[n] + Du[n].")
        boolean discrete;
    }

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        try {
            if (digits < 1 || digits > Options.MAX_DIGITS) {
                throw new InputException("--digits " + digits + " is out of range 1.." + Options.MAX_DIGITS, "", -1);
            }
            if (!SystemExporters.names().contains(format)) {
                throw new InputException("--format " + format + " is not one of " + String.join(", ", SystemExporters.names()), "", -1);
            }
            if (timeLimit < 1) {
                throw new InputException("--time-limit " + timeLimit + " must be at least 1 second", "", -1);
            }
            Identifiers.javaClass(className);
            Identifiers.cFunction("--function", function);
            Options options = Options.builder().digits(digits).points(valuesAt == null ? List.of() : List.of(valuesAt.split(",", -1)))
                    .timeLimit(Duration.ofSeconds(timeLimit)).build();
            SystemRequest request = mode.continuous ? SystemRequest.continuous(a) : SystemRequest.discrete(a);
            request = with(with(with(with(with(request, b, SystemRequest::withB), c, SystemRequest::withC), d, SystemRequest::withD),
                    x0, SystemRequest::withX0), to, SystemRequest::withInput).with(options);
            SystemResult result = Rootform.system(request);
            Optional<SystemReport> answer = result.answer();
            if (answer.isEmpty()) {
                Result reason = ((SystemResult.NoAnswer) result).reason();
                err.println(Diagnostics.describe(reason));
                err.flush();
                return reason instanceof Result.OutOfTime ? ExitCode.INTERNAL : ExitCode.BAD_INPUT;
            }
            Rendering rendering = SystemExporters.render(answer.get(), format,
                    new CodeNames(Optional.empty(), className, function, Optional.empty()));
            PrintWriter out = spec.commandLine().getOut();
            out.print(rendering.text().endsWith("\n") ? rendering.text() : rendering.text() + System.lineSeparator());
            out.flush();
            return result instanceof SystemResult.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED;
        } catch (InputException e) {
            err.println(Diagnostics.describe(e));
            err.flush();
            return ExitCode.BAD_INPUT;
        }
    }

    private static SystemRequest with(SystemRequest r, String value, java.util.function.BiFunction<SystemRequest, String, SystemRequest> f) {
        return value == null ? r : f.apply(r, value);
    }
}
