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
     * Why {@code report} cannot be written in this format with these names and this C variant (e.g.
     * C without the math library for a closed form that needs cos), or empty when it can. By default
     * {@link #refusal(Report)}.
     *
     * @since 0.3
     */
    default Optional<String> refusal(Report report, CodeNames names) {
        return refusal(report);
    }

    /**
     * The answer in this format.
     *
     * @param names names for generated code and the C variant; ignored by the document formats
     * @throws IllegalArgumentException if {@link #refusal(Report, CodeNames)} is not empty
     */
    Rendering render(Report report, CodeNames names);
}
