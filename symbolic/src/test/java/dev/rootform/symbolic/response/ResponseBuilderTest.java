package dev.rootform.symbolic.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.ProblemParser;
import dev.rootform.symbolic.parse.TransferParser;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ResponseBuilderTest {
    private static ResponsePlan plan(String h, String input) {
        TransferFunction tf = TransferParser.parse(h);
        return ResponseBuilder.plan(tf, Input.parse(input, tf.domain()));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // the step response of (s + 3)/(s^2 + 2s + 5) starts with y(0+) = 0 and y'(0+) = 1 (the initial-value
        // theorem on s·Y and s²·Y, hand algebra); for t > 0 the input's derivative is 0, so the right side is 3·1
        "H(s) = (s + 3)/(s^2 + 2s + 5)                 | step      | y'' + 2y' + 5y = 3; y(0) = 0; y'(0) = 1 | FORCED",
        "H(s) = (s + 3)/(s^2 + 2s + 5)                 | impulse   | y'' + 2y' + 5y = 0; y(0) = 1; y'(0) = 1 | FORCED",
        "H(s) = 1/(s + 1)                              | ramp      | y' + y = t; y(0) = 0                    | FORCED",
        "H(s) = 1/(s + 1)                              | sin(2t)   | y' + y = sin(2t); y(0) = 0              | FORCED",
        "H(s) = 2/(s + 1)                              | e^(-t)    | y' + y = 2e^(-t); y(0) = 0              | FORCED",
        "H(s) = s/(s + 1)                              | step      | y' + y = 0; y(0) = 1                    | FORCED",
        "H(s) = 5                                      | step      | y' = 0; y(0) = 5                        | STEADY_ONLY",
        "H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)    | impulse   | y[n+2] - 1.5y[n+1] + 0.56y[n] = 0; y[0] = 1; y[1] = 2.5 | FORCED",
        "H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)    | step      | y[n+2] - 1.5y[n+1] + 0.56y[n] = 2; y[0] = 1; y[1] = 3.5 | FORCED",
        "H(z) = 0.5/(1 - 0.5z^-1)                      | (1/4)^n   | y[n+1] - 0.5y[n] = 0.125(0.25)^n; y[0] = 0.5 | FORCED",
        "H(z) = 1 + z^-1                               | impulse   | y[n+2] = 0; y[0] = 1; y[1] = 1          | STEADY_ONLY",
        "H(z) = 1 + z^-1                               | step      | y[n+2] - y[n+1] = 0; y[0] = 1; y[1] = 2 | STEADY_ONLY",
        "H(z) = z^-1/(1 - 0.5z^-1)                     | impulse   | y[n+2] - 0.5y[n+1] = 0; y[0] = 0; y[1] = 1 | FORCED",
        // y[n] + 0.25y[n-2] = u[n] gives y[n+2] + 0.25y[n] = cos(π(n + 2)/2) = -cos(πn/2) for n >= 0
        "H(z) = 1/(1 + 0.25z^-2)                       | cos(pi n/2) | y[n+2] + 0.25y[n] = -cos(0.5 pi n); y[0] = 1; y[1] = 0 | FORCED",
    })
    void plansTheInitialValueProblem(String h, String input, String problem, String split) {
        ResponsePlan p = plan(h, input);
        assertEquals(problem, SolveSyntax.problem(p.problem()));
        assertEquals(ResponsePlan.Split.valueOf(split), p.split());
        // what is shown in solve's syntax reads back as the same problem
        Problem back = ProblemParser.parse(SolveSyntax.problem(p.problem()), List.of(), null);
        assertEquals(p.problem(), back);
    }

    @Test
    void impulsesComeFromThePolynomialPart() {
        // (s^2 + 1)/(s + 1) = s - 1 + 2/(s + 1): δ'(t) - δ(t) + 2e^(-t) (hand algebra)
        ResponsePlan p = plan("H(s) = (s^2 + 1)/(s + 1)", "impulse");
        assertEquals(List.of(new Impulse(0, Rational.of(-1)), new Impulse(1, Rational.ONE)), p.impulses());
        // (1 + 2z^-1 + 3z^-2)/(1 - 0.5z^-1): in w = z^-1, (1 + 2w + 3w^2)/(1 - w/2) = -6w - 16 + 17/(1 - w/2)
        ResponsePlan d = plan("H(z) = (1 + 2z^-1 + 3z^-2)/(1 - 0.5z^-1)", "impulse");
        assertEquals(List.of(new Impulse(0, Rational.of(-16)), new Impulse(1, Rational.of(-6))), d.impulses());
    }

    @Test
    void theRelationIsSolveSyntax() {
        assertEquals("y'' + 2y' + 5y = u' + 3u", SolveSyntax.relation(TransferParser.parse("H(s) = (s + 3)/(s^2 + 2s + 5)")));
        assertEquals("y[n] - 1.5y[n-1] + 0.56y[n-2] = u[n] + u[n-1]",
                SolveSyntax.relation(TransferParser.parse("H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)")));
    }

    @Test
    void refusesAnInputWithoutARationalTransformAndAnAdvance() {
        InputException e = assertThrows(InputException.class, () -> plan("H(z) = 1/(1 - 0.5z^-1)", "sin(pi n/3)"));
        assertTrue(e.getMessage().contains("not rational"), e.getMessage());
        assertThrows(InputException.class, () -> plan("H(s) = 1/(s + 1)", "sin(pi t)"));
        InputException advance = assertThrows(InputException.class, () -> plan("H(z) = z^2/(z - 0.5)", "step"));
        assertTrue(advance.getMessage().contains("not causal"), advance.getMessage());
    }

    @Test
    void factsOfASecondOrderSection() {
        TransferFacts f = TransferFacts.of(TransferParser.parse("H(s) = (s + 3)/(s^2 + 2s + 5)"));
        assertEquals(java.util.Optional.of(Rational.of(3, 5)), f.dcGain());
        assertEquals(1, f.relativeDegree());
        assertTrue(f.stable());
        assertEquals(2, f.poleRoots().size());
        TransferFacts hidden = TransferFacts.of(TransferParser.parse("H(s) = (s - 1)/((s - 1)(s + 2))"));
        assertEquals(1, hidden.hiddenModes().size());
        assertTrue(!hidden.hiddenModes().get(0).stable());
        assertTrue(hidden.stable());
        TransferFacts integrator = TransferFacts.of(TransferParser.parse("H(z) = 1/(1 - z^-1)"));
        assertEquals(java.util.Optional.empty(), integrator.dcGain());
        assertTrue(!integrator.stable());
        assertEquals(Domain.DIFFERENCE, TransferParser.parse("H(z) = 1/(1 - z^-1)").domain());
    }
}
