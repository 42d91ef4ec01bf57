package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Exporter;
import dev.rootform.export.Report;
import java.util.Optional;
import dev.rootform.symbolic.model.InputException;

/**
 * A build-time spec: one JSON object that names a problem and the Java evaluator to generate for
 * it, with the fields of a batch {@code solve} request that concern Java code:
 * <pre>{@code {"problem": "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1",
 *  "class": "Fibonacci", "package": "com.example.sequences", "digits": 30}}</pre>
 * {@code problem} is required; {@code given}, {@code var}, {@code digits}, {@code numeric},
 * {@code timeLimit} (seconds, default {@link Options#DEFAULT_TIME_LIMIT}), {@code class} (default
 * {@code Solution}), {@code package} (default none) and {@code description} (free text, ignored)
 * are optional; any other field is refused.
 *
 * @since 0.2
 */
public final class EvaluatorSpec {
    private EvaluatorSpec() {
    }

    /**
     * Solves the spec's problem and writes its Java evaluator with the {@code java} exporter. Only a
     * solution with fitted constants whose every check held gives code; never throws.
     */
    public static GeneratedCode generate(String specJson) {
        try {
            JsonNode node = Json.read(specJson);
            if (node == null || !node.isObject()) {
                return new GeneratedCode.Failure("the spec is not a JSON object");
            }
            Fields f = new Fields((ObjectNode) node);
            f.text("description");
            SolveRequest request = SolveLine.request(f, Options.DEFAULT_TIME_LIMIT, true);
            CodeNames names = OutputFields.javaNames(f);
            f.rejectUnknown("a spec");
            return generate(Rootform.solve(request), names);
        } catch (JsonProcessingException e) {
            return new GeneratedCode.Failure("the spec is not JSON: " + e.getOriginalMessage());
        } catch (InputException e) {
            return new GeneratedCode.Failure(ResultText.refusal(e.getMessage(), e.source(), e.position()));
        }
    }

    private static GeneratedCode generate(Result result, CodeNames names) {
        if (result instanceof Result.CheckFailed c) {
            return new GeneratedCode.Failure("a check failed: " + String.join(", ", c.failed()));
        }
        if (result.answer().isEmpty()) {
            return new GeneratedCode.Failure(ResultText.explain(result));
        }
        Report report = result.answer().get();
        Exporter java = Exporters.byName("java").orElseThrow();
        Optional<String> refusal = java.refusal(report);
        if (refusal.isPresent()) {
            return new GeneratedCode.Failure(refusal.get());
        }
        return new GeneratedCode.Source(names.packageName(), names.className(), java.render(report, names).text());
    }
}
