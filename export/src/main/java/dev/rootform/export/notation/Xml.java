package dev.rootform.export.notation;

/**
 * Escaping for XML text and comments.
 *
 * @since 0.2
 */
public final class Xml {
    private Xml() {
    }

    /** text with {@code & < > "} replaced by entity references. */
    public static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
