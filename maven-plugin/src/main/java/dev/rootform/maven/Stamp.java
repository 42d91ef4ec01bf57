package dev.rootform.maven;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What was generated from one spec: the SHA-256 of the plugin version and the spec's bytes, and the
 * source file it gave (relative to the output directory). Stored as two lines of text.
 *
 * @param hash lowercase hex SHA-256
 * @param source the generated file, e.g. {@code com/example/Fibonacci.java}
 */
record Stamp(String hash, String source) {
    Stamp {
        Objects.requireNonNull(hash, "hash");
        Objects.requireNonNull(source, "source");
    }

    /** The hash of a spec's content under a plugin version: a new version or any changed byte gives another. */
    static String hash(String pluginVersion, byte[] spec) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(pluginVersion.getBytes(StandardCharsets.UTF_8));
            sha.update((byte) 0);
            return HexFormat.of().formatHex(sha.digest(spec));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    /** The stamp stored in {@code file}, empty if there is none or it is not a stamp. */
    static Optional<Stamp> read(Path file) throws IOException {
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        return lines.size() == 2 ? Optional.of(new Stamp(lines.get(0), lines.get(1))) : Optional.empty();
    }

    void write(Path file) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, hash + "\n" + source + "\n", StandardCharsets.UTF_8);
    }
}
