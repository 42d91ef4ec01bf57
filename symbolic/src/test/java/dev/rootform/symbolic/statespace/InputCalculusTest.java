package dev.rootform.symbolic.statespace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import java.util.List;
import org.junit.jupiter.api.Test;

class InputCalculusTest {
    private static List<ForcingTerm> read(Domain d, String text) {
        return ((Input.Signal) InputReader.read(d, text)).terms();
    }

    @Test
    void derivativeOfDampedSine() {
        // d/dt e^(-t) sin(2t) = -e^(-t) sin(2t) + 2 e^(-t) cos(2t) (product rule, common practice)
        List<ForcingTerm> d = InputCalculus.next(Domain.DIFFERENTIAL, read(Domain.DIFFERENTIAL, "e^(-t) sin(2t)"));
        assertEquals(new java.util.HashSet<>(read(Domain.DIFFERENTIAL, "2e^(-t) cos(2t) - e^(-t) sin(2t)")), new java.util.HashSet<>(d));
        assertEquals(Rational.of(2), InputCalculus.valueAt(Domain.DIFFERENTIAL, d, 0));
    }

    @Test
    void shiftOfPolynomialTimesPower() {
        // u[n] = n·2^n: u[n+1] = 2n·2^n + 2·2^n (binomial expansion)
        List<ForcingTerm> s = InputCalculus.next(Domain.DIFFERENCE, read(Domain.DIFFERENCE, "n 2^n"));
        for (long n = 0; n < 6; n++) {
            assertEquals(Rational.of((n + 1) << (n + 1)), InputCalculus.valueAt(Domain.DIFFERENCE, s, n));
        }
        // cos(πn/2) shifted is -sin(πn/2)
        List<ForcingTerm> c = InputCalculus.next(Domain.DIFFERENCE, read(Domain.DIFFERENCE, "cos(pi n/2)"));
        assertEquals(Rational.MINUS_ONE, InputCalculus.valueAt(Domain.DIFFERENCE, c, 1));
    }

    @Test
    void outOfScopeInputsAreRefused() {
        assertThrows(InputException.class, () -> InputCalculus.next(Domain.DIFFERENTIAL, read(Domain.DIFFERENTIAL, "sin(pi t)")));
        assertThrows(InputException.class, () -> InputCalculus.next(Domain.DIFFERENCE, read(Domain.DIFFERENCE, "cos(pi n/3)")));
        assertThrows(InputException.class, () -> InputReader.read(Domain.DIFFERENTIAL, "y + 1"));
        assertThrows(InputException.class, () -> InputReader.read(Domain.DIFFERENTIAL, "sin("));
    }
}
