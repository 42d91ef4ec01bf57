package dev.rootform.numeric.check;

import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The integrator checks the current deadline after every step: y'' + y = 0 integrated to
 * t = 10^9 at relative tolerance 1e-12 needs well over 10^8 steps (a step cannot span a period 2π
 * of the sine at that tolerance; common practice), far more than 200 ms allow, so the
 * integration must stop with {@link Cancelled}.
 */
class IntegrationCancellationTest {
    @Test
    void aLongIntegrationStopsAtTheDeadline() {
        try (Deadline.Scope scope = Deadline.after(Duration.ofMillis(200)).enter()) {
            assertThrows(Cancelled.class, () -> OdeReference.values(List.of(Rational.ONE, Rational.ZERO, Rational.ONE),
                    Rational.ZERO, List.of(Rational.ZERO, Rational.ONE), new double[] {1e9}));
        }
    }
}
