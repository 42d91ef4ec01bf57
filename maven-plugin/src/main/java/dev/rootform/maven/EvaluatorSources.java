package dev.rootform.maven;

import dev.rootform.api.batch.EvaluatorSpec;
import dev.rootform.api.batch.GeneratedCode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Turns the spec files of one directory ({@code *.json}) into Java evaluators under an output
 * directory, regenerating only a spec whose bytes or the plugin version changed (a {@link Stamp}
 * per spec in the state directory), and removing what a deleted spec had generated.
 */
final class EvaluatorSources {
    private final Path specs;
    private final Path output;
    private final Path state;
    private final String pluginVersion;
    private final Path shownFrom;

    /**
     * @param shownFrom the directory that failure messages give spec paths relative to (the project's)
     */
    EvaluatorSources(Path specs, Path output, Path state, String pluginVersion, Path shownFrom) {
        this.specs = specs;
        this.output = output;
        this.state = state;
        this.pluginVersion = pluginVersion;
        this.shownFrom = shownFrom;
    }

    /**
     * What one run did.
     *
     * @param failures one line per failing spec: its path, a colon and the message
     */
    record Summary(int generated, int upToDate, int removed, List<String> failures) {
        Summary {
            failures = List.copyOf(failures);
        }
    }

    Summary update() throws IOException {
        List<Path> files = specFiles();
        int generated = 0;
        int upToDate = 0;
        List<String> failures = new ArrayList<>();
        Map<String, Path> bySource = new HashMap<>();
        for (Path spec : files) {
            byte[] bytes = Files.readAllBytes(spec);
            String hash = Stamp.hash(pluginVersion, bytes);
            Path stampFile = stampOf(spec);
            Optional<Stamp> old = Stamp.read(stampFile);
            if (old.isPresent() && old.get().hash().equals(hash) && Files.isRegularFile(output.resolve(old.get().source()))) {
                upToDate++;
                claim(bySource, old.get().source(), spec, failures);
                continue;
            }
            GeneratedCode code = EvaluatorSpec.generate(new String(bytes, StandardCharsets.UTF_8));
            if (code instanceof GeneratedCode.Failure f) {
                failures.add(shown(spec) + ": " + f.message());
                continue;
            }
            GeneratedCode.Source source = (GeneratedCode.Source) code;
            if (!claim(bySource, source.relativePath(), spec, failures)) {
                continue;
            }
            if (old.isPresent() && !old.get().source().equals(source.relativePath())) {
                Files.deleteIfExists(output.resolve(old.get().source()));
            }
            Path target = output.resolve(source.relativePath());
            Files.createDirectories(target.getParent());
            Files.writeString(target, source.text(), StandardCharsets.UTF_8);
            new Stamp(hash, source.relativePath()).write(stampFile);
            generated++;
        }
        return new Summary(generated, upToDate, removeStale(files), failures);
    }

    /** Records that {@code spec} generates {@code source}; false (and a failure) if another spec already does. */
    private boolean claim(Map<String, Path> bySource, String source, Path spec, List<String> failures) {
        Path other = bySource.putIfAbsent(source, spec);
        if (other != null) {
            failures.add(shown(spec) + ": generates " + source + " like " + shown(other) + "; give it another class or package");
            return false;
        }
        return true;
    }

    /** Deletes the stamps and the sources of specs that are gone; returns how many. */
    private int removeStale(List<Path> files) throws IOException {
        if (!Files.isDirectory(state)) {
            return 0;
        }
        List<Path> stamps;
        try (Stream<Path> list = Files.list(state)) {
            stamps = list.filter(p -> p.getFileName().toString().endsWith(".stamp")).sorted().toList();
        }
        int removed = 0;
        for (Path stamp : stamps) {
            String name = stamp.getFileName().toString();
            if (files.stream().noneMatch(f -> stampOf(f).getFileName().toString().equals(name))) {
                Optional<Stamp> old = Stamp.read(stamp);
                if (old.isPresent()) {
                    Files.deleteIfExists(output.resolve(old.get().source()));
                }
                Files.delete(stamp);
                removed++;
            }
        }
        return removed;
    }

    private List<Path> specFiles() throws IOException {
        if (!Files.isDirectory(specs)) {
            return List.of();
        }
        try (Stream<Path> list = Files.list(specs)) {
            return list.filter(p -> p.getFileName().toString().endsWith(".json") && Files.isRegularFile(p)).sorted().toList();
        }
    }

    private Path stampOf(Path spec) {
        return state.resolve(spec.getFileName().toString() + ".stamp");
    }

    private String shown(Path spec) {
        Path absolute = spec.toAbsolutePath().normalize();
        Path base = shownFrom.toAbsolutePath().normalize();
        return (absolute.startsWith(base) ? base.relativize(absolute) : absolute).toString();
    }
}
