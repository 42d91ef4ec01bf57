package dev.rootform.export.html;

import java.util.List;
import java.util.Objects;

/**
 * A headed section of a report page.
 *
 * @param heading plain text
 * @param blocks the content, in order
 * @since 0.3
 */
public record Section(String heading, List<Block> blocks) {
    public Section {
        Objects.requireNonNull(heading, "heading");
        blocks = List.copyOf(blocks);
    }
}
