package dev.rootform.export.code;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.ExactSolution;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A recurrence all of whose values are integers, in the form x[m + k] = Σ_{j&lt;k} step_j·x[m + j]
 * for m &ge; first, with its first k values.
 *
 * <p>Criterion: with the operator μ = Σ a_j E^j that annihilates the solution (the characteristic
 * polynomial, times the forcing's annihilator for a forced equation, so that Σ a_j x[m + j] = 0
 * holds even for a forced equation such as x[n] = 2x[n-1] + 1), every a_j/a_k is an integer and
 * x[first], …, x[first + k − 1] are integers; then by induction every later value is an integer.
 * The values are read from the exact solution, and the recurrence is confirmed on the next 2k
 * values before it is used.
 *
 * @param step step_0 .. step_{k−1} (= −a_j/a_k)
 * @param start x[first] .. x[first + k − 1]
 * @param first the first index
 * @since 0.2
 */
record IntegerRecurrence(List<BigInteger> step, List<BigInteger> start, long first) {
    IntegerRecurrence {
        step = List.copyOf(step);
        start = List.copyOf(start);
    }

    /** The integer recurrence of a sequence solution, if the criterion holds. */
    static Optional<IntegerRecurrence> of(ExactSolution s) {
        if (s.equation().domain() != Domain.DIFFERENCE) {
            return Optional.empty();
        }
        List<Rational> a = s.operator().coefficients();
        int k = a.size() - 1;
        Rational lead = a.get(k);
        List<BigInteger> step = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            Rational c = a.get(j).divide(lead).negate();
            if (!c.isInteger()) {
                return Optional.empty();
            }
            step.add(c.toBigInteger());
        }
        long first = s.origin().toBigInteger().longValueExact();
        List<BigInteger> values = new ArrayList<>();
        for (int i = 0; i < 3 * k; i++) {
            Rational v = s.valueAt(first + i);
            if (!v.isInteger()) {
                return Optional.empty();
            }
            values.add(v.toBigInteger());
        }
        for (int m = 0; m + k < values.size(); m++) {
            BigInteger next = BigInteger.ZERO;
            for (int j = 0; j < k; j++) {
                next = next.add(step.get(j).multiply(values.get(m + j)));
            }
            if (!next.equals(values.get(m + k))) {
                return Optional.empty();
            }
        }
        return Optional.of(new IntegerRecurrence(step, values.subList(0, k), first));
    }
}
