package dev.rootform.symbolic.algebra;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class TraceFormTest {
    /** x^3 - x - 1: its power sums Tr(α^n) are the Perrin numbers. */
    private static final NumberField CUBIC = new NumberField(RationalPolynomial.ofIntegers(-1, -1, 0, 1));

    @Test
    void powerSumsOfThePlasticCubicAreThePerrinNumbers() {
        // Perrin sequence P(0..20), OEIS A001608 (values from memory, checked against P(n) = P(n-2) + P(n-3))
        long[] perrin = {3, 0, 2, 3, 2, 5, 5, 7, 10, 12, 17, 22, 29, 39, 51, 68, 90, 119, 158, 209, 277};
        TraceForm one = TraceForm.of(CUBIC, RationalPolynomial.ONE);
        RationalPolynomial power = RationalPolynomial.ONE;
        for (long p : perrin) {
            assertEquals(Rational.of(p), one.at(power));
            power = CUBIC.timesGenerator(power);
        }
    }

    @Test
    void formAndStepAgreeWithTheFieldProduct() {
        // the same numbers through a full product in Q(α), its reduction and the trace (common practice)
        NumberField quadratic = new NumberField(RationalPolynomial.of(Rational.of(5, 4), Rational.of(-2, 3), Rational.ONE));
        for (NumberField k : List.of(CUBIC, quadratic, new NumberField(RationalPolynomial.of(Rational.of(3, 7), Rational.ONE)))) {
            RationalPolynomial c = k.reduce(RationalPolynomial.of(Rational.of(-2, 3), Rational.of(5), Rational.of(1, 9)));
            TraceForm form = TraceForm.of(k, c);
            RationalPolynomial beta = k.reduce(RationalPolynomial.of(Rational.of(7, 2), Rational.of(-1, 5), Rational.of(4)));
            for (int i = 0; i < 12; i++) {
                assertEquals(k.trace(k.multiply(c, beta)), form.at(beta), k + " at step " + i);
                RationalPolynomial next = k.timesGenerator(beta);
                assertEquals(k.multiply(k.generator(), beta), next, k + " at step " + i);
                beta = next;
            }
        }
    }
}
