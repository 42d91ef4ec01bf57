package dev.rootform.symbolic.solve;

import java.util.Objects;

/**
 * The outcome of one verification step: what was checked, whether it ran and held, and how.
 * A check that could not run (e.g. a numerical integration beyond its step budget) says so and
 * why; it never counts as passed, and the answer's verdict states it.
 *
 * @param name short label, e.g. "satisfies the equation"
 * @param passed true only if the check ran and held
 * @param detail how it was checked, or what failed, or why it did not run
 * @param ran false for a check that was not run
 * @since 0.1
 */
public record Check(String name, boolean passed, String detail, boolean ran) {
    public Check {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(detail, "detail");
        if (passed && !ran) {
            throw new IllegalArgumentException("a check that did not run cannot have passed: " + name);
        }
    }

    /** A check that ran. */
    public Check(String name, boolean passed, String detail) {
        this(name, passed, detail, true);
    }

    /** A check that was not run, with the reason ({@code "not run: "} is put before it). */
    public static Check notRun(String name, String reason) {
        return new Check(name, false, "not run: " + reason, false);
    }

    /** True when the check ran and failed. */
    public boolean failed() {
        return ran && !passed;
    }
}
