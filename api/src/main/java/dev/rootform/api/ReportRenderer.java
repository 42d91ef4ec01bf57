package dev.rootform.api;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Rendering;
import java.util.Optional;
import java.util.function.Function;

/**
 * Renders one kind of report ({@code ResponseReport}, {@code ParametricReport}) in one format, as
 * {@link ResponseExporters} and {@link ParametricExporters} give them by name; stateless and
 * thread-safe.
 *
 * @param <R> the kind of report
 * @since 0.3
 */
public interface ReportRenderer<R> {
    /** Why {@code report} cannot be written in this format, or empty when it can. */
    default Optional<String> refusal(R report) {
        return Optional.empty();
    }

    /**
     * The answer in this format.
     *
     * @param names names for generated code; ignored by the document formats
     * @throws IllegalArgumentException if {@link #refusal} is not empty
     */
    Rendering render(R report, CodeNames names);

    /** A document format: the text {@code writer} gives, never refused. */
    static <R> ReportRenderer<R> document(Function<R, String> writer) {
        return (report, names) -> Rendering.of(writer.apply(report));
    }
}
