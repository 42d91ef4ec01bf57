package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.model.InputException;
import java.util.List;

/** Which transform variable a transfer-function text uses: s or z, never both. */
final class TransferVariable {
    static final String S = "s";
    static final String Z = "z";

    private TransferVariable() {
    }

    static boolean isVariable(String name) {
        return name.equals(S) || name.equals(Z);
    }

    /**
     * The variable of the first s or z in the text (s when there is none).
     *
     * @throws InputException at the first occurrence of the other one
     */
    static String of(String source, List<int[]> segments) {
        String chosen = null;
        for (int[] segment : segments) {
            for (Token token : new Lexer(source, segment[0], segment[1]).tokens()) {
                if (!token.is(Token.Kind.NAME) || !isVariable(token.text())) {
                    continue;
                }
                if (chosen == null) {
                    chosen = token.text();
                } else if (!chosen.equals(token.text())) {
                    throw new InputException("mixes " + chosen + " and " + token.text()
                            + ": a transfer function is in s (continuous time) or in z (discrete time), not both",
                            source, token.start());
                }
            }
        }
        return chosen == null ? S : chosen;
    }
}
