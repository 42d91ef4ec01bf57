package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.document.ClaimReport;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Every kind of {@link CheckResult} from the front door. */
class CheckTest {
    @Test
    void aClaimThatHoldsCarriesTheCorrectSolution() {
        // Jacobsthal numbers (2^n − (−1)^n)/3, OEIS A001045 (from memory)
        CheckResult r = Rootform.check(CheckRequest.of("x[n+2] = x[n+1] + 2x[n]; x[0] = 0; x[1] = 1", "(2^n - (-1)^n)/3"));
        ClaimReport report = assertInstanceOf(CheckResult.Holds.class, r).checked();
        assertTrue(report.exact());
        assertTrue(report.slips().isEmpty());
        assertEquals(2, report.solution().solution().closedForm().terms().size());
    }

    @Test
    void conditionsMayBeGivenApart() {
        CheckResult r = Rootform.check(new CheckRequest("y'' + y = 0", List.of("y(0) = 0", "y'(0) = 1"), "sin(t)", Options.defaults()));
        assertInstanceOf(CheckResult.Holds.class, r);
    }

    @Test
    void aBadClaimIsRefusedInTheClaim() {
        CheckResult r = Rootform.check(CheckRequest.of("x[n+1] = 2x[n]; x[0] = 1", "2^(n+1"));
        Result.Refused refused = assertInstanceOf(Result.Refused.class, assertInstanceOf(CheckResult.Unchecked.class, r).reason());
        assertEquals("2^(n+1", refused.source());
        assertEquals('(', refused.source().charAt(refused.position()));
    }

    @Test
    void conditionsWithoutOneSolutionAreNotChecked() {
        // x[n+2] = -x[n] forces x[0] + x[2] = 0 (common practice: substitute n = 0)
        CheckResult r = Rootform.check(CheckRequest.of("x[n+2] = -x[n]; x[0] = 1; x[2] = 0", "cos(pi n/2)"));
        assertInstanceOf(Result.Contradictory.class, assertInstanceOf(CheckResult.Unchecked.class, r).reason());
    }

    @Test
    void theTimeLimitStopsACheck() {
        String problem = "y^(12) + y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0; y'''(0) = 0; y^(4)(0) = 0; y^(5)(0) = 0; "
                + "y^(6)(0) = 0; y^(7)(0) = 0; y^(8)(0) = 0; y^(9)(0) = 0; y^(10)(0) = 0; y^(11)(0) = 0";
        CheckResult r = Rootform.check(CheckRequest.of(problem, "cos(t)").with(Options.builder().timeLimit(Duration.ofMillis(1)).build()));
        assertInstanceOf(Result.OutOfTime.class, assertInstanceOf(CheckResult.Unchecked.class, r).reason());
    }
}
