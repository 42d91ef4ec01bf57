package dev.rootform.cli;

import dev.rootform.api.batch.BatchAnswer;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.RandomAccessFile;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * The answer lines of a batch, one JSON object per line, appended and flushed line by line so that
 * a killed run loses at most the lines in flight. Thread-safe.
 */
final class AnswerLog implements AutoCloseable {
    private final Writer out;
    private final boolean owned;
    private final Set<String> answered;

    private AnswerLog(Writer out, boolean owned, Set<String> answered) {
        this.out = out;
        this.owned = owned;
        this.answered = Set.copyOf(answered);
    }

    /** Answers to a stream the caller owns and closes (standard output); nothing answered before. */
    static AnswerLog to(PrintWriter out) {
        return new AnswerLog(out, false, Set.of());
    }

    /**
     * Answers to {@code file}: emptied first, or with {@code resume} kept, its ids read as answered,
     * and a torn last line (no line break: the run before was killed while writing it) cut off.
     */
    static AnswerLog open(Path file, boolean resume) throws IOException {
        Set<String> answered = new HashSet<>();
        if (resume && Files.exists(file)) {
            dropTornLine(file);
            List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
            lines.forEach(line -> BatchAnswer.idOf(line).ifPresent(answered::add));
        }
        StandardOpenOption mode = resume ? StandardOpenOption.APPEND : StandardOpenOption.TRUNCATE_EXISTING;
        return new AnswerLog(Files.newBufferedWriter(file, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                StandardOpenOption.WRITE, mode), true, answered);
    }

    /** The ids already answered in the file when it was opened. */
    Set<String> answered() {
        return answered;
    }

    /** Appends one answer line and flushes it to the operating system. */
    synchronized void write(String line) throws IOException {
        out.write(line);
        out.write('\n');
        out.flush();
        if (out instanceof PrintWriter p && p.checkError()) {
            throw new IOException("cannot write the answers to standard output");
        }
    }

    @Override
    public synchronized void close() throws IOException {
        if (owned) {
            out.close();
        }
    }

    private static void dropTornLine(Path file) throws IOException {
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            Optional<Long> end = lastLineBreak(raf);
            long keep = end.map(e -> e + 1).orElse(0L);
            if (keep < raf.length()) {
                raf.setLength(keep);
            }
        }
    }

    /** The position of the last '\n', scanning back from the end in blocks. */
    private static Optional<Long> lastLineBreak(RandomAccessFile raf) throws IOException {
        byte[] block = new byte[8192];
        long end = raf.length();
        while (end > 0) {
            int size = (int) Math.min(block.length, end);
            raf.seek(end - size);
            raf.readFully(block, 0, size);
            for (int i = size - 1; i >= 0; i--) {
                if (block[i] == '\n') {
                    return Optional.of(end - size + i);
                }
            }
            end -= size;
        }
        return Optional.empty();
    }
}
