package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.Exporters;
import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Rendering;
import dev.rootform.export.Report;
import dev.rootform.symbolic.model.InputException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The {@code solve} command of a batch: the fields of {@link SolveFields} plus {@code format}
 * (default {@code json}). The answer is the solve's JSON document, or for another format
 * {@code {"format", "text"}} (and {@code "header"} for C with a header file). Exit codes as
 * {@code rootform solve}: 0 solved, 3 a check failed, 2 refused, 1 out of time.
 */
final class SolveLine {
    private static final String JSON = "json";

    private SolveLine() {
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        SolveRequest request = SolveFields.request(f, defaultTimeLimit);
        String format = f.text("format").orElse(JSON);
        Exporter exporter = Exporters.byName(format).orElseThrow(() -> new InputException(
                "\"format\" " + format + " is not one of " + String.join(", ", Exporters.names()), "", -1));
        CodeNames names = SolveFields.codeNames(f, format);
        return () -> reply(Rootform.solve(request), exporter, names);
    }

    private static Reply reply(Result result, Exporter exporter, CodeNames names) {
        Optional<Report> answer = result.answer();
        if (answer.isEmpty()) {
            return new Reply.Failed(ResultText.explain(result), result instanceof Result.OutOfTime ? 1 : 2);
        }
        Optional<String> refusal = exporter.refusal(answer.get());
        if (refusal.isPresent()) {
            return new Reply.Failed(refusal.get(), 2);
        }
        int exit = result instanceof Result.CheckFailed ? 3 : 0;
        Rendering rendering = exporter.render(answer.get(), names);
        if (exporter.format().equals(JSON)) {
            return new Reply.Answered(parse(rendering.text()), exit);
        }
        ObjectNode body = Json.object().put("format", exporter.format()).put("text", rendering.text());
        rendering.header().ifPresent(h -> body.put("header", h));
        return new Reply.Answered(body, exit);
    }

    private static ObjectNode parse(String json) {
        try {
            return (ObjectNode) Json.read(json);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
