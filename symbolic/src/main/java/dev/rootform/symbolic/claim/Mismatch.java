package dev.rootform.symbolic.claim;

import java.util.Objects;

/**
 * Where the claim and the correct solution differ: for a sequence the first index, for a function
 * the grid point of the largest difference.
 *
 * @param at the index or point
 * @param claimed the claim's value there
 * @param actual the solution's value there
 * @param difference for a function, the largest |claim − solution| on the grid as a decimal; empty
 *     text for a sequence
 * @since 0.3
 */
public record Mismatch(String at, String claimed, String actual, String difference) {
    public Mismatch {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(claimed, "claimed");
        Objects.requireNonNull(actual, "actual");
        Objects.requireNonNull(difference, "difference");
    }
}
