package dev.rootform.api;

import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import java.time.Duration;
import java.util.function.Supplier;

/**
 * Runs one job on the calling thread under a wall-clock limit: the job's {@link Deadline} is
 * installed for its duration (every long loop checks it), and the shared {@link Watchdog}
 * interrupts the thread when the limit passes, so that JAS factoring stops as well. A
 * {@link Cancelled} job becomes {@link Result.OutOfTime}. No thread is started per job and none
 * keeps computing afterwards; the interrupt status the watchdog set is cleared before returning.
 */
final class TimeLimit {
    private TimeLimit() {
    }

    /**
     * The job's result, or {@link Result.OutOfTime} when it was cancelled: the limit passed or the
     * calling thread was interrupted (an interrupt from elsewhere stays set, as it came).
     * The job's other unchecked exceptions pass through.
     */
    static Result within(Duration limit, Supplier<Result> job) {
        try (Deadline.Scope scope = Deadline.after(limit).enter(); Watchdog.Alarm alarm = Watchdog.arm(limit)) {
            return job.get();
        } catch (Cancelled e) {
            return new Result.OutOfTime(limit);
        }
    }
}
