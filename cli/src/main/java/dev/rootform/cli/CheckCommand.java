package dev.rootform.cli;

import dev.rootform.api.CheckRequest;
import dev.rootform.api.CheckResult;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ClaimJsonRenderer;
import dev.rootform.export.document.ClaimReport;
import dev.rootform.export.document.ClaimTextRenderer;
import dev.rootform.symbolic.model.InputException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.function.Function;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code rootform check}: does a claimed closed form solve the problem? Exit 0 holds, 4 fails. */
@Command(name = "check", description = "Check a claimed closed form against the exact solution of a problem.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class CheckCommand implements Callable<Integer> {
    private static final Map<String, Function<ClaimReport, String>> FORMATS =
            Map.of("text", ClaimTextRenderer::render, "json", ClaimJsonRenderer::render);

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "EQUATION",
            description = "The equation with its conditions, separated by ';', e.g. \"x[n+1] = 2x[n] + 1; x[0] = 1\".")
    String input;

    @Option(names = "--claim", required = true, paramLabel = "FORMULA",
            description = "The claimed solution, e.g. \"2^(n+1) - 1\" or \"y(t) = e^(-t)(cos(2t) + 1/2 sin(2t))\".")
    String claim;

    @Option(names = "--given", paramLabel = "COND", description = "A condition such as y(0)=1 or x[5]=8 (repeatable).")
    List<String> given = new ArrayList<>();

    @Option(names = "--var", paramLabel = "NAME", description = "Independent variable of a differential equation (default t).")
    String variable;

    @Option(names = "--format", paramLabel = "FORMAT", description = "Output format: text or json (default ${DEFAULT-VALUE}).")
    String format = "text";

    @Option(names = "--digits", paramLabel = "N", description = "Significant digits of numeric parts (default ${DEFAULT-VALUE}).")
    int digits = Options.DEFAULT_DIGITS;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Give up after this many seconds (default ${DEFAULT-VALUE}); exit code 1.")
    int timeLimit = 300;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        try {
            Function<ClaimReport, String> renderer = FORMATS.get(format);
            if (renderer == null) {
                throw new InputException("--format " + format + " is not one of text, json", "", -1);
            }
            Options options = OutputOptions.limits(digits, timeLimit).variable(variable).build();
            CheckResult result = Rootform.check(new CheckRequest(input, given, claim, options));
            if (result instanceof CheckResult.Unchecked u) {
                return ErrorLine.print(err, ErrorLine.describe(u.reason()), u.reason() instanceof Result.OutOfTime
                        || u.reason() instanceof Result.CheckFailed ? ExitCode.INTERNAL : ExitCode.BAD_INPUT);
            }
            String text = renderer.apply(result.report().orElseThrow());
            PrintWriter out = spec.commandLine().getOut();
            out.print(text.endsWith("\n") ? text : text + System.lineSeparator());
            out.flush();
            return result instanceof CheckResult.Holds ? ExitCode.VERIFIED : ExitCode.CLAIM_FAILS;
        } catch (InputException e) {
            return ErrorLine.print(err, ErrorLine.describe(e), ExitCode.BAD_INPUT);
        }
    }
}
