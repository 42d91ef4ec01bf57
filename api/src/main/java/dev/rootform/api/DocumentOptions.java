package dev.rootform.api;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * How the document formats are laid out. Immutable.
 *
 * @param standalone {@code latex}: a complete document (article, 10 pt, A4, amsmath and amssymb)
 *     instead of a fragment for a display environment
 * @param withCode {@code html}: the generated code in this language ({@code "java"} or
 *     {@code "c"}) shown on the page
 * @since 0.3
 */
public record DocumentOptions(boolean standalone, Optional<String> withCode) {
    /** The languages {@link #withCode} accepts. */
    public static final List<String> CODE_LANGUAGES = List.of("java", "c");

    /** @throws IllegalArgumentException for a language not in {@link #CODE_LANGUAGES} */
    public DocumentOptions {
        Objects.requireNonNull(withCode, "withCode");
        withCode.ifPresent(language -> {
            if (!CODE_LANGUAGES.contains(language)) {
                throw new IllegalArgumentException("withCode (" + language + ") must be one of " + CODE_LANGUAGES);
            }
        });
    }

    /** A LaTeX fragment, a page without code. */
    public static DocumentOptions defaults() {
        return new DocumentOptions(false, Optional.empty());
    }
}
