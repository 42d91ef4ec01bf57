package dev.rootform.api;

import java.time.Duration;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;

/**
 * Runs one job with a wall-clock limit on a daemon thread; past the limit the caller gets
 * {@link Result.OutOfTime} (or the value it names) and the job's thread is interrupted.
 */
final class TimeLimit {
    private TimeLimit() {
    }

    /** The job's result, or {@link Result.OutOfTime}; the job's unchecked exceptions pass through. */
    static Result within(Duration limit, Supplier<Result> job) {
        return within(limit, job, new Result.OutOfTime(limit));
    }

    /** The job's result, or {@code late} past the limit; the job's unchecked exceptions pass through. */
    static <T> T within(Duration limit, Supplier<T> job, T late) {
        ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "rootform-job");
            t.setDaemon(true);
            return t;
        });
        try {
            Future<T> future = executor.submit(job::get);
            return future.get(limit.toMillis(), TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            return late;
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return late;
        } finally {
            executor.shutdownNow();
        }
    }
}
