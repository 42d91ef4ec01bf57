package dev.rootform.numeric.roots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import java.time.Duration;
import org.junit.jupiter.api.Test;

/** Root refinement and certification stop at a passed deadline and work again without one. */
class RootFinderCancellationTest {
    @Test
    void rootsStopAtAPassedDeadline() throws InterruptedException {
        // x^5 - x - 1 is irreducible with one real root (common practice)
        RationalPolynomial p = RationalPolynomial.ofIntegers(-1, -1, 0, 0, 0, 1);
        Deadline passed = Deadline.after(Duration.ofNanos(1));
        Thread.sleep(2);
        try (Deadline.Scope scope = passed.enter()) {
            assertThrows(Cancelled.class, () -> new RootFinder(1000).roots(p));
        }
        assertEquals(5, new RootFinder(30).roots(p).size());
    }
}
