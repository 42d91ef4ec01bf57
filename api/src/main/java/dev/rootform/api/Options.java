package dev.rootform.api;

import dev.rootform.symbolic.model.Limits;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * How to solve and what to compute besides the closed form. Immutable; build one with
 * {@link #builder()} or take {@link #defaults()}.
 *
 * @param digits significant digits of every numeric part of the answer, 1 to {@link #MAX_DIGITS}
 * @param points where to evaluate the solution, as exact numbers in text ({@code "10"},
 *     {@code "1e3"}, {@code "3/2"}, {@code "0.25"})
 * @param timeLimit how long the work may take before the result is {@link Result.OutOfTime}
 * @param numeric show roots and constants as decimals instead of exact forms (a presentation
 *     choice; the solution is still computed and verified exactly)
 * @param variable the independent variable of a differential equation, when not the default
 *     {@code t} and not named in the equation
 * @since 0.2
 */
public record Options(int digits, List<String> points, Duration timeLimit, boolean numeric, Optional<String> variable) {
    /** Default significant digits. */
    public static final int DEFAULT_DIGITS = 30;
    /** Largest number of significant digits accepted ({@link Limits#MAX_DIGITS}). */
    public static final int MAX_DIGITS = Limits.MAX_DIGITS;
    /** Default time limit. */
    public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(300);

    /** @throws IllegalArgumentException if digits is out of range or the time limit is not positive */
    public Options {
        if (digits < 1 || digits > MAX_DIGITS) {
            throw new IllegalArgumentException("digits (" + digits + ") must be in 1.." + MAX_DIGITS);
        }
        points = List.copyOf(points);
        Objects.requireNonNull(timeLimit, "timeLimit");
        if (timeLimit.isNegative() || timeLimit.isZero()) {
            throw new IllegalArgumentException("timeLimit (" + timeLimit + ") must be positive");
        }
        Objects.requireNonNull(variable, "variable");
    }

    /** 30 digits, no points, 300 s, exact presentation, default variable. */
    public static Options defaults() {
        return builder().build();
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A builder starting from these options. */
    public Builder toBuilder() {
        return new Builder().digits(digits).points(points).timeLimit(timeLimit).numeric(numeric)
                .variable(variable.orElse(null));
    }

    /** Collects options; {@link #build()} validates them. Not thread-safe; the built options are. */
    public static final class Builder {
        private int digits = DEFAULT_DIGITS;
        private List<String> points = List.of();
        private Duration timeLimit = DEFAULT_TIME_LIMIT;
        private boolean numeric;
        private String variable;

        private Builder() {
        }

        public Builder digits(int digits) {
            this.digits = digits;
            return this;
        }

        /** Points as exact numbers in text, e.g. {@code "0", "10", "1e3", "3/2"}. */
        public Builder points(List<String> points) {
            this.points = List.copyOf(points);
            return this;
        }

        /** {@link #points(List)} from varargs. */
        public Builder points(String... points) {
            return points(List.of(points));
        }

        public Builder timeLimit(Duration timeLimit) {
            this.timeLimit = timeLimit;
            return this;
        }

        public Builder numeric(boolean numeric) {
            this.numeric = numeric;
            return this;
        }

        /** The independent variable of a differential equation; null for the default. */
        public Builder variable(String variable) {
            this.variable = variable;
            return this;
        }

        public Options build() {
            return new Options(digits, points, timeLimit, numeric, Optional.ofNullable(variable));
        }
    }
}
