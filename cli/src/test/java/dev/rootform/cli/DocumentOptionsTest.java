package dev.rootform.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The report page and the layout options of the document formats, through the command. */
class DocumentOptionsTest {
    private static final String OSCILLATOR = "y'' + 2y' + 10y = 3 sin(2t); y(0) = 1; y'(0) = 0";

    @Test
    void writesAReportPageWithPlotsAndCode(@TempDir Path dir) throws Exception {
        Path page = dir.resolve("page.html");
        MainTest.Run r = MainTest.run("solve", OSCILLATOR, "--values-at", "1", "--format", "html", "--with-code", "java",
                "-o", page.toString());
        assertEquals(0, r.code(), r.err());
        String html = Files.readString(page);
        assertTrue(html.startsWith("<!DOCTYPE html>"), html.substring(0, 40));
        for (String part : new String[] {"id='time-plot'", "id='roots-plot'", "id='frequency-plot'", "<math",
            "data-language=\"java\"", "public final class Solution"}) {
            assertTrue(html.contains(part), "no " + part);
        }
        String namespacesRemoved = html.replaceAll("http://www\\.w3\\.org/[0-9]{4}/[A-Za-z/]+|http://www\\.jfree\\.org/jfreesvg/svg", "");
        assertTrue(!namespacesRemoved.matches("(?s).*https?://.*"), "a link off the page (only XML namespaces may name a URL)");
    }

    @Test
    void standaloneLatexIsADocument() {
        MainTest.Run r = MainTest.run("solve", OSCILLATOR, "--format", "latex", "--standalone");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("\\documentclass[10pt,a4paper]{article}") && r.out().contains("\\end{document}"), r.out());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--format|json|--standalone||--standalone is for --format latex",
        "--format|latex|--with-code|java|--with-code is for --format html",
        "--format|html|--with-code|cobol|--with-code cobol is not one of java, c"})
    void misplacedLayoutOptionsAreBadInput(String o1, String v1, String o2, String v2, String message) {
        MainTest.Run r = v2 == null ? MainTest.run("solve", OSCILLATOR, o1, v1, o2) : MainTest.run("solve", OSCILLATOR, o1, v1, o2, v2);
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains(message), r.err());
    }

    @Test
    void pageWithCodeOfAGeneralSolutionIsRefused() {
        MainTest.Run r = MainTest.run("solve", "y'' + y = 0", "--format", "html", "--with-code", "c");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("fitted constants"), r.err());
    }
}
