package dev.rootform.symbolic.response;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;
import java.util.Objects;

/**
 * The input u applied from zero initial state at t = 0 (or n = 0): the unit impulse δ, the unit
 * step, the unit ramp, or any forcing a forced equation accepts ({@code sin(2t)}, {@code e^(-t)},
 * {@code (1/2)^n}), taken to be zero before 0.
 *
 * @since 0.3
 */
public sealed interface Input permits Input.Impulse, Input.Polynomial, Input.Forcing {
    /** The name as the user writes it: {@code impulse}, {@code step}, {@code ramp} or the forcing text. */
    String text();

    /** u for t &gt; 0 (n &ge; 0) as forcing terms; empty for the impulse. */
    List<ForcingTerm> terms(Domain domain);

    /** True for the unit step. */
    default boolean isStep() {
        return equals(Polynomial.STEP);
    }

    /** The unit impulse δ(t) or δ[n]. */
    record Impulse() implements Input {
        @Override
        public String text() {
            return "impulse";
        }

        @Override
        public List<ForcingTerm> terms(Domain domain) {
            return List.of();
        }
    }

    /**
     * The unit step (power 0: 1 for t &ge; 0) or the unit ramp (power 1: t, or n, for t &ge; 0).
     *
     * @param power 0 or 1
     */
    record Polynomial(int power) implements Input {
        /** The unit step. */
        public static final Polynomial STEP = new Polynomial(0);
        /** The unit ramp. */
        public static final Polynomial RAMP = new Polynomial(1);

        public Polynomial {
            if (power != 0 && power != 1) {
                throw new IllegalArgumentException("power (" + power + ") must be 0 (step) or 1 (ramp)");
            }
        }

        @Override
        public String text() {
            return power == 0 ? "step" : "ramp";
        }

        @Override
        public List<ForcingTerm> terms(Domain domain) {
            return List.of(new ForcingTerm(Rational.ONE, power, neutral(domain), ForcingTerm.Oscillation.NONE, Rational.ZERO, false));
        }
    }

    /**
     * A forcing written as in a forced equation.
     *
     * @param text as written
     * @param domain the domain it was read in
     * @param forcing its terms
     */
    record Forcing(String text, Domain domain, List<ForcingTerm> forcing) implements Input {
        public Forcing {
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(domain, "domain");
            forcing = List.copyOf(forcing);
        }

        @Override
        public List<ForcingTerm> terms(Domain other) {
            if (other != domain) {
                throw new IllegalArgumentException("input read for " + domain + ", asked for " + other);
            }
            return forcing;
        }
    }

    /**
     * {@code impulse}, {@code step}, {@code ramp}, or a forcing in t (continuous) or n (discrete).
     *
     * @throws dev.rootform.symbolic.model.InputException if the forcing cannot be read or is zero
     */
    static Input parse(String text, Domain domain) {
        String t = text == null ? "" : text.strip();
        switch (t) {
            case "impulse":
                return new Impulse();
            case "step":
                return Polynomial.STEP;
            case "ramp":
                return Polynomial.RAMP;
            default:
                List<ForcingTerm> terms = ProblemParser.forcing(text, domain);
                if (terms.isEmpty()) {
                    throw new dev.rootform.symbolic.model.InputException("the input is zero: its response is zero", text, 0);
                }
                return new Forcing(t, domain, terms);
        }
    }

    private static Rational neutral(Domain domain) {
        return domain == Domain.DIFFERENCE ? Rational.ONE : Rational.ZERO;
    }
}
