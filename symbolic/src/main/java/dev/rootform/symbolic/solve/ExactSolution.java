package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.List;
import java.util.Objects;

/**
 * A fitted solution in exact form: a sum of {@link Component}s, one per irreducible factor with
 * nonzero roots of the operator polynomial μ that annihilates it (the characteristic polynomial χ,
 * times the forcing's annihilator for a forced equation). For a forcing with values in Q(√r) it
 * answers one {@link ForcingPart} of it.
 *
 * <p>Difference equations: the formula holds for n &ge; {@code validFrom}; the values
 * x[origin .. validFrom-1] (present when λ = 0 is a root of multiplicity m, then
 * validFrom = origin + m) are listed in {@code leadingValues}. Differential equations: the basis is
 * written in u = t - origin and {@code leadingValues} is empty.
 *
 * @since 0.1
 */
public record ExactSolution(LinearEquation equation, ForcingPart forcingPart, RationalPolynomial operator,
        Rational origin, long validFrom, List<Rational> leadingValues, List<Component> components) {

    public ExactSolution {
        Objects.requireNonNull(equation, "equation");
        Objects.requireNonNull(forcingPart, "forcingPart");
        Objects.requireNonNull(operator, "operator");
        Objects.requireNonNull(origin, "origin");
        leadingValues = List.copyOf(leadingValues);
        components = List.copyOf(components);
    }

    public Domain domain() {
        return equation.domain();
    }

    /**
     * The exact value x[n] of a difference-equation solution, for n &ge; origin: a listed value, or
     * Σ_components Tr(α^n·Σ_j c_j n^j). Cost O(d² log n) per component of degree d.
     *
     * @throws IllegalArgumentException if n is below the origin or this is a differential equation
     */
    public Rational valueAt(long n) {
        if (domain() != Domain.DIFFERENCE) {
            throw new IllegalArgumentException("valueAt(long) is for difference equations");
        }
        long first = origin.toBigInteger().longValueExact();
        if (n < first) {
            throw new IllegalArgumentException("index " + n + " is below the first index " + first);
        }
        if (n < validFrom) {
            return leadingValues.get((int) (n - first));
        }
        Rational nn = Rational.of(n);
        Rational sum = Rational.ZERO;
        for (Component c : components) {
            Deadline.checkCurrent();
            NumberField k = new NumberField(c.factor().polynomial());
            RationalPolynomial weight = RationalPolynomial.ZERO;
            for (int j = c.coefficients().size() - 1; j >= 0; j--) {
                weight = weight.multiply(nn).add(c.coefficients().get(j));
            }
            sum = sum.add(k.trace(k.multiply(weight, k.pow(k.generator(), n))));
        }
        return sum;
    }

    /**
     * The exact derivative y^(d)(origin) of a differential-equation solution:
     * Σ_components Tr(Σ_{i&le;d} c_i·d!/(d-i)!·α^{d-i}).
     *
     * @throws IllegalArgumentException if this is a difference equation or d &lt; 0
     */
    public Rational derivativeAtOrigin(int d) {
        if (domain() != Domain.DIFFERENTIAL || d < 0) {
            throw new IllegalArgumentException("derivativeAtOrigin needs a differential equation and d >= 0");
        }
        Rational sum = Rational.ZERO;
        for (Component c : components) {
            NumberField k = new NumberField(c.factor().polynomial());
            sum = sum.add(k.trace(derivative(k, c, d, j -> k.pow(k.generator(), j))));
        }
        return sum;
    }

    /**
     * y(origin), y'(origin), …, y^(count−1)(origin) exactly, as {@link #derivativeAtOrigin} gives
     * them one by one, with the powers of each factor's root built up once.
     *
     * @throws IllegalArgumentException if this is a difference equation or count &lt; 0
     */
    public List<Rational> derivativesAtOrigin(int count) {
        if (domain() != Domain.DIFFERENTIAL || count < 0) {
            throw new IllegalArgumentException("derivativesAtOrigin needs a differential equation and count >= 0");
        }
        Rational[] sums = new Rational[count];
        java.util.Arrays.fill(sums, Rational.ZERO);
        for (Component c : components) {
            NumberField k = new NumberField(c.factor().polynomial());
            List<RationalPolynomial> powers = new java.util.ArrayList<>(count);
            for (int j = 0; j < count; j++) {
                Deadline.checkCurrent();
                powers.add(j == 0 ? RationalPolynomial.ONE : k.multiply(powers.get(j - 1), k.generator()));
            }
            for (int d = 0; d < count; d++) {
                sums[d] = sums[d].add(k.trace(derivative(k, c, d, powers::get)));
            }
        }
        return List.of(sums);
    }

    /** Σ_{i≤d} c_i·d!/(d−i)!·α^{d−i} in Q(α) for one component, α^j from {@code power}. */
    private static RationalPolynomial derivative(NumberField k, Component c, int d, java.util.function.IntFunction<RationalPolynomial> power) {
        RationalPolynomial total = RationalPolynomial.ZERO;
        Rational falling = Rational.ONE;
        for (int i = 0; i < c.coefficients().size() && i <= d; i++) {
            Deadline.checkCurrent();
            total = total.add(k.multiply(c.coefficients().get(i), power.apply(d - i)).multiply(falling));
            falling = falling.multiply(d - i);
        }
        return total;
    }

    /** The same solution with other components (e.g. without its transient part). */
    public ExactSolution withComponents(List<Component> replacement) {
        return new ExactSolution(equation, forcingPart, operator, origin, validFrom, leadingValues, replacement);
    }
}
