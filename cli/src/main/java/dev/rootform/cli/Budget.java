package dev.rootform.cli;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;

/**
 * Runs one job with a wall-clock limit on a daemon thread, so that a job past its limit (e.g.
 * factoring a hard polynomial of high degree) cannot keep the process alive: the command reports
 * the exhausted budget and exits.
 */
final class Budget {
    /** The time limit ran out. */
    static final class Exhausted extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Exhausted(String message) {
            super(message);
        }
    }

    private Budget() {
    }

    /**
     * The job's result; its unchecked exceptions pass through unchanged.
     *
     * @throws Exhausted if it does not finish within {@code seconds}
     */
    static <T> T within(int seconds, Supplier<T> job) {
        ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "rootform-job");
            t.setDaemon(true);
            return t;
        });
        try {
            Future<T> future = executor.submit(job::get);
            return future.get(seconds, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            throw new Exhausted("gave up after " + seconds + " s (raise --time-limit to allow more)");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new Exhausted("interrupted");
        } finally {
            executor.shutdownNow();
        }
    }
}
