package dev.rootform.api;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

/**
 * The renderers of one kind of report by format name, laid out as {@link DocumentOptions} say; the
 * table for the default options is built once.
 *
 * @param <R> the kind of report
 */
final class FormatTable<R> {
    private final Function<DocumentOptions, Map<String, ReportRenderer<R>>> index;
    private final Map<String, ReportRenderer<R>> defaults;

    /** @param index the renderers for the given options, in a fixed order (an ordered map) */
    FormatTable(Function<DocumentOptions, Map<String, ReportRenderer<R>>> index) {
        this.index = index;
        this.defaults = Collections.unmodifiableMap(index.apply(DocumentOptions.defaults()));
    }

    Optional<ReportRenderer<R>> byName(String format) {
        return Optional.ofNullable(defaults.get(format));
    }

    Optional<ReportRenderer<R>> byName(String format, DocumentOptions options) {
        return Optional.ofNullable(index.apply(options).get(format));
    }

    List<String> names() {
        return List.copyOf(defaults.keySet());
    }
}
