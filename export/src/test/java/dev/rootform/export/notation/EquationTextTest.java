package dev.rootform.export.notation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class EquationTextTest {
    private static List<Rational> ints(long... a) {
        return Arrays.stream(a).mapToObj(Rational::of).toList();
    }

    @Test
    void backwardShiftsAsWritten() {
        LinearEquation eq = new LinearEquation(Domain.DIFFERENCE, "x", "n", ints(2, -3, 1), -2, List.of());
        assertEquals("x[n] - 3x[n-1] + 2x[n-2] = 0", EquationText.equation(eq));
        assertEquals("x[-1] = 4", EquationText.condition(eq, new Condition(0, Rational.of(-1), Rational.of(4))));
    }

    @Test
    void highDerivativesFractionsAndForcing() {
        ForcingTerm cos = new ForcingTerm(Rational.of(3), 0, Rational.ZERO, ForcingTerm.Oscillation.COS, Rational.of(2), false);
        ForcingTerm ramp = new ForcingTerm(Rational.of(-1), 1, Rational.of(-1), ForcingTerm.Oscillation.NONE, Rational.ZERO, false);
        LinearEquation eq = new LinearEquation(Domain.DIFFERENTIAL, "y", "t",
                List.of(Rational.of(1, 2), Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.MINUS_ONE), 0, List.of(cos, ramp));
        assertEquals("-y^(4) + 1/2·y = 3·cos(2t) - t·e^(-t)", EquationText.equation(eq));
        assertEquals("linear differential equation, order 4", EquationText.kind(eq));
        assertEquals("y''(1/3) = 0", EquationText.condition(eq, new Condition(2, Rational.of(1, 3), Rational.ZERO)));
    }

    @Test
    void factorisationGroupsOnlyWhenNeeded() {
        RationalPolynomial chi = RationalPolynomial.ofIntegers(2, 4, 2);
        List<Factor> factors = List.of(new Factor(RationalPolynomial.ofIntegers(1, 1), 2));
        assertEquals("2·(λ + 1)^2", EquationText.factorisation(chi, factors));
    }
}
