package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.time.Duration;
import org.junit.jupiter.api.Test;

/** The fallback wiring: an exact path that does not finish in its share gives a numeric answer, labelled so. */
class NumericFallbackJobTest {
    private static SolveRequest request(String input, String... points) {
        return SolveRequest.of(input).with(Options.builder().timeLimit(Duration.ofSeconds(120)).points(points).build());
    }

    @Test
    void anExactPathOutOfItsShareGivesANumericAnswer() {
        // a 1 ms share stops the exact path at its first step; Fibonacci, OEIS A000045: F(30) = 832040
        Result r = SolveJob.run(request("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "30"), Duration.ofMillis(1));
        Result.Numeric numeric = assertInstanceOf(Result.Numeric.class, r);
        assertTrue(numeric.solution().verified(), numeric.solution().checks().toString());
        assertTrue(numeric.solution().reason().contains("did not finish"), numeric.solution().reason());
        assertEquals(0, new BigDecimal(832040).compareTo(numeric.solution().values().get(0).value().setScale(0,
                java.math.RoundingMode.HALF_EVEN)));
        assertTrue(r.answer().isEmpty());
    }

    @Test
    void problemsWithoutAFallbackKeepTheWholeLimitForTheExactPath() {
        // forced: no fallback, so even a 1 ms share leaves the exact answer
        Result r = SolveJob.run(request("x[n+1] = 2x[n] + 1; x[0] = 0", "10"), Duration.ofMillis(1));
        assertInstanceOf(Result.Solved.class, r);
        // a problem the exact path finishes in its share is answered exactly
        assertInstanceOf(Result.Solved.class, Rootform.solve(request("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1")));
    }
}
