package dev.rootform.symbolic.model;

import java.util.List;
import java.util.Objects;

/**
 * An equation with its conditions, as the user stated them. With no conditions the answer is the
 * general solution with free constants.
 *
 * @since 0.1
 */
public record Problem(LinearEquation equation, List<Condition> conditions) {
    public Problem {
        Objects.requireNonNull(equation, "equation");
        conditions = List.copyOf(conditions);
    }
}
