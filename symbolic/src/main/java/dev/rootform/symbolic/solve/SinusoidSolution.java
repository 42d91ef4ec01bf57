package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.sinusoid.SinusoidalParticular;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.util.List;
import java.util.Objects;

/**
 * The fitted solution of a recurrence forced by sampled sinusoids n^p·r^n·cos(ωn), sin(ωn) with ω a
 * rational (not a multiple of π), by superposition: x[n] = rest[n] + Σ_ω x_ω[n]. {@code rest}
 * solves the equation with the other forcing terms and the given conditions; each x_ω solves it with
 * the terms at frequency ω and zero at the conditions, exactly over Q(cos ω)[sin ω]/(sin²ω + cos²ω − 1):
 * x_ω = Σ_j w_{ω,j}·units_j + the particular solutions at ω, where {@code units_j} solves the
 * homogeneous equation with value 1 at condition j and 0 at the others.
 *
 * @param rest the solution for the rational forcing and the given conditions (rational values)
 * @param units the homogeneous solutions of the unit conditions, in the order of the conditions
 * @param indices the indices of the conditions, in the same order
 * @param waves one part per frequency
 * @since 0.1
 */
public record SinusoidSolution(ExactSolution rest, List<ExactSolution> units, List<Long> indices, List<Wave> waves) {
    /**
     * The part x_ω at one frequency.
     *
     * @param frequency ω
     * @param weights w_{ω,j} = −(Σ particular)(at_j), in Q(cos ω)[sin ω], one per unit solution
     * @param particular the particular solutions at ω (one per base r)
     */
    public record Wave(Rational frequency, List<TrigNumber> weights, List<SinusoidalParticular> particular) {
        public Wave {
            Objects.requireNonNull(frequency, "frequency");
            weights = List.copyOf(weights);
            particular = List.copyOf(particular);
        }

        /** The exact value x_ω[n] in Q(cos ω)[sin ω], given the unit solutions. */
        TrigNumber valueAt(long n, List<ExactSolution> units) {
            TrigNumber sum = TrigNumber.ZERO;
            for (int j = 0; j < units.size(); j++) {
                sum = sum.add(weights.get(j).multiply(units.get(j).valueAt(n)));
            }
            for (SinusoidalParticular p : particular) {
                sum = sum.add(p.valueAt(n));
            }
            return sum;
        }
    }

    public SinusoidSolution {
        Objects.requireNonNull(rest, "rest");
        units = List.copyOf(units);
        indices = List.copyOf(indices);
        waves = List.copyOf(waves);
        int count = units.size();
        if (count != indices.size() || waves.stream().anyMatch(w -> w.weights().size() != count)) {
            throw new IllegalArgumentException("one index and one weight per unit solution");
        }
    }

    /** The exact value x_ω[n] of the wave at ω, in Q(cos ω)[sin ω]. */
    public TrigNumber waveAt(Wave wave, long n) {
        return wave.valueAt(n, units);
    }
}
