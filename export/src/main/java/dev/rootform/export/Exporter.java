package dev.rootform.export;

/**
 * Renders a finished {@link Report} in one format. Implementations only format what the report
 * holds; they compute no mathematics. Stateless and thread-safe.
 *
 * @since 0.2
 */
public interface Exporter {
    /** The format's name on the command line and in the lookup, e.g. {@code "latex"}. */
    String format();

    /**
     * The answer in this format.
     *
     * @param names names for generated code; ignored by the document formats
     * @throws dev.rootform.symbolic.parse.InputException if the answer cannot be written in this
     *     format (e.g. code for a general solution)
     */
    Rendering render(Report report, CodeNames names);
}
