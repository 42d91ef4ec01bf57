package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.model.InputException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The transaction of {@link OutputFiles} and the command's refusals of output targets. */
class OutputFilesTest {
    @TempDir
    Path dir;

    private static OutputFiles.Target target(String option, Path path) {
        return new OutputFiles.Target(option, path);
    }

    private static String read(Path p) throws IOException {
        return Files.readString(p, StandardCharsets.UTF_8);
    }

    private List<Path> listing() throws IOException {
        try (var files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }

    @Test
    void writesBothFilesAndLeavesNoTemporaryFile() throws IOException {
        Map<OutputFiles.Target, String> texts = new LinkedHashMap<>();
        texts.put(target("--header", dir.resolve("v.h")), "header\n");
        texts.put(target("-o", dir.resolve("v.c")), "source\n");
        OutputFiles.write(texts);
        assertEquals("header\n", read(dir.resolve("v.h")));
        assertEquals("source\n", read(dir.resolve("v.c")));
        assertEquals(List.of(dir.resolve("v.c"), dir.resolve("v.h")), listing());
    }

    @Test
    void aReplacedFileKeepsItsPermissionsAndANewFileGetsTheUmaskMode() throws IOException {
        Path old = dir.resolve("old.txt");
        Files.writeString(old, "before");
        Files.setPosixFilePermissions(old, PosixFilePermissions.fromString("rw-r-----"));
        Path fresh = dir.resolve("fresh.txt");
        Path probe = Files.createFile(dir.resolve("probe")); // created like any new file: 0666 less the umask
        Map<OutputFiles.Target, String> texts = new LinkedHashMap<>();
        texts.put(target("--header", old), "after");
        texts.put(target("-o", fresh), "new");
        OutputFiles.write(texts);
        assertEquals("after", read(old));
        assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(old)));
        assertEquals(Files.getPosixFilePermissions(probe), Files.getPosixFilePermissions(fresh));
    }

    @Test
    void aSymbolicLinkIsWrittenThroughAndStaysALink() throws IOException {
        Path real = dir.resolve("real.txt");
        Files.writeString(real, "before");
        Path link = Files.createSymbolicLink(dir.resolve("link.txt"), real.getFileName());
        OutputFiles.write(Map.of(target("-o", link), "after"));
        assertTrue(Files.isSymbolicLink(link));
        assertEquals("after", read(real));
    }

    @Test
    void refusesTargetsThatAreNotRegularFilesBeforeWritingAnything() throws Exception {
        Path fifo = dir.resolve("pipe");
        assertEquals(0, new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor());
        Path header = dir.resolve("v.h");
        Files.writeString(header, "kept");
        for (Path bad : List.of(fifo, dir, Path.of("/"), Path.of("/dev/null"))) {
            Map<OutputFiles.Target, String> texts = new LinkedHashMap<>();
            texts.put(target("--header", header), "new header");
            texts.put(target("-o", bad), "source");
            InputException e = assertThrows(InputException.class, () -> OutputFiles.write(texts), bad.toString());
            assertTrue(e.getMessage().startsWith("-o " + bad + " "), e.getMessage());
            assertEquals("kept", read(header));
        }
        assertEquals(List.of(fifo, header), listing());
    }

    @Test
    void refusesAnEmptyPathAMissingDirectoryAndTheSameFileTwice() throws IOException {
        InputException empty = assertThrows(InputException.class, () -> OutputFiles.check(List.of(target("-o", Path.of("")))));
        assertEquals("-o '' is an empty path", empty.getMessage());
        Path missing = dir.resolve("no/such/dir/out.txt");
        InputException absent = assertThrows(InputException.class, () -> OutputFiles.check(List.of(target("-o", missing))));
        assertTrue(absent.getMessage().contains(missing.toString()) && absent.getMessage().contains("does not exist"), absent.getMessage());
        Path file = dir.resolve("same.c");
        Path link = Files.createSymbolicLink(dir.resolve("alias.c"), file.getFileName());
        InputException same = assertThrows(InputException.class,
                () -> OutputFiles.check(List.of(target("--header", file), target("-o", link))));
        assertTrue(same.getMessage().contains("names the same file as --header"), same.getMessage());
    }

    @Test
    void theCommandWritesNeitherFileWhenOneTargetIsRefused() throws IOException {
        Path header = dir.resolve("fib.h");
        Files.writeString(header, "kept");
        MainTest.Run r = MainTest.run("solve", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "--format", "c",
                "--header", header.toString(), "-o", dir.toString());
        assertEquals(ExitCode.BAD_INPUT, r.code(), r.err());
        assertEquals("kept", read(header));
        assertEquals(List.of(header), listing());
    }

    @Test
    void theCommandWritesHeaderAndSourceTogether() throws IOException {
        Path header = dir.resolve("fib.h");
        Path source = dir.resolve("fib.c");
        MainTest.Run r = MainTest.run("solve", "x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1", "--format", "c",
                "--header", header.toString(), "-o", source.toString());
        assertEquals(ExitCode.VERIFIED, r.code(), r.err());
        assertTrue(read(source).contains("#include \"fib.h\""), read(source));
        assertTrue(read(header).contains("double rootform_value(long n);"), read(header));
        assertEquals("", r.out());
    }
}
