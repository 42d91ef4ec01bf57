package dev.rootform.symbolic.model;

/**
 * The project's refusal of bad or out-of-scope input: a syntax error, an unknown name, an equation
 * outside the scope (nonlinear, variable coefficients, non-integer shifts), or conditions the
 * solver cannot accept. Carries the offending text and the 0-based position of the problem in it,
 * so the caller can print a caret under it. It lives beside the problem model so that every layer
 * that reads input (the parser, the solver, the command) can use it. The numeric and export layers
 * offer precondition checks that return a refusal's message instead; of this type they throw only
 * the solver's {@code ConditionsException} (conditions that pick no single solution, found when
 * boundary values are solved numerically).
 *
 * @since 0.1
 */
public class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String source;
    private final int position;

    /**
     * @param message one line naming the problem, without the position
     * @param source the text that was being read
     * @param position 0-based index into {@code source}, or -1 if the problem has no single place
     */
    public InputException(String message, String source, int position) {
        super(message);
        this.source = source;
        this.position = position;
    }

    public String source() {
        return source;
    }

    public int position() {
        return position;
    }
}
