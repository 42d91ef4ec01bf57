package dev.rootform.export.html;

import dev.rootform.export.notation.Xml;

/**
 * Escaping of plain text for HTML markup.
 *
 * @since 0.3
 */
public final class Html {
    private Html() {
    }

    /** text with {@code & < > "} escaped. */
    public static String text(String text) {
        return Xml.escape(text);
    }
}
