package dev.rootform.export.document;

import java.util.List;

/**
 * Lines under aligned labels: the label in a fixed-width column, continuation lines indented to
 * the same column. Collects lines in order; {@link #toString()} gives the text.
 *
 * @since 0.1
 */
final class Layout {
    private static final int LABEL_WIDTH = 16;

    private final StringBuilder text = new StringBuilder();

    /** Adds a section: the label on the first line, nothing for an empty list. */
    Layout section(String label, List<String> lines) {
        for (int i = 0; i < lines.size(); i++) {
            String head = i == 0 ? label : "";
            text.append(head).append(" ".repeat(Math.max(1, LABEL_WIDTH - head.length()))).append(lines.get(i)).append('\n');
        }
        return this;
    }

    /** Adds a one-line section. */
    Layout line(String label, String line) {
        return section(label, List.of(line));
    }

    @Override
    public String toString() {
        return text.toString();
    }
}
