package dev.rootform.api.batch;

import dev.rootform.api.RecoverRequest;
import dev.rootform.api.Recovery;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.RecoveryDocument;
import dev.rootform.symbolic.model.InputException;
import java.time.Duration;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;

/**
 * The {@code recover} command of a batch: {@code terms} (required; one string, or an array of
 * exact numbers or strings), {@code start} (the index of the first term, default 0) and the
 * {@link OutputFields}. The answer is that of {@code rootform recover}: the recovered recurrence in
 * front of its solve answer. Exit codes as {@code rootform recover}: 0 recovered and verified, 2 bad
 * or too few terms, 3 a check failed, 1 out of time.
 */
final class RecoverLine {
    private RecoverLine() {
    }

    static Supplier<Reply> prepare(Fields f, Duration defaultTimeLimit) {
        String terms = String.join(", ", f.texts("terms", false));
        if (terms.isBlank()) {
            throw new InputException("the request has no \"terms\"", "", -1);
        }
        int start = f.integer("start", 0, Integer.MIN_VALUE / 2, Integer.MAX_VALUE / 2);
        OutputFields.Output output = OutputFields.output(f);
        RecoverRequest request = new RecoverRequest(terms, start, OutputFields.options(f, defaultTimeLimit, output.code()).build());
        String format = output.exporter().format();
        return () -> reply(Rootform.recover(request), output, format);
    }

    private static Reply reply(Recovery recovery, OutputFields.Output output, String format) {
        if (recovery instanceof Recovery.TooFewTerms few) {
            return new Reply.Failed(few.message(), 2);
        }
        if (recovery instanceof Recovery.NotRecovered not) {
            return output.reply(not.result(), UnaryOperator.identity());
        }
        if (recovery instanceof Recovery.Recovered r) {
            return output.reply(r.result(), answer -> RecoveryDocument.render(format, r.recurrence(), answer));
        }
        throw new AssertionError(recovery);
    }
}
