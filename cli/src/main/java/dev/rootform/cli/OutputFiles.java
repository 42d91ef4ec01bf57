package dev.rootform.cli;

import dev.rootform.symbolic.model.InputException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ThreadLocalRandom;

/**
 * The answer files of one command ({@code -o}, {@code --header}, ...), written as one transaction:
 * all of them or none. Every command that writes files goes through this class.
 *
 * <p>Before any work, {@link #check} refuses (as bad input, naming the option and the path) an
 * empty path, a path whose directory does not exist or cannot be written, an existing target that
 * is not a regular file (a directory such as {@code /}, a device, a FIFO), and two options naming
 * the same file. A symbolic link is written through to the file it points to (the link stays).
 *
 * <p>{@link #write} writes each text to a new temporary file in its target's directory, gives it
 * the permissions of the file it replaces (a new file is created by the operating system with the
 * usual mode, 0666 less the umask, as {@link Files#createFile} does without attributes), and only
 * when every text is written moves them over their targets by atomic renames; a replaced file is
 * kept as a hard link (or copy) until all moves are done, so that a failing move puts the earlier
 * targets back. On failure the temporary files are removed and existing files are left as they were.
 */
final class OutputFiles {
    /** A file to write: the option that named it (for messages) and its path as given. */
    record Target(String option, Path path) {
    }

    /** How many symbolic links are followed before a path is refused as a loop. */
    private static final int MAX_LINKS = 40;

    private OutputFiles() {
    }

    /**
     * The targets resolved to the files that will be written (links followed), in order.
     *
     * @throws InputException for an empty path, a missing or unwritable directory, a target that
     *     exists and is not a regular file, or two targets that are the same file
     */
    static List<Path> check(List<Target> targets) {
        List<Path> resolved = new ArrayList<>();
        for (Target t : targets) {
            Path file = resolve(t);
            for (int i = 0; i < resolved.size(); i++) {
                if (same(resolved.get(i), file)) {
                    throw refusal(t, "names the same file as " + targets.get(i).option() + " " + shown(targets.get(i).path()));
                }
            }
            resolved.add(file);
        }
        return resolved;
    }

    /**
     * Writes every text to its target, all or nothing.
     *
     * @param texts the targets in order, each with its complete text
     * @throws InputException as {@link #check}
     * @throws IOException when writing fails; then no target has changed
     */
    static void write(Map<Target, String> texts) throws IOException {
        List<Target> targets = List.copyOf(texts.keySet());
        List<Path> files = check(targets);
        Map<Path, Path> temps = new LinkedHashMap<>();
        Map<Path, Path> backups = new LinkedHashMap<>();
        List<Path> moved = new ArrayList<>();
        try {
            for (int i = 0; i < files.size(); i++) {
                temps.put(files.get(i), temporary(files.get(i), texts.get(targets.get(i))));
            }
            for (Path file : files) {
                if (Files.exists(file)) {
                    backups.put(file, backup(file));
                }
            }
            for (Path file : files) {
                Files.move(temps.get(file), file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                moved.add(file);
            }
        } catch (IOException | RuntimeException e) {
            try {
                rollBack(moved, backups);
            } catch (IOException again) {
                e.addSuppressed(again);
            }
            throw e;
        } finally {
            for (Path temp : temps.values()) {
                Files.deleteIfExists(temp);
            }
            for (Path backup : backups.values()) {
                Files.deleteIfExists(backup);
            }
        }
    }

    /** The file {@code t} names, with symbolic links followed; checked as {@link #check} describes. */
    private static Path resolve(Target t) {
        if (t.path().toString().isBlank()) {
            throw refusal(t, "is an empty path");
        }
        Path file = t.path().toAbsolutePath().normalize();
        for (int links = 0; Files.isSymbolicLink(file); links++) {
            if (links == MAX_LINKS) {
                throw refusal(t, "has too many levels of symbolic links");
            }
            try {
                file = file.resolveSibling(Files.readSymbolicLink(file)).toAbsolutePath().normalize();
            } catch (IOException e) {
                throw refusal(t, "is a symbolic link that cannot be read");
            }
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            throw refusal(t, Files.isDirectory(file) ? "is a directory, not a file" : "is not a regular file (a device, FIFO or socket)");
        }
        Path directory = file.getParent();
        if (directory == null || !Files.isDirectory(directory)) {
            throw refusal(t, "cannot be written: directory " + (directory == null ? "(none)" : shown(directory)) + " does not exist");
        }
        if (!Files.isWritable(directory) || Files.exists(file) && !Files.isWritable(file)) {
            throw refusal(t, "cannot be written: permission denied");
        }
        return file;
    }

    private static boolean same(Path a, Path b) {
        if (a.equals(b)) {
            return true;
        }
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }

    /** A new file beside {@code target} holding {@code text}, with the permissions of {@code target} when it exists. */
    private static Path temporary(Path target, String text) throws IOException {
        Path temp = fresh(target, ".tmp");
        try {
            Files.writeString(temp, text, StandardCharsets.UTF_8, StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE,
                    StandardOpenOption.SYNC);
            Optional<PosixFileAttributeView> from = posix(target);
            Optional<PosixFileAttributeView> to = posix(temp);
            if (Files.exists(target) && from.isPresent() && to.isPresent()) {
                to.get().setPermissions(from.get().readAttributes().permissions());
            }
            return temp;
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(temp);
            throw e;
        }
    }

    /** The existing {@code file} kept under a new name beside it: a hard link, or a copy where links are not supported. */
    private static Path backup(Path file) throws IOException {
        Path backup = fresh(file, ".bak");
        Files.delete(backup);
        try {
            Files.createLink(backup, file);
        } catch (UnsupportedOperationException | IOException e) {
            Files.copy(file, backup, StandardCopyOption.COPY_ATTRIBUTES);
        }
        return backup;
    }

    /** Puts the saved files back over the targets already moved; a target that did not exist before is removed. */
    private static void rollBack(List<Path> moved, Map<Path, Path> backups) throws IOException {
        for (Path file : moved) {
            Path backup = backups.get(file);
            if (backup == null) {
                Files.deleteIfExists(file);
            } else {
                Files.move(backup, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            }
        }
    }

    /**
     * A new empty file beside {@code target}, created without attributes so that the operating
     * system gives it the usual mode (0666 less the umask).
     */
    private static Path fresh(Path target, String suffix) throws IOException {
        while (true) {
            Path candidate = target.resolveSibling("." + target.getFileName() + ".rootform-"
                    + Long.toHexString(ThreadLocalRandom.current().nextLong() & Long.MAX_VALUE) + suffix);
            try {
                return Files.createFile(candidate);
            } catch (FileAlreadyExistsException e) {
                // another name is tried
            }
        }
    }

    private static Optional<PosixFileAttributeView> posix(Path p) {
        return Optional.ofNullable(Files.getFileAttributeView(p, PosixFileAttributeView.class, LinkOption.NOFOLLOW_LINKS));
    }

    private static InputException refusal(Target t, String problem) {
        return new InputException(t.option() + " " + shown(t.path()) + " " + problem, "", -1);
    }

    /** The path as given, in quotes when it is empty or has spaces, cut to 200 characters. */
    private static String shown(Path p) {
        String s = p.toString();
        s = s.length() > 200 ? s.substring(0, 197) + "..." : s;
        return s.isEmpty() || s.contains(" ") ? "'" + s + "'" : s;
    }
}
