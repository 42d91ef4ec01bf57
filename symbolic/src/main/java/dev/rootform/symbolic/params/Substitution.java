package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A parameter solved from a polynomial equation f = 0 in which it occurs to the first power
 * (p = −f₀/f₁), and the problem with it put in. A parameter whose coefficient f₁ is a number is
 * preferred (no new denominator), then the last declared.
 */
final class Substitution {
    private final String name;
    private final int index;
    private final ParamFunction value;

    private Substitution(String name, int index, ParamFunction value) {
        this.name = name;
        this.index = index;
        this.value = value;
    }

    static Optional<Substitution> solving(ParamPolynomial f, List<String> parameters) {
        Substitution best = null;
        for (int i = parameters.size() - 1; i >= 0; i--) {
            if (f.degreeIn(i) != 1) {
                continue;
            }
            ParamPolynomial f1 = f.coefficientOf(i, 1);
            Substitution s = new Substitution(parameters.get(i), i, ParamFunction.of(f.coefficientOf(i, 0).negate(), f1));
            if (f1.isConstant()) {
                return Optional.of(s);
            }
            best = best == null ? s : best;
        }
        return Optional.ofNullable(best);
    }

    /** The problem with the parameter replaced; empty when its leading coefficient or a denominator vanishes identically. */
    Optional<ParametricProblem> apply(ParametricProblem problem) {
        try {
            return substituted(problem);
        } catch (ArithmeticException e) {
            return Optional.empty();
        }
    }

    private Optional<ParametricProblem> substituted(ParametricProblem problem) {
        List<ParamFunction> coefficients = new ArrayList<>();
        for (ParamFunction c : problem.coefficients()) {
            coefficients.add(c.substitute(index, value));
        }
        if (coefficients.get(coefficients.size() - 1).isZero()) {
            return Optional.empty();
        }
        List<ParamTerm> forcing = new ArrayList<>();
        for (ParamTerm t : problem.forcing()) {
            ParamFunction amplitude = t.amplitude().substitute(index, value);
            ParamFunction frequency = t.frequency().substitute(index, value);
            ParamTerm.Wave wave = t.wave();
            if (wave != ParamTerm.Wave.NONE && frequency.isZero()) {
                amplitude = wave == ParamTerm.Wave.SIN ? ParamFunction.zero(amplitude.names()) : amplitude;
                wave = ParamTerm.Wave.NONE;
            }
            if (!amplitude.isZero()) {
                forcing.add(new ParamTerm(amplitude, t.power(), t.rate().substitute(index, value), frequency, wave));
            }
        }
        List<ParamCondition> conditions = new ArrayList<>();
        for (ParamCondition c : problem.conditions()) {
            conditions.add(new ParamCondition(c.order(), c.point(), c.value().substitute(index, value)));
        }
        return Optional.of(new ParametricProblem(problem.domain(), problem.function(), problem.variable(), problem.parameters(),
                coefficients, problem.shift(), forcing, conditions, problem.source(), problem.occurrences()));
    }

    @Override
    public String toString() {
        return name + " = " + value;
    }
}
