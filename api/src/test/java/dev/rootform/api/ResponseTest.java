package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.symbolic.algebra.Rational;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Every kind of {@link ResponseResult} from the front door. */
class ResponseTest {
    @Test
    void answersWithTheReport() {
        ResponseResult r = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)").to("step")
                .with(Options.builder().digits(12).points("1").code(true).build()));
        ResponseReport report = assertInstanceOf(ResponseResult.Answered.class, r).report();
        // 1 − e^(−1) (the step response of a first-order lag, common practice)
        assertEquals(1 - Math.exp(-1), report.response().values().get(0).value().doubleValue(), 1e-12);
        assertEquals(Rational.ONE, report.stepFigures().orElseThrow().finalValue());
        for (String format : ResponseExporters.names()) {
            assertTrue(!ResponseExporters.byName(format).orElseThrow().render(report, CodeNames.defaults()).text().isEmpty(), format);
        }
    }

    @Test
    void codeNeedsTheCodeModel() {
        ResponseReport report = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)")).answer().orElseThrow();
        assertTrue(ResponseExporters.byName("java").orElseThrow().refusal(report).isPresent());
        assertTrue(ResponseExporters.byName("text").orElseThrow().refusal(report).isEmpty());
    }

    @Test
    void refusedInputKeepsItsPosition() {
        ResponseResult r = Rootform.response(ResponseRequest.of("H(s) = 1/(s + q)"));
        Result.Refused refused = assertInstanceOf(Result.Refused.class, assertInstanceOf(ResponseResult.Unanswered.class, r).result());
        assertEquals(14, refused.position());
        assertTrue(refused.message().contains("unknown name 'q'"), refused.message());
    }

    @Test
    void negativeTimesAreRefused() {
        ResponseResult r = Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)").with(Options.builder().points("-1").build()));
        assertInstanceOf(Result.Refused.class, assertInstanceOf(ResponseResult.Unanswered.class, r).result());
    }

    @Test
    void theTimeLimitGivesOutOfTime() {
        ResponseResult r = Rootform.response(ResponseRequest.of("H(s) = 1/(s^40 + s + 1)").to("step")
                .with(Options.builder().timeLimit(Duration.ofMillis(1)).build()));
        assertInstanceOf(Result.OutOfTime.class, assertInstanceOf(ResponseResult.Unanswered.class, r).result());
    }

    @Test
    void anUnansweredResultCarriesNoAnswer() {
        assertThrows(IllegalArgumentException.class, () -> new ResponseResult.Unanswered(new Result.Solved(
                ((ResponseResult.Answered) Rootform.response(ResponseRequest.of("H(s) = 1/(s + 1)"))).report().response())));
        assertEquals(List.of("text", "json", "latex", "mathml", "java", "c"), ResponseExporters.names());
    }
}
