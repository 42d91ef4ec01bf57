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
 * {@link Result.OutOfTime}.
 */
final class TimeLimit {
    private TimeLimit() {
    }

    /** The job's result, or {@link Result.OutOfTime}; the job's unchecked exceptions pass through. */
    static Result within(Duration limit, Supplier<Result> job) {
        ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "rootform-job");
            t.setDaemon(true);
            return t;
        });
        try {
            Future<Result> future = executor.submit(job::get);
            return future.get(limit.toMillis(), TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            return new Result.OutOfTime(limit);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return new Result.OutOfTime(limit);
        } finally {
            executor.shutdownNow();
        }
    }
}
