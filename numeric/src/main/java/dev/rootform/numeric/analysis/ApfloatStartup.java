package dev.rootform.numeric.analysis;

import java.util.Objects;
import org.apfloat.Apcomplex;

/**
 * Initialises apfloat's number classes in one thread. Their static initialisers need each other
 * (Apcomplex's constants are Apints, whose values are Apfloats, and Apfloat extends Apcomplex), so
 * two threads that touch two of them for the first time at once can each hold one class's
 * initialisation lock and wait for the other's forever: a deadlock seen with two batch workers.
 * Whoever solves from several threads calls this once first; initialising Apcomplex here finishes
 * all of them in the calling thread.
 *
 * @since 0.2
 */
public final class ApfloatStartup {
    private ApfloatStartup() {
    }

    /** Initialises apfloat's number classes now, in this thread; cheap and harmless when already done. */
    public static void initialize() {
        Objects.requireNonNull(Apcomplex.ZERO);
    }
}
