package dev.rootform.symbolic.work;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.time.Duration;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

class DeadlineTest {
    /** A deadline that has certainly passed. */
    private static Deadline passed() throws InterruptedException {
        Deadline d = Deadline.after(Duration.ofNanos(1));
        Thread.sleep(2);
        return d;
    }

    @Test
    void noneNeverExpires() {
        assertFalse(Deadline.none().expired());
        assertEquals(Optional.empty(), Deadline.none().limit());
        assertEquals(Optional.empty(), Deadline.none().remaining());
        Deadline.none().check();
    }

    @Test
    void aPassedDeadlineCancels() throws InterruptedException {
        Deadline d = passed();
        assertTrue(d.expired());
        assertEquals(Duration.ZERO, d.remaining().orElseThrow());
        Cancelled c = assertThrows(Cancelled.class, d::check);
        assertTrue(c.getMessage().contains("time limit"), c.getMessage());
    }

    @Test
    void aFutureDeadlineLetsTheWorkGoOn() {
        Deadline d = Deadline.after(Duration.ofHours(1));
        assertFalse(d.expired());
        assertEquals(Duration.ofHours(1), d.limit().orElseThrow());
        d.check();
    }

    @Test
    void anInterruptCancelsEvenWithoutDeadlineAndStaysSet() {
        Thread.currentThread().interrupt();
        try {
            assertThrows(Cancelled.class, Deadline.none()::check);
            assertTrue(Thread.currentThread().isInterrupted());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void scopesInstallAndRestoreTheCurrentDeadline() throws InterruptedException {
        assertSame(Deadline.none(), Deadline.current());
        Deadline outer = Deadline.after(Duration.ofHours(1));
        Deadline inner = passed();
        try (Deadline.Scope a = outer.enter()) {
            assertSame(outer, Deadline.current());
            try (Deadline.Scope b = inner.enter()) {
                assertSame(inner, Deadline.current());
                assertThrows(Cancelled.class, Deadline::checkCurrent);
            }
            assertSame(outer, Deadline.current());
            Deadline.checkCurrent();
        }
        assertSame(Deadline.none(), Deadline.current());
    }

    @Test
    void aScopeBelongsToItsThread() throws InterruptedException {
        try (Deadline.Scope scope = Deadline.after(Duration.ofHours(1)).enter()) {
            AtomicReference<Throwable> failure = new AtomicReference<>();
            Thread other = new Thread(() -> {
                try {
                    assertSame(Deadline.none(), Deadline.current());
                    scope.close();
                } catch (Throwable t) {
                    failure.set(t);
                }
            });
            other.start();
            other.join();
            assertTrue(failure.get() instanceof IllegalStateException, String.valueOf(failure.get()));
        }
    }

    @Test
    void soonerPicksTheDeadlineThatExpiresFirst() throws InterruptedException {
        Deadline late = Deadline.after(Duration.ofHours(1));
        Deadline early = passed();
        assertSame(early, late.sooner(early));
        assertSame(early, early.sooner(late));
        assertSame(late, late.sooner(Deadline.none()));
        assertSame(late, Deadline.none().sooner(late));
    }

    @Test
    void limitsMustBePositive() {
        assertThrows(IllegalArgumentException.class, () -> Deadline.after(Duration.ZERO));
        assertThrows(IllegalArgumentException.class, () -> Deadline.after(Duration.ofMillis(-1)));
    }

    @Test
    void exactPoweringStopsAtThePassedDeadline() throws InterruptedException {
        // λ^(10^18) in Q(λ) with λ^3 = λ + 1 would be 60 squarings; the loop checks before each
        NumberField k = new NumberField(RationalPolynomial.ofIntegers(-1, -1, 0, 1));
        try (Deadline.Scope scope = passed().enter()) {
            assertThrows(Cancelled.class, () -> k.pow(k.generator(), 1_000_000_000_000_000_000L));
            assertThrows(Cancelled.class, () -> RationalPolynomial.ofIntegers(1, 1).pow(3));
        }
        assertEquals(RationalPolynomial.ofIntegers(1, 3, 3, 1), RationalPolynomial.ofIntegers(1, 1).pow(3));
    }
}
