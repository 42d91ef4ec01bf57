package dev.rootform.symbolic.backend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import java.time.Duration;
import java.util.Arrays;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/**
 * An interrupt stops JAS in the middle of a factorisation, and a thread waiting for its turn at
 * JAS gives up at its deadline. The hard input x^200 - x^3 - x - 1 takes JAS far longer than
 * these tests run (measured: still running after two minutes on the development machine).
 */
class FactoringCancellationTest {
    private static final RationalPolynomial HARD = RationalPolynomial.monomial(Rational.ONE, 200)
            .subtract(RationalPolynomial.ofIntegers(1, 1, 0, 1));

    /** A thread factoring p; its outcome (a Throwable, or the factors) lands in {@code outcome}. */
    private static Thread factoring(RationalPolynomial p, AtomicReference<Object> outcome) {
        Thread t = new Thread(() -> {
            try {
                outcome.set(JasFactorizer.factor(p));
            } catch (Throwable e) {
                outcome.set(e);
            }
        }, "test-factoring");
        t.setDaemon(true);
        t.start();
        return t;
    }

    /** Waits until {@code t} runs inside JAS (a frame of edu.jas on its stack). */
    private static void awaitInsideJas(Thread t) throws InterruptedException {
        while (t.isAlive() && Arrays.stream(t.getStackTrace()).noneMatch(f -> f.getClassName().startsWith("edu.jas.ufd"))) {
            Thread.sleep(5);
        }
        assertTrue(t.isAlive(), "the factorisation ended before it could be interrupted");
    }

    @Test
    void anInterruptStopsJasAndJasStillWorksAfterwards() throws InterruptedException {
        AtomicReference<Object> outcome = new AtomicReference<>();
        Thread t = factoring(HARD, outcome);
        awaitInsideJas(t);
        t.interrupt();
        t.join(60_000);
        assertFalse(t.isAlive(), "the interrupted factorisation did not stop");
        assertInstanceOf(Cancelled.class, outcome.get());
        // x^4 - 1 = (x - 1)(x + 1)(x^2 + 1) (common practice)
        assertEquals(3, JasFactorizer.factor(RationalPolynomial.ofIntegers(-1, 0, 0, 0, 1)).size());
    }

    @Test
    void aThreadWaitingForJasGivesUpAtItsDeadline() throws InterruptedException {
        AtomicReference<Object> outcome = new AtomicReference<>();
        Thread busy = factoring(HARD, outcome);
        try {
            awaitInsideJas(busy);
            // x^3 - x - 1 is irreducible (common practice: no rational root ±1), not a binomial, so it needs JAS
            try (Deadline.Scope scope = Deadline.after(Duration.ofMillis(50)).enter()) {
                assertThrows(Cancelled.class, () -> JasFactorizer.factor(RationalPolynomial.ofIntegers(-1, -1, 0, 1)));
            }
        } finally {
            busy.interrupt();
            busy.join(60_000);
        }
        assertFalse(busy.isAlive());
    }
}
