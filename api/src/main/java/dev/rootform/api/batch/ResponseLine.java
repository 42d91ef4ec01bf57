package dev.rootform.api.batch;

import dev.rootform.api.ReportRenderer;
import dev.rootform.api.ResponseExporters;
import dev.rootform.api.ResponseRequest;
import dev.rootform.api.ResponseResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ResponseReport;
import java.time.Duration;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;

/**
 * The {@code response} command of a batch: {@code transfer} (required, e.g.
 * {@code "H(s) = 1/(s + 1)"}), {@code to} (the input, default {@code impulse}), {@code frequencies}
 * (an array or one comma-separated string) and the {@link OutputFields}. The answer is that of
 * {@code rootform response} in the format asked (default its JSON); exit codes as on the command
 * line: 0 answered and verified, 2 bad input or out of scope, 3 a check failed, 1 out of time.
 */
final class ResponseLine {
    private ResponseLine() {
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        String transfer = f.requiredText("transfer");
        String input = f.text("to").orElse(ResponseRequest.DEFAULT_INPUT);
        OutputFields.Output output = OutputFields.output(f);
        ReportRenderer<ResponseReport> renderer = ResponseExporters.byName(output.exporter().format()).orElseThrow();
        ResponseRequest request = ResponseRequest.of(transfer).to(input).frequencies(f.texts("frequencies", true))
                .with(OutputFields.options(f, defaultTimeLimit, output.code()).plots(output.exporter().format().equals("html"))
                        .build());
        return () -> reply(Rootform.response(request), output, renderer);
    }

    private static Reply reply(ResponseResult result, OutputFields.Output output, ReportRenderer<ResponseReport> renderer) {
        if (result instanceof ResponseResult.Unanswered u) {
            return output.reply(u.result(), UnaryOperator.identity());
        }
        ResponseReport report = result.answer().orElseThrow();
        Optional<String> refusal = renderer.refusal(report);
        if (refusal.isPresent()) {
            return new Reply.Failed(refusal.get(), 2);
        }
        return output.rendered(renderer.render(report, output.names()), result instanceof ResponseResult.CheckFailed ? 3 : 0);
    }
}
