package dev.rootform.export.html;

import java.util.List;
import java.util.Objects;

/**
 * A report page: a title, a subtitle, generic sections and a closing caution. Any command can
 * build one and {@link PageRenderer#render} it to one self-contained HTML file.
 *
 * @param title plain text
 * @param subtitle plain text, e.g. the kind of equation
 * @param sections the content
 * @param caution plain text shown at the end
 * @since 0.3
 */
public record Page(String title, String subtitle, List<Section> sections, String caution) {
    public Page {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(subtitle, "subtitle");
        sections = List.copyOf(sections);
        Objects.requireNonNull(caution, "caution");
    }
}
