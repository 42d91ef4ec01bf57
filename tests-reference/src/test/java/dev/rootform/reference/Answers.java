package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.fail;

import dev.rootform.api.Options;
import dev.rootform.api.Result;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.Report;
import dev.rootform.symbolic.algebra.Rational;
import java.util.List;

/** The whole job through the library API, for tests that need the finished answer. */
public final class Answers {
    private Answers() {
    }

    /** Solves {@code input} and returns its answer; fails the test when the result has none. */
    public static Report report(String input, int digits, List<Rational> points) {
        return report(input, Options.builder().digits(digits).points(points.stream().map(Rational::toString).toList()).build());
    }

    /** Solves {@code input} with its generated-code model (for the code formats). */
    public static Report codeReport(String input, int digits) {
        return report(input, Options.builder().digits(digits).code(true).build());
    }

    private static Report report(String input, Options options) {
        Result result = Rootform.solve(SolveRequest.of(input).with(options));
        return result.answer().orElseGet(() -> fail(input + ": " + result));
    }
}
