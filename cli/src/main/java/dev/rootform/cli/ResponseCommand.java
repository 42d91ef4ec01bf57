package dev.rootform.cli;

import dev.rootform.api.ReportRenderer;
import dev.rootform.api.ResponseExporters;
import dev.rootform.api.ResponseRequest;
import dev.rootform.api.ResponseResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.symbolic.model.InputException;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.UnaryOperator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rootform response}: a transfer function in, its exact facts and its response out. Exit 0
 * verified, 2 bad input or out of scope, 3 a check failed, 1 out of time or internal.
 */
@Command(name = "response", description = "Analyse a transfer function H(s) or H(z) and give its response in closed form.",
        mixinStandardHelpOptions = true, sortOptions = false)
final class ResponseCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "TRANSFER",
            description = "The transfer function, e.g. \"H(s) = (s + 3)/(s^2 + 2s + 5)\", \"H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)\""
                    + " or \"G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)\".")
    String transfer;

    @Option(names = "--to", paramLabel = "INPUT",
            description = "The input from zero initial state: impulse (default), step, ramp, or a forcing such as sin(2t), e^(-t), (1/2)^n.")
    String to = ResponseRequest.DEFAULT_INPUT;

    @Option(names = "--frequencies", paramLabel = "LIST",
            description = "Comma-separated frequencies for |H|, dB and phase: rad/s for s, rad/sample for z (e.g. 0.1,1,10 or pi/4,pi/2).")
    String frequencies;

    @Mixin
    OutputOptions out;

    @Override
    public Integer call() {
        try {
            out.check();
            if (out.documentOptions().standalone()) {
                throw new InputException("--standalone is not available for a response: its LaTeX is a fragment", "", -1);
            }
            ReportRenderer<ResponseReport> renderer = ResponseExporters.byName(out.format, out.documentOptions()).orElseThrow(() -> new InputException(
                    "--format " + out.format + " is not available for a response; use one of "
                            + String.join(", ", ResponseExporters.names()), "", -1));
            List<String> list = frequencies == null ? List.of() : List.of(frequencies.split(",", -1));
            ResponseResult result = Rootform.response(ResponseRequest.of(transfer).to(to).frequencies(list).with(out.options(null)));
            if (result instanceof ResponseResult.Unanswered u) {
                return out.print(u.result(), UnaryOperator.identity(), spec);
            }
            ResponseReport report = result.answer().orElseThrow();
            OutputOptions.refuse(renderer.refusal(report));
            out.write(renderer.render(report, out.codeNames()), spec.commandLine().getOut());
            return result instanceof ResponseResult.CheckFailed ? ExitCode.CHECK_FAILED : ExitCode.VERIFIED;
        } catch (InputException e) {
            return ErrorLine.print(spec.commandLine().getErr(), ErrorLine.describe(e), ExitCode.BAD_INPUT);
        }
    }
}
