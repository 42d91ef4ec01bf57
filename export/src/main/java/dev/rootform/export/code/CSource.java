package dev.rootform.export.code;

import java.util.Objects;
import java.util.Optional;

/**
 * Generated C99: the source, and the header when it is a separate file.
 *
 * @param source the .c file (it includes the header when there is one, else declares the function itself)
 * @param header the .h file, when requested
 * @since 0.2
 */
public record CSource(String source, Optional<String> header) {
    public CSource {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(header, "header");
    }
}
