package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.fail;

import dev.rootform.api.Options;
import dev.rootform.api.ResponseRequest;
import dev.rootform.api.ResponseResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.analysis.PointValue;
import java.util.List;

/** Responses through the library API, for tests that need the finished answer. */
final class Responses {
    private Responses() {
    }

    /** The verified answer of {@code transfer} driven by {@code input}; fails the test otherwise. */
    static ResponseReport report(String transfer, String input, int digits, List<String> points, List<String> frequencies) {
        ResponseResult r = Rootform.response(ResponseRequest.of(transfer).to(input).frequencies(frequencies)
                .with(Options.builder().digits(digits).points(points).build()));
        if (!(r instanceof ResponseResult.Answered a)) {
            return fail(transfer + " to " + input + ": " + r);
        }
        return a.report();
    }

    /** The response's values at {@code points}. */
    static List<PointValue> values(String transfer, String input, List<String> points) {
        return report(transfer, input, 30, points, List.of()).response().values();
    }
}
