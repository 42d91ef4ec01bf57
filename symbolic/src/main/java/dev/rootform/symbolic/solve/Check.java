package dev.rootform.symbolic.solve;

import java.util.Objects;

/**
 * The outcome of one verification step: what was checked, whether it held, and how.
 *
 * @param name short label, e.g. "satisfies the equation"
 * @param passed true only if the check ran and held
 * @param detail how it was checked, or what failed
 * @since 0.1
 */
public record Check(String name, boolean passed, String detail) {
    public Check {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(detail, "detail");
    }
}
