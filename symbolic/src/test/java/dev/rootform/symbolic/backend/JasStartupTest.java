package dev.rootform.symbolic.backend;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Cancelled;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/**
 * An interrupt that reaches a factorisation while JAS is starting (the first one in the JVM, or
 * any later one) cancels that factorisation only: JAS's classes are initialised on their own
 * thread, so factoring keeps working afterwards (before, such an interrupt could leave a class
 * initialiser failed and every later factorisation with NoClassDefFoundError).
 */
class JasStartupTest {
    private static final RationalPolynomial QUINTIC = RationalPolynomial.ofIntegers(-1, -1, 0, 0, 0, 1);

    @Test
    void anInterruptedFactorisationLeavesJasUsable() throws InterruptedException {
        AtomicReference<Throwable> outcome = new AtomicReference<>();
        Thread interrupted = new Thread(() -> {
            Thread.currentThread().interrupt();
            try {
                JasFactorizer.factor(QUINTIC);
            } catch (RuntimeException | Error e) {
                outcome.set(e);
            }
        });
        interrupted.start();
        interrupted.join();
        if (outcome.get() != null) {
            assertEquals(Cancelled.class, outcome.get().getClass(), String.valueOf(outcome.get()));
        }
        // x^5 - x - 1 is irreducible over Q (common practice: it has no rational root and no quadratic factor)
        assertEquals(1, JasFactorizer.factor(QUINTIC).size());
    }
}
