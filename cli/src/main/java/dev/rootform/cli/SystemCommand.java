package dev.rootform.cli;

import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SystemExporters;
import dev.rootform.api.SystemRequest;
import dev.rootform.api.SystemResult;
import dev.rootform.export.document.SystemReport;
import dev.rootform.symbolic.model.InputException;
import java.io.PrintWriter;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.function.BiFunction;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rootform system}: a state-space model in, e^(At) or A^n, the transfer matrix, the
 * response, stability and the Kalman ranks out. Exit 0 verified, 2 bad input, 3 a check failed,
 * 1 out of time or internal.
 */
@Command(name = "system", description = "Analyse a linear state-space model exactly: e^(At) or A^n, transfer matrix, "
        + "response, stability, controllability and observability.", mixinStandardHelpOptions = true, sortOptions = false)
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

    @Option(names = "--to", paramLabel = "INPUT", description = "The input on every input channel: impulse, step, or a "
            + "forcing such as \"sin(2t)\" or \"(1/2)^n\".")
    String to;

    @Mixin
    OutputOptions out;

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
            out.check();
            if (out.documentOptions().withCode().isPresent()) {
                throw new InputException("--with-code is not available for a state-space page (use --format java or c)", "", -1);
            }
            if (out.documentOptions().standalone()) {
                throw new InputException("--standalone is not available for a state-space answer: its LaTeX is a fragment", "", -1);
            }
            SystemRequest request = mode.continuous ? SystemRequest.continuous(a) : SystemRequest.discrete(a);
            request = with(with(with(with(with(request, b, SystemRequest::withB), c, SystemRequest::withC), d,
                    SystemRequest::withD), x0, SystemRequest::withX0), to, SystemRequest::withInput).with(out.options(null));
            SystemResult result = Rootform.system(request);
            Optional<SystemReport> answer = result.answer();
            if (answer.isEmpty()) {
                Result reason = ((SystemResult.NoAnswer) result).reason();
                // a scalar part answered only numerically (the exact path ran out of its time) ends like a time-out
                return ErrorLine.print(err, ErrorLine.describe(reason),
                        reason instanceof Result.OutOfTime || reason instanceof Result.Numeric ? ExitCode.INTERNAL : ExitCode.BAD_INPUT);
            }
            return out.print(SystemExporters.render(answer.get(), out.format, out.codeNames()),
                    result instanceof SystemResult.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED, spec);
        } catch (InputException e) {
            return ErrorLine.print(err, ErrorLine.describe(e), ExitCode.BAD_INPUT);
        }
    }

    private static SystemRequest with(SystemRequest r, String value, BiFunction<SystemRequest, String, SystemRequest> f) {
        return value == null ? r : f.apply(r, value);
    }
}
