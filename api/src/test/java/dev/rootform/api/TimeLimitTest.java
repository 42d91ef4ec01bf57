package dev.rootform.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The time limit stops the work itself, on the calling thread: hard problems given 50 ms come back
 * {@link Result.OutOfTime}, no thread outlives the calls, the process stops using CPU, and the
 * caller's interrupt status is as it was. (Without cancellation each of these problems takes
 * seconds to minutes; the old executor-based limit left one computing thread behind per call.)
 */
class TimeLimitTest {
    private static final Duration LIMIT = Duration.ofMillis(50);
    private static final int SOLVES = 50;
    /** How long threads may take to end after the last call: the watchdog's idle time plus slack. */
    private static final Duration GRACE = Duration.ofSeconds(Watchdog.IDLE_SECONDS + 8);

    /**
     * Problems that take seconds each, one per kind of long loop: factoring and root refinement of
     * degree 60 plus the exact fit of 60 values and powering to n = 1000; an ODE of order 40
     * evaluated at t = 1000 (precision raising, integration); a scaled binomial times a linear
     * factor, which JAS factors by its generic path; a trinomial of degree 200; a boundary-value
     * problem at 500 digits (apfloat elimination, precision raising).
     */
    static List<SolveRequest> hardProblems() {
        StringBuilder recurrence = new StringBuilder("x[n+60] = x[n+1] + x[n]");
        for (int i = 0; i < 60; i++) {
            recurrence.append("; x[").append(i).append("] = ").append(i % 7 - 3);
        }
        StringBuilder ode = new StringBuilder("y^(40) + y' + y = 0");
        for (int i = 0; i < 40; i++) {
            ode.append("; y^(").append(i).append(")(0) = ").append(i % 5 - 2);
        }
        String boundary = "y^(10) - y = 0; y(0) = 1; y'(0) = 0; y''(0) = 0; y'''(0) = 0; y^(4)(0) = 0;"
                + " y(1) = 0; y'(1) = 0; y''(1) = 0; y'''(1) = 0; y^(4)(1) = 1";
        return List.of(
                SolveRequest.of(recurrence.toString()).with(Options.builder().points("1000").build()),
                SolveRequest.of(ode.toString()).with(Options.builder().points("1e3").build()),
                SolveRequest.of("((2E)^60 - 1)(E + 3) x = 0"),
                SolveRequest.of("x[n+200] = x[n+3] + x[n+1] + x[n]"),
                SolveRequest.of(boundary).with(Options.builder().digits(500).points("2", "5").build()));
    }

    @Test
    void hardSolvesStopAtTheLimitAndLeaveNoThreadBehind() throws InterruptedException {
        Set<Thread> before = Thread.getAllStackTraces().keySet();
        List<SolveRequest> hard = hardProblems();
        int outOfTime = 0;
        for (int i = 0; i < SOLVES; i++) {
            SolveRequest request = hard.get(i % hard.size());
            Result r = Rootform.solve(request.with(request.options().toBuilder().timeLimit(LIMIT).build()));
            assertFalse(Thread.currentThread().isInterrupted(), "interrupt status left set after solve " + i);
            if (r instanceof Result.OutOfTime t) {
                assertEquals(LIMIT, t.limit());
                outOfTime++;
            } else {
                assertTrue(r.answer().isPresent(), "solve " + i + " neither finished nor ran out of time: " + r);
            }
        }
        assertTrue(outOfTime >= SOLVES * 4 / 5, outOfTime + " of " + SOLVES + " ran out of time");
        assertEquals(List.of(), namesOf(threadsLeft(before)), "threads still alive after the solves");
        assertTrue(cpuMillisIn(Duration.ofSeconds(1)) < 500, "the process keeps computing after the calls returned");
    }

    @Test
    void theWatchdogsInterruptIsClearedBeforeReturning() {
        SolveRequest request = hardProblems().get(3);
        Result r = Rootform.solve(request.with(Options.builder().timeLimit(LIMIT).build()));
        assertInstanceOf(Result.OutOfTime.class, r);
        assertFalse(Thread.currentThread().isInterrupted());
    }

    @Test
    void aSolveWithinItsLimitLeavesTheInterruptStatusClear() {
        Result r = Rootform.solve(SolveRequest.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1")
                .with(Options.builder().timeLimit(Duration.ofSeconds(60)).build()));
        assertInstanceOf(Result.Solved.class, r);
        assertFalse(Thread.currentThread().isInterrupted());
    }

    @Test
    void anInterruptFromElsewhereStopsTheWorkAndStaysSet() {
        Thread.currentThread().interrupt();
        try {
            Result r = Rootform.solve(SolveRequest.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1"));
            assertInstanceOf(Result.OutOfTime.class, r);
            assertTrue(Thread.currentThread().isInterrupted());
        } finally {
            Thread.interrupted();
        }
    }

    /**
     * Threads alive now that were not alive {@code before}, or that are rootform's own (the
     * watchdog, which ends when idle), once they had {@link #GRACE} to end.
     */
    private static List<Thread> threadsLeft(Set<Thread> before) throws InterruptedException {
        long end = System.nanoTime() + GRACE.toNanos();
        List<Thread> left = new ArrayList<>();
        do {
            left.clear();
            for (Thread t : Thread.getAllStackTraces().keySet()) {
                if (t.isAlive() && (!before.contains(t) || t.getName().startsWith("rootform"))) {
                    left.add(t);
                }
            }
            if (!left.isEmpty()) {
                left.get(0).join(100);
            }
        } while (!left.isEmpty() && System.nanoTime() < end);
        return left;
    }

    private static List<String> namesOf(List<Thread> threads) {
        return threads.stream().map(Thread::getName).sorted().collect(Collectors.toList());
    }

    /** CPU time the whole process used during {@code window}, in milliseconds. */
    private static long cpuMillisIn(Duration window) throws InterruptedException {
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long start = os.getProcessCpuTime();
        Thread.sleep(window.toMillis());
        return (os.getProcessCpuTime() - start) / 1_000_000;
    }
}
