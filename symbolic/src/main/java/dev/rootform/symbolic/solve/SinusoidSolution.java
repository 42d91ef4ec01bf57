package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.sinusoid.SinusoidalParticular;
import dev.rootform.symbolic.sinusoid.TrigNumber;
import java.util.List;
import java.util.Objects;

/**
 * The fitted solution of a recurrence forced by sampled sinusoids n^p·r^n·cos(ωn), sin(ωn) with ω a
 * rational (not a multiple of π), exact over Q(c)[s]/(s² + c² − 1), c = cos ω0, s = sin ω0 for the
 * base frequency ω0:
 * x[n] = rest[n] + Σ_j weights_j·units_j[n] + Σ particular[n]. {@code rest} solves the equation with
 * the other forcing terms and the given conditions; {@code units_j} solves the homogeneous equation
 * with value 1 at condition j and 0 at the others; the weights −x_p(at_j) make the sinusoidal
 * particular solutions meet the conditions. Every part is an exact solution, so x is one.
 *
 * @param frequency ω0
 * @param rest the solution for the rational forcing and the given conditions (rational values)
 * @param units the homogeneous solutions of the unit conditions, in the order of the conditions
 * @param indices the indices of the conditions, in the same order
 * @param weights their weights, in Q(c)[s]
 * @param particular the sinusoidal particular solutions
 * @since 0.1
 */
public record SinusoidSolution(Rational frequency, ExactSolution rest, List<ExactSolution> units, List<Long> indices,
        List<TrigNumber> weights, List<SinusoidalParticular> particular) {
    public SinusoidSolution {
        Objects.requireNonNull(frequency, "frequency");
        Objects.requireNonNull(rest, "rest");
        units = List.copyOf(units);
        indices = List.copyOf(indices);
        weights = List.copyOf(weights);
        particular = List.copyOf(particular);
        if (units.size() != weights.size() || units.size() != indices.size()) {
            throw new IllegalArgumentException("one weight and one index per unit solution");
        }
    }

    /** The exact value x[n] in Q(c)[s], for n at or above the first index. */
    public TrigNumber valueAt(long n) {
        TrigNumber sum = TrigNumber.of(rest.valueAt(n));
        for (int j = 0; j < units.size(); j++) {
            sum = sum.add(weights.get(j).multiply(units.get(j).valueAt(n)));
        }
        for (SinusoidalParticular p : particular) {
            sum = sum.add(p.valueAt(n));
        }
        return sum;
    }
}
