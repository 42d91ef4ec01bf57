package dev.rootform.export;

import java.util.Objects;
import java.util.Optional;

/**
 * One rendered answer: the main text, and for C with a separate header file, that header.
 *
 * @since 0.2
 */
public record Rendering(String text, Optional<String> header) {
    public Rendering {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(header, "header");
    }

    /** A rendering with no side file. */
    public static Rendering of(String text) {
        return new Rendering(text, Optional.empty());
    }
}
