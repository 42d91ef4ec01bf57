package dev.rootform.symbolic.backend;

import dev.rootform.symbolic.work.Cancelled;
import dev.rootform.symbolic.work.Deadline;
import edu.jas.arith.BigInteger;
import edu.jas.kern.ComputerThreads;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * JAS's classes initialised once, on a thread of their own that nothing interrupts. A class
 * initialiser that fails leaves its class unusable for the rest of the JVM's life
 * ({@code NoClassDefFoundError} ever after), and JAS's initialisers react to an interrupt (its
 * preemption check, Log4j's start-up): done on a job's thread, an interrupt from the job's time
 * limit arriving at that moment would break factoring for every later job. So the first
 * factorisation starts this thread, which switches JAS's thread pool off and factors a few small
 * polynomials (irreducible, cyclotomic, repeated factors) to initialise the classes a
 * factorisation uses, and waits for it while honouring its own deadline; if the caller is
 * cancelled meanwhile, the start-up still completes undisturbed.
 */
final class JasStartup {
    private static final AtomicBoolean STARTED = new AtomicBoolean();
    private static final CountDownLatch DONE = new CountDownLatch(1);
    /** How often a waiting thread checks its deadline, in milliseconds. */
    private static final long WAIT_STEP_MILLIS = 10;
    /** Polynomials whose factorisation touches the classes of every path: Zassenhaus, cyclotomic, squarefree. */
    private static final String[] WARM_UP = {"x^4 + 1", "x^12 - 1", "(x^2 + 1)^2 * (x - 3) * (2*x^3 - x + 5)"};

    private JasStartup() {
    }

    /**
     * Returns once JAS is initialised.
     *
     * @throws Cancelled when the current deadline passes or the thread is interrupted while waiting
     */
    static void await() {
        if (DONE.getCount() == 0) {
            return;
        }
        if (STARTED.compareAndSet(false, true)) {
            Thread thread = new Thread(JasStartup::warmUp, "rootform-jas-startup");
            thread.setDaemon(true);
            thread.start();
        }
        waitFor(step -> DONE.await(step, TimeUnit.MILLISECONDS), "waiting for JAS to start");
    }

    /** One timed attempt to get something (a lock, a latch): true when it was got within {@code millis}. */
    interface Attempt {
        boolean tryFor(long millis) throws InterruptedException;
    }

    /**
     * Repeats {@code attempt} in steps of {@link #WAIT_STEP_MILLIS} until it succeeds, checking the
     * current deadline between steps.
     *
     * @throws Cancelled when the deadline passes or the thread is interrupted ({@code what} says while doing what)
     */
    static void waitFor(Attempt attempt, String what) {
        try {
            while (!attempt.tryFor(WAIT_STEP_MILLIS)) {
                Deadline.checkCurrent();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new Cancelled("interrupted while " + what);
        }
    }

    private static void warmUp() {
        try {
            ComputerThreads.NO_THREADS = true;
            FactorAbstract<BigInteger> engine = FactorFactory.getImplementation(BigInteger.ONE);
            GenPolynomialRing<BigInteger> ring = new GenPolynomialRing<>(BigInteger.ONE, 1, new String[] {"x"});
            for (String p : WARM_UP) {
                engine.factors(ring.parse(p));
            }
        } finally {
            DONE.countDown();
        }
    }
}
