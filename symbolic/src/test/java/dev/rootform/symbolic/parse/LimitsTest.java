package dev.rootform.symbolic.parse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.model.Problem;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Sizes at a limit are read; one beyond is refused with a message naming the limit. */
class LimitsTest {
    private static Problem parse(String text) {
        return ProblemParser.parse(text, List.of(), null);
    }

    private static void refused(String text, String fragment) {
        InputException e = assertThrows(InputException.class, () -> parse(text), text.length() > 80 ? text.substring(0, 80) : text);
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
    }

    @Test
    void orderAtTheLimitIsReadAndOneMoreIsRefused() {
        assertEquals(Limits.MAX_ORDER, parse("y^(" + Limits.MAX_ORDER + ") = y").equation().order());
        assertEquals(Limits.MAX_ORDER, parse("x[n+" + Limits.MAX_ORDER + "] = x[n]").equation().order());
        refused("y^(" + (Limits.MAX_ORDER + 1) + ") = y", "above the limit");
        refused("x[n+" + (Limits.MAX_ORDER + 1) + "] = x[n]", "above the order limit");
    }

    @Test
    void nestingLiteralsAndLengthAtTheirLimits() {
        int depth = Limits.MAX_NESTING - 2;
        parse("y' = " + "(".repeat(depth) + "y" + ")".repeat(depth));
        refused("y' = " + "(".repeat(Limits.MAX_NESTING + 1) + "y" + ")".repeat(Limits.MAX_NESTING + 1), "nested too deeply");
        parse("y' = 0." + "1".repeat(Limits.MAX_LITERAL_DIGITS - 1) + " y");
        refused("y' = 0." + "1".repeat(Limits.MAX_LITERAL_DIGITS) + " y", "digits");
        parse("y' = y" + " ".repeat(Limits.MAX_INPUT_LENGTH - 6));
        refused("y' = y" + " ".repeat(Limits.MAX_INPUT_LENGTH - 5), "characters");
        parse("y' = y" + " + 0".repeat(Limits.MAX_EXPRESSION_DEPTH - 1));
        refused("y' = y" + " + 0".repeat(Limits.MAX_EXPRESSION_DEPTH + 1), "operations one after another");
    }

    @Test
    void forcingDegreeAndIndicesAtTheirLimits() {
        parse("x[n+1] = x[n] + n^" + Limits.MAX_FORCING_DEGREE);
        refused("x[n+1] = x[n] + n^" + (Limits.MAX_FORCING_DEGREE + 1), "too large");
        parse("x[n+1] = 2x[n]; x[" + Limits.MAX_INDEX + "] = 1");
        refused("x[n+1] = 2x[n]; x[" + (Limits.MAX_INDEX + 1) + "] = 1", "indices up to");
        parse("y' = y + 2^1000");
        refused("y' = y + 10^2001", "too large");
    }
}
