package dev.rootform.symbolic.model;

/**
 * The project's refusal of bad or out-of-scope input: a syntax error, an unknown name, an equation
 * outside the scope (nonlinear, variable coefficients, non-integer shifts), or conditions the
 * solver cannot accept. Carries the offending text and the 0-based position of the problem in it,
 * so the caller can print a caret under it. It lives beside the problem model so that every layer
 * that reads input (the parser, the solver, the command) can use it; the numeric and export layers
 * do not throw it but offer precondition checks that return the refusal's message.
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
