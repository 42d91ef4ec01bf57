package dev.rootform.api.batch;

import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import java.time.Duration;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;

/**
 * The {@code solve} command of a batch: {@code problem} (required), {@code given}, {@code var} and
 * the {@link OutputFields}. The answer is solve's, as {@code rootform solve} gives it; a line with
 * {@code params}, {@code where} or {@code at} is a {@link ParametricLine}.
 */
final class SolveLine {
    private SolveLine() {
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        if (ParametricLine.asked(f)) {
            return ParametricLine.prepare(f, defaultTimeLimit);
        }
        OutputFields.Output output = OutputFields.output(f);
        SolveRequest request = request(f, defaultTimeLimit, output.code());
        return () -> output.reply(Rootform.solve(request), UnaryOperator.identity());
    }

    /** The problem with its conditions and options: {@code problem}, {@code given}, {@code var}, the options of {@link OutputFields}. */
    static SolveRequest request(Fields f, Duration defaultTimeLimit, boolean code) {
        String problem = f.requiredText("problem");
        return SolveRequest.of(problem, f.texts("given", false))
                .with(OutputFields.options(f, defaultTimeLimit, code).variable(f.text("var").orElse(null)).build());
    }
}
