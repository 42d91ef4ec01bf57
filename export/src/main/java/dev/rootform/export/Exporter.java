package dev.rootform.export;

import java.util.Optional;

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
     * Why {@code report} cannot be written in this format (e.g. code for a general solution), or
     * empty when it can.
     */
    default Optional<String> refusal(Report report) {
        return Optional.empty();
    }

    /**
     * The answer in this format.
     *
     * @param names names for generated code; ignored by the document formats
     * @throws IllegalArgumentException if {@link #refusal(Report)} is not empty
     */
    Rendering render(Report report, CodeNames names);
}
