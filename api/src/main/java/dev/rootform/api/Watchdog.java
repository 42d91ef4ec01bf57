package dev.rootform.api;

import java.time.Duration;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.ScheduledThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * One shared daemon timer thread, {@value #THREAD_NAME}, that interrupts a working thread when its
 * time limit passes, so that library code that only watches the interrupt flag (JAS factoring)
 * stops too. The thread starts on first use and ends after {@link #IDLE_SECONDS} s without an
 * armed alarm, so an idle library leaves no thread behind.
 */
final class Watchdog {
    static final String THREAD_NAME = "rootform-watchdog";
    /** How long the timer thread waits for a new alarm before it ends. */
    static final long IDLE_SECONDS = 2;

    private static final ScheduledThreadPoolExecutor TIMER = timer();

    private Watchdog() {
    }

    private static ScheduledThreadPoolExecutor timer() {
        ScheduledThreadPoolExecutor timer = new ScheduledThreadPoolExecutor(1, r -> {
            Thread t = new Thread(r, THREAD_NAME);
            t.setDaemon(true);
            return t;
        });
        timer.setRemoveOnCancelPolicy(true);
        timer.setKeepAliveTime(IDLE_SECONDS, TimeUnit.SECONDS);
        timer.allowCoreThreadTimeOut(true);
        return timer;
    }

    /** An alarm that interrupts the current thread after {@code delay} unless closed first. */
    static Alarm arm(Duration delay) {
        Alarm alarm = new Alarm(Thread.currentThread());
        long nanos = delay.compareTo(Duration.ofNanos(Long.MAX_VALUE)) >= 0 ? Long.MAX_VALUE : delay.toNanos();
        alarm.task = TIMER.schedule(alarm::ring, nanos, TimeUnit.NANOSECONDS);
        return alarm;
    }

    /**
     * A pending interrupt of one thread. Closing it (on that thread) cancels the interrupt or, if
     * it already happened, clears the interrupt status again, so the thread leaves the call as it
     * entered it. An interrupt the thread already had when the alarm rang is left alone.
     */
    static final class Alarm implements AutoCloseable {
        private static final int ARMED = 0;
        private static final int RINGING = 1;
        private static final int RUNG = 2;
        private static final int CLOSED = 3;

        private final Thread thread;
        private final AtomicInteger state = new AtomicInteger(ARMED);
        /** Written before the state becomes RUNG, read after; true when this alarm set the flag. */
        private boolean interrupted;
        private ScheduledFuture<?> task;

        private Alarm(Thread thread) {
            this.thread = thread;
        }

        private void ring() {
            if (state.compareAndSet(ARMED, RINGING)) {
                if (!thread.isInterrupted()) {
                    thread.interrupt();
                    interrupted = true;
                }
                state.set(RUNG);
            }
        }

        /**
         * @throws IllegalStateException if called on another thread than the one that armed it
         */
        @Override
        public void close() {
            if (Thread.currentThread() != thread) {
                throw new IllegalStateException("an alarm must be closed on the thread it watches");
            }
            if (state.compareAndSet(ARMED, CLOSED)) {
                task.cancel(false);
                return;
            }
            while (state.get() == RINGING) {
                Thread.onSpinWait();
            }
            if (interrupted) {
                Thread.interrupted();
            }
        }
    }
}
