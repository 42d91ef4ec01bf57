package dev.rootform.api;

import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import java.time.Duration;
import java.util.function.Supplier;

/**
 * Runs one job on the calling thread under a wall-clock limit: the job's {@link Deadline} is
 * installed for its duration (every long loop checks it), and the shared {@link Watchdog}
 * interrupts the thread when the limit passes, so that JAS factoring stops as well. A
 * {@link Cancelled} job gives the value that stands for "out of time". No thread is started per
 * job and none keeps computing afterwards; the interrupt status the watchdog set is cleared before
 * returning. Jobs nest (a recovery solves the recurrence it found): an inner job ends no later
 * than the outer one.
 */
final class TimeLimit {
    private TimeLimit() {
    }

    /** {@link #within(Duration, Supplier, Object)} with {@link Result.OutOfTime} as the late value. */
    static Result within(Duration limit, Supplier<Result> job) {
        return within(limit, job, new Result.OutOfTime(limit));
    }

    /**
     * The job's result, or {@code late} when it was cancelled: the limit passed or the calling
     * thread was interrupted (an interrupt from elsewhere stays set, as it came). The job's other
     * unchecked exceptions pass through.
     */
    static <T> T within(Duration limit, Supplier<T> job, T late) {
        Deadline deadline = Deadline.after(limit).sooner(Deadline.current());
        try (Deadline.Scope scope = deadline.enter();
                Watchdog.Alarm alarm = Watchdog.arm(deadline.remaining().orElseThrow())) {
            return job.get();
        } catch (Cancelled e) {
            return late;
        }
    }
}
