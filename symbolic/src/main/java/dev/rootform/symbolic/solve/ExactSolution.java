package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.NumberField;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.algebra.TraceForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.Arrays;
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
     * x[origin], x[origin + 1], …, x[origin + count − 1] exactly, as {@link #valueAt} gives them one
     * by one: per component α^n is carried from one index to the next by one multiplication by α,
     * and each Tr(c_j·α^n) comes from the {@link TraceForm} of c_j.
     *
     * @throws IllegalArgumentException if this is a differential equation or count &lt; 0
     */
    public List<Rational> valuesFromOrigin(int count) {
        if (domain() != Domain.DIFFERENCE || count < 0) {
            throw new IllegalArgumentException("valuesFromOrigin needs a difference equation and count >= 0");
        }
        long first = origin.toBigInteger().longValueExact();
        Rational[] sums = new Rational[count];
        int listed = (int) Math.max(0, Math.min(count, validFrom - first));
        for (int i = 0; i < count; i++) {
            sums[i] = i < listed ? leadingValues.get(i) : Rational.ZERO;
        }
        if (listed == count) {
            return List.of(sums);
        }
        for (Component c : components) {
            NumberField k = new NumberField(c.factor().polynomial());
            List<TraceForm> forms = forms(k, c);
            RationalPolynomial power = k.pow(k.generator(), first + listed);
            for (int i = listed; i < count; i++) {
                Deadline.checkCurrent();
                Rational n = Rational.of(first + i);
                Rational v = Rational.ZERO;
                for (int j = forms.size() - 1; j >= 0; j--) {
                    v = v.multiply(n).add(forms.get(j).at(power));
                }
                sums[i] = sums[i].add(v);
                power = k.timesGenerator(power);
            }
        }
        return List.of(sums);
    }

    /**
     * y(origin), y'(origin), …, y^(count−1)(origin) exactly, as {@link #derivativeAtOrigin} gives
     * them one by one: the powers of each factor's root are built up once, by multiplications by
     * α, and each Tr(c_i·α^j) comes from the {@link TraceForm} of c_i.
     *
     * @throws IllegalArgumentException if this is a difference equation or count &lt; 0
     */
    public List<Rational> derivativesAtOrigin(int count) {
        if (domain() != Domain.DIFFERENTIAL || count < 0) {
            throw new IllegalArgumentException("derivativesAtOrigin needs a differential equation and count >= 0");
        }
        Rational[] sums = new Rational[count];
        Arrays.fill(sums, Rational.ZERO);
        for (Component c : components) {
            NumberField k = new NumberField(c.factor().polynomial());
            List<TraceForm> forms = forms(k, c);
            List<RationalPolynomial> powers = new ArrayList<>(count);
            for (int j = 0; j < count; j++) {
                Deadline.checkCurrent();
                powers.add(j == 0 ? RationalPolynomial.ONE : k.timesGenerator(powers.get(j - 1)));
            }
            for (int d = 0; d < count; d++) {
                Deadline.checkCurrent();
                Rational falling = Rational.ONE;
                for (int i = 0; i < forms.size() && i <= d; i++) {
                    sums[d] = sums[d].add(forms.get(i).at(powers.get(d - i)).multiply(falling));
                    falling = falling.multiply(d - i);
                }
            }
        }
        return List.of(sums);
    }

    /** The trace forms of the component's coefficients c_0, c_1, … in k. */
    private static List<TraceForm> forms(NumberField k, Component c) {
        List<TraceForm> forms = new ArrayList<>(c.coefficients().size());
        for (RationalPolynomial p : c.coefficients()) {
            forms.add(TraceForm.of(k, p));
        }
        return forms;
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
