package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.LinearEquation;
import java.util.ArrayList;
import java.util.List;

/**
 * Turns left − right of an equation into a {@link LinearEquation}: the unknown terms stay on the
 * left with the signs as written there, the rest moves to the right.
 */
final class NormalForm {
    private NormalForm() {
    }

    /**
     * @param shape the frame of the equation
     * @param difference the value of left side minus right side
     * @param source the text, for errors
     * @param position where the equation starts, for errors
     */
    static LinearEquation of(Shape shape, Value difference, String source, int position) {
        if (!difference.hasUnknown()) {
            throw new InputException("the unknown " + shape.function() + " cancels out", source, position);
        }
        boolean recurrence = shape.domain() == Domain.DIFFERENCE;
        // a recurrence holds for n >= 0 wherever its terms are defined: backward shifts (x[n-2]) start it
        // later, while forward shifts that skip x[n] (x[n+3] = 2x[n+1]) leave the first values free,
        // i.e. λ = 0 is a root of the characteristic polynomial
        int low = recurrence ? Math.min(0, difference.unknown().firstKey()) : 0;
        int high = difference.unknown().lastKey();
        if (high == low) {
            throw new InputException("order 0: " + (recurrence ? "no shift of " : "no derivative of ")
                    + shape.function() + " besides a multiple of it", source, position);
        }
        if (high - low > Limits.MAX_ORDER) {
            throw new InputException("order " + (high - low) + " is above the limit " + Limits.MAX_ORDER, source, position);
        }
        List<Rational> coefficients = new ArrayList<>();
        for (int j = low; j <= high; j++) {
            coefficients.add(difference.unknown().getOrDefault(j, Rational.ZERO));
        }
        return new LinearEquation(shape.domain(), shape.function(), shape.variable(), coefficients,
                recurrence ? low : 0, difference.forcing().negate().toTerms());
    }
}
