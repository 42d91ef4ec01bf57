package dev.rootform.symbolic.parse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.params.ParamTerm;
import dev.rootform.symbolic.params.ParametricProblem;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Reading problems with parameters: where they may stand, and the refusals. */
class ParametricParserTest {

    private static ParametricProblem parse(String text, String params) {
        return ParametricParser.parse(text, ParametricParser.names(params), null);
    }

    @Test
    void readsCoefficientsForcingAndConditionsWithParameters() {
        ParametricProblem p = parse("m y'' + c y' + k y = F0 e^(-r t) sin(w t); y(0) = x0; y'(0) = 0", "m, c, k, F0, r, w, x0");
        assertEquals(Domain.DIFFERENTIAL, p.domain());
        assertEquals(List.of("k", "c", "m"), p.coefficients().stream().map(Object::toString).toList());
        ParamTerm g = p.forcing().get(0);
        assertEquals("F0", g.amplitude().toString());
        assertEquals("-r", g.rate().toString());
        assertEquals("w", g.frequency().toString());
        assertEquals(ParamTerm.Wave.SIN, g.wave());
        assertEquals("x0", p.conditions().get(0).value().toString());
    }

    @Test
    void readsASymbolicRatioInARecurrence() {
        ParametricProblem p = parse("x[n+1] = a x[n] + b^n; x[0] = 1", "a, b");
        assertEquals(Domain.DIFFERENCE, p.domain());
        assertEquals("b", p.forcing().get(0).rate().toString());
        assertEquals(List.of("-a", "1"), p.coefficients().stream().map(Object::toString).toList());
    }

    @Test
    void substitutesValuesIntoTheText() {
        ParametricProblem p = parse("m y'' + k y = 0; y(0) = x0; y'(0) = 0", "m, k, x0");
        assertEquals("(2) y'' + (1/2) y = 0; y(0) = (3); y'(0) = 0",
                ParametricParser.substitute(p, Map.of("m", Rational.of(2), "k", Rational.of(1, 2), "x0", Rational.of(3))));
    }

    @Test
    void refusesBadNamesAndUses() {
        String[][] cases = {
            {"m y'' + q y = 0", "m", "undeclared parameter 'q'"},
            {"m y'' + t y = 0", "m, t", "is the independent variable"},
            {"m y'' + y = 0", "m, E", "has a fixed meaning"},
            {"m y'' + y = 0", "m, pi", "has a fixed meaning"},
            {"m y'' + k y y = 0", "m, k", "nonlinear term"},
            {"m y'' + t y = 0", "m", "variable coefficient"},
            {"y'' + y = sin(w t + 1)", "w", "the argument must be a constant times t"},
            {"x[n+1] = x[n] + cos(w n)", "w", "sampled waves are not supported together with parameters"},
        };
        for (String[] c : cases) {
            InputException e = assertThrows(InputException.class, () -> parse(c[0], c[1]), c[0]);
            assertTrue(e.getMessage().contains(c[2]), c[0] + ": " + e.getMessage());
        }
    }
}
