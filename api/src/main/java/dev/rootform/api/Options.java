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
 * <p>A cup of tea at 90 °C cooling in a 20 °C room (T' = -(T - 20)/8, t in minutes), its
 * temperature at 0, 10 and 3/2 minutes to 12 digits, with at most 20 seconds of work:
 *
 * <pre>{@code
 * Options options = Options.builder().digits(12).points("0", "10", "3/2")
 *         .timeLimit(Duration.ofSeconds(20)).build();
 * Result result = Rootform.solve(SolveRequest.of("T' + T/8 = 5/2; T(0) = 90").with(options));
 * result.answer().ifPresent(report -> report.values()
 *         .forEach(v -> System.out.println("T(" + v.at() + ") = " + v.value())));
 * }</pre>
 *
 * @param digits significant digits of every numeric part of the answer, 1 to {@link #MAX_DIGITS}
 * @param points where to evaluate the solution, as exact numbers in text ({@code "10"},
 *     {@code "1e3"}, {@code "3/2"}, {@code "0.25"})
 * @param timeLimit how long the work may take before the result is {@link Result.OutOfTime}
 * @param numeric show roots and constants as decimals instead of exact forms (a presentation
 *     choice; the solution is still computed and verified exactly)
 * @param variable the independent variable of a differential equation, when not the default
 *     {@code t} and not named in the equation
 * @param code also build the floating-point model that generated code evaluates, with its
 *     measured range and accuracy in each C variant (double, float; with and without libm) and the
 *     exact 64-bit term of an integer recurrence (needed by the {@code java} and {@code c} exporters; costs a
 *     sample of high-precision values)
 * @param plots also compute the plot data of the report page ({@code Report.plots()}): samples of
 *     the solution over its own time scales and of the frequency response
 * @param allDigits give a sequence's values at {@code points} exactly with all their digits
 *     ({@code PointValue.allDigits()}), at indices up to {@link Limits#MAX_EXACT_INDEX} and of up to
 *     {@link Limits#MAX_EXACT_DIGITS} digits (F(10^7), 2,089,877 digits, takes about a second); the
 *     sequence's values must be rational, else the result is {@link Result.Refused}
 * @since 0.2
 */
public record Options(int digits, List<String> points, Duration timeLimit, boolean numeric, Optional<String> variable,
        boolean code, boolean plots, boolean allDigits) {
    /** Default significant digits. */
    public static final int DEFAULT_DIGITS = 30;
    /** Largest number of significant digits accepted ({@link Limits#MAX_DIGITS}). */
    public static final int MAX_DIGITS = Limits.MAX_DIGITS;
    /** Default time limit. */
    public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(300);

    /**
     * @throws IllegalArgumentException if digits is out of range or the time limit is not positive
     * @throws NullPointerException if points, a point, the time limit or the variable is null
     */
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

    /**
     * The defaults: 30 digits, no points, 300 s, exact presentation, default variable, no code model,
     * no plot data, values rounded to the digits.
     *
     * @return the default options
     */
    public static Options defaults() {
        return builder().build();
    }

    /**
     * A builder starting from the defaults.
     *
     * @return a new builder
     */
    public static Builder builder() {
        return new Builder();
    }

    /**
     * A builder starting from these options, to change some of them.
     *
     * @return a new builder
     */
    public Builder toBuilder() {
        return new Builder().digits(digits).points(points).timeLimit(timeLimit).numeric(numeric)
                .variable(variable.orElse(null)).code(code).plots(plots).allDigits(allDigits);
    }

    /** Collects options; {@link #build()} validates them. Not thread-safe; the built options are. */
    public static final class Builder {
        private int digits = DEFAULT_DIGITS;
        private List<String> points = List.of();
        private Duration timeLimit = DEFAULT_TIME_LIMIT;
        private boolean numeric;
        private String variable;
        private boolean code;
        private boolean plots;
        private boolean allDigits;

        private Builder() {
        }

        /**
         * @param digits significant digits of every numeric part, 1 to
         *     {@link Options#MAX_DIGITS} (checked by {@link #build()})
         * @return this builder
         */
        public Builder digits(int digits) {
            this.digits = digits;
            return this;
        }

        /**
         * @param points where to evaluate the solution, as exact numbers in text, e.g.
         *     {@code "0", "10", "1e3", "3/2"}; a point that is not a number makes the result
         *     {@link Result.Refused}
         * @return this builder
         */
        public Builder points(List<String> points) {
            this.points = List.copyOf(points);
            return this;
        }

        /**
         * {@link #points(List)} from varargs.
         *
         * @param points where to evaluate the solution
         * @return this builder
         */
        public Builder points(String... points) {
            return points(List.of(points));
        }

        /**
         * @param timeLimit how long the work may take, positive (checked by {@link #build()})
         * @return this builder
         */
        public Builder timeLimit(Duration timeLimit) {
            this.timeLimit = timeLimit;
            return this;
        }

        /**
         * @param numeric show roots and constants as decimals instead of exact forms
         * @return this builder
         */
        public Builder numeric(boolean numeric) {
            this.numeric = numeric;
            return this;
        }

        /**
         * @param variable the independent variable of a differential equation; null for the
         *     default
         * @return this builder
         */
        public Builder variable(String variable) {
            this.variable = variable;
            return this;
        }

        /**
         * @param code also build the model of generated code with the answer (for the {@code java}
         *     and {@code c} exporters)
         * @return this builder
         */
        public Builder code(boolean code) {
            this.code = code;
            return this;
        }

        /**
         * @param plots also compute the plot data of the report page (for the {@code html} exporter)
         * @return this builder
         */
        public Builder plots(boolean plots) {
            this.plots = plots;
            return this;
        }

        /**
         * @param allDigits give a sequence's values exactly with all their digits
         * @return this builder
         * @since 0.3
         */
        public Builder allDigits(boolean allDigits) {
            this.allDigits = allDigits;
            return this;
        }

        /**
         * @return the options collected so far
         * @throws IllegalArgumentException if digits is out of range or the time limit is not
         *     positive
         */
        public Options build() {
            return new Options(digits, points, timeLimit, numeric, Optional.ofNullable(variable), code, plots, allDigits);
        }
    }
}
