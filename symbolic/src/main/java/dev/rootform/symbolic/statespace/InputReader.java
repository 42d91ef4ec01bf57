package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.List;

/**
 * Reads the input of a state-space model: {@code impulse}, {@code step}, or a forcing in solve's
 * syntax as a function of t (continuous) or n (discrete), e.g. {@code sin(2t)}, {@code e^(-t)},
 * {@code (1/2)^n}, {@code cos(pi n/2)}.
 *
 * @since 0.3
 */
public final class InputReader {
    private InputReader() {
    }

    /** @throws InputException naming the problem, positioned in {@code text} */
    public static Input read(Domain domain, String text) {
        String trimmed = text.trim();
        if (trimmed.equals("impulse")) {
            return new Input.Impulse();
        }
        if (trimmed.equals("step")) {
            return new Input.Step();
        }
        boolean continuous = domain == Domain.DIFFERENTIAL;
        String prefix = continuous ? "y' = " : "x[n+1] = ";
        LinearEquation eq;
        try {
            eq = ProblemParser.parse(prefix + text, List.of(), continuous ? "t" : null).equation();
        } catch (InputException e) {
            throw new InputException("input: " + e.getMessage(), text, Math.max(-1, e.position() - prefix.length()));
        }
        if (!eq.coefficients().equals(List.of(Rational.ZERO, Rational.ONE)) || eq.shift() != 0
                || !eq.variable().equals(continuous ? "t" : "n")) {
            throw new InputException("input: must be a function of " + (continuous ? "t" : "n") + " alone, such as "
                    + (continuous ? "sin(2t) or e^(-t)" : "(1/2)^n or cos(pi n/2)") + ", or impulse or step", text, 0);
        }
        return new Input.Signal(trimmed, eq.forcing());
    }
}
