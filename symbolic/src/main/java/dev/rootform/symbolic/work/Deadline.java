package dev.rootform.symbolic.work;

import java.time.Duration;
import java.util.Objects;
import java.util.Optional;

/**
 * When the work of one call must stop: an expiry instant on the monotonic clock
 * ({@link System#nanoTime()}), or none. Immutable and thread-safe.
 *
 * <p><b>Thread-scoped current deadline.</b> The caller that owns a job (the library's front door)
 * installs a deadline for the duration of the call with {@link #enter()}, in a
 * try-with-resources block on the thread that does the work; every long loop below it (factoring,
 * exact powering and iteration, linear algebra, root refinement, precision raising, integration)
 * calls {@link #checkCurrent()} once per step, which throws {@link Cancelled} when the installed
 * deadline has passed or the thread has been interrupted. Without an installed deadline the
 * current one is {@link #none()}: the work runs to the end unless the thread is interrupted. All
 * of rootform's work runs on the calling thread; work handed to another thread would have to
 * carry {@link #current()} over and {@link #enter()} it there.
 *
 * <pre>{@code
 * try (Deadline.Scope scope = Deadline.after(Duration.ofSeconds(5)).enter()) {
 *     return Solver.solve(problem);
 * } catch (Cancelled e) {
 *     return outOfTime;
 * }
 * }</pre>
 *
 * <p>No check may run in a class initialiser: a {@link Cancelled} thrown there would leave the
 * class unusable for the rest of the JVM's life (the same holds for anything else that reacts to
 * the interrupt, such as building a JAS polynomial ring).
 *
 * <p>A check costs a thread-local lookup, an interrupt-flag test and a clock read (tens of
 * nanoseconds); loops call it once per step whose own cost is well above that.
 *
 * @since 0.2
 */
public final class Deadline {
    private static final ThreadLocal<Deadline> CURRENT = new ThreadLocal<>();
    private static final Deadline NONE = new Deadline(Optional.empty(), 0);

    private final Optional<Duration> limit;
    private final long expiresAt;

    private Deadline(Optional<Duration> limit, long expiresAt) {
        this.limit = limit;
        this.expiresAt = expiresAt;
    }

    /** No time limit: only an interrupt stops the work. */
    public static Deadline none() {
        return NONE;
    }

    /**
     * The deadline {@code limit} from now.
     *
     * @throws IllegalArgumentException if {@code limit} is not positive
     */
    public static Deadline after(Duration limit) {
        Objects.requireNonNull(limit, "limit");
        if (limit.isNegative() || limit.isZero()) {
            throw new IllegalArgumentException("limit (" + limit + ") must be positive");
        }
        long nanos = limit.compareTo(Duration.ofNanos(Long.MAX_VALUE / 2)) > 0 ? Long.MAX_VALUE / 2 : limit.toNanos();
        return new Deadline(Optional.of(limit), System.nanoTime() + nanos);
    }

    /** The time limit this deadline was made from; empty for {@link #none()}. */
    public Optional<Duration> limit() {
        return limit;
    }

    /** The one of this deadline and {@code other} that expires first ({@link #none()} never does). */
    public Deadline sooner(Deadline other) {
        if (limit.isEmpty()) {
            return other;
        }
        return other.limit.isPresent() && other.expiresAt - expiresAt < 0 ? other : this;
    }

    /** Whether the expiry instant has passed (never for {@link #none()}). */
    public boolean expired() {
        return limit.isPresent() && System.nanoTime() - expiresAt >= 0;
    }

    /** The time left before expiry, zero once expired; empty for {@link #none()}. */
    public Optional<Duration> remaining() {
        return limit.map(l -> Duration.ofNanos(Math.max(0, expiresAt - System.nanoTime())));
    }

    /**
     * Returns normally while the work may go on.
     *
     * @throws Cancelled if the current thread is interrupted (its interrupt status is left set) or
     *     this deadline has expired
     */
    public void check() {
        if (Thread.currentThread().isInterrupted()) {
            throw new Cancelled("the thread was interrupted");
        }
        if (expired()) {
            throw new Cancelled("the time limit of " + limit.get().toMillis() + " ms passed");
        }
    }

    /** The deadline installed on the current thread, or {@link #none()}. */
    public static Deadline current() {
        Deadline d = CURRENT.get();
        return d == null ? NONE : d;
    }

    /**
     * {@link #check()} on the deadline installed on the current thread: the call every long loop
     * makes once per step.
     *
     * @throws Cancelled as {@link #check()}
     */
    public static void checkCurrent() {
        current().check();
    }

    /**
     * Installs this deadline as the current thread's until the returned scope is closed, which
     * restores the one before (scopes nest).
     */
    public Scope enter() {
        Scope scope = new Scope(Thread.currentThread(), CURRENT.get());
        CURRENT.set(this);
        return scope;
    }

    /** The installation of a deadline on one thread; close it on that thread, once. */
    public static final class Scope implements AutoCloseable {
        private final Thread owner;
        private final Deadline previous;

        private Scope(Thread owner, Deadline previous) {
            this.owner = owner;
            this.previous = previous;
        }

        /**
         * Restores the deadline that was current before {@link #enter()}.
         *
         * @throws IllegalStateException if called on another thread
         */
        @Override
        public void close() {
            if (Thread.currentThread() != owner) {
                throw new IllegalStateException("a deadline scope must be closed on the thread that entered it");
            }
            if (previous == null) {
                CURRENT.remove();
            } else {
                CURRENT.set(previous);
            }
        }
    }

    @Override
    public String toString() {
        return limit.map(l -> "Deadline[" + l.toMillis() + " ms, " + remaining().orElseThrow().toMillis() + " ms left]")
                .orElse("Deadline[none]");
    }
}
