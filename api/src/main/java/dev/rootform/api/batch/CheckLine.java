package dev.rootform.api.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.api.CheckRequest;
import dev.rootform.api.CheckResult;
import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.ResultText;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ClaimJsonRenderer;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.function.Supplier;

/**
 * The {@code check} command of a batch: {@code problem} and {@code claim} (both required),
 * {@code given}, {@code var}, {@code digits} and {@code timeLimit} (seconds). The answer is the JSON
 * of {@code rootform check --format json}; exit codes as on the command line: 0 the claim holds, 4
 * it fails, 2 bad input, 1 out of time or the solver's own answer failed its checks.
 */
final class CheckLine {
    private CheckLine() {
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        String problem = f.requiredText("problem");
        String claim = f.requiredText("claim");
        Options options = Options.builder().digits(f.integer("digits", Options.DEFAULT_DIGITS, 1, Options.MAX_DIGITS))
                .timeLimit(f.seconds("timeLimit").orElse(defaultTimeLimit)).variable(f.text("var").orElse(null)).build();
        CheckRequest request = new CheckRequest(problem, f.texts("given", false), claim, options);
        return () -> reply(Rootform.check(request));
    }

    private static Reply reply(CheckResult result) {
        if (result instanceof CheckResult.Unchecked u) {
            Result reason = u.reason();
            boolean internal = reason instanceof Result.OutOfTime || reason instanceof Result.CheckFailed;
            return new Reply.Failed(ResultText.explain(reason), internal ? 1 : 2);
        }
        try {
            ObjectNode body = (ObjectNode) Json.read(ClaimJsonRenderer.render(result.report().orElseThrow()));
            return new Reply.Answered(body, result instanceof CheckResult.Holds ? 0 : 4);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
