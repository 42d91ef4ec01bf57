package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.DocumentOptions;
import dev.rootform.export.document.ParametricLatexRenderer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code --format latex --standalone} compiled by pdflatex (TeX Live): no error, and no overfull
 * box wider than 1 pt in the log, i.e. every line fits the text width of an A4 page at 10 pt;
 * the first page is converted to PNG (pdftoppm) under target/consumer/latex for review.
 */
class StandaloneLatexTest {
    private static final Pattern OVERFULL = Pattern.compile("Overfull \\\\[hv]box \\(([0-9.]+)pt too (wide|high)\\)");
    private static final double TOLERANCE_PT = 1.0;

    @ParameterizedTest(name = "{0}")
    @MethodSource("dev.rootform.api.consumer.PageCorpus#documents")
    void compilesWithoutOverfullBoxes(PageCorpus.Case c) throws Exception {
        assertFits(c.name(), PageCorpus.render(c, "latex", new DocumentOptions(true, Optional.empty())));
    }

    /** Answers with parameters: long case formulas, conditions and stability conditions must break to fit. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("dev.rootform.api.consumer.PageCorpus#parametricDocuments")
    void parametricDocumentsCompileWithoutOverfullBoxes(PageCorpus.Parametric p) throws Exception {
        assertFits(p.name(), ParametricLatexRenderer.document(PageCorpus.report(p)));
    }

    private static void assertFits(String name, String tex) throws Exception {
        assertTrue(tex.contains("\\documentclass[10pt,a4paper]{article}"), name + ": not a complete document");
        assertTrue(!tex.matches("(?s).*\\\\usepackage\\{(?!amsmath|amssymb).*"), name + ": a package beyond amsmath and amssymb");
        Path dir = Tools.OUT.resolve("latex").toAbsolutePath();
        Tools.writeString(dir.resolve(name + ".tex"), tex);
        Tools.Run run = Tools.run(List.of(Tools.pdflatex(), "-interaction=nonstopmode", "-halt-on-error", name + ".tex"), dir);
        String log = Files.readString(dir.resolve(name + ".log"), StandardCharsets.ISO_8859_1);
        List<String> errors = log.lines().filter(l -> l.startsWith("!")).toList();
        assertEquals(List.of(), errors, name + ": pdflatex errors");
        assertEquals(0, run.exit(), name + ": pdflatex failed: " + run.out());
        List<String> overfull = new ArrayList<>();
        Matcher m = OVERFULL.matcher(log);
        while (m.find()) {
            if (Double.parseDouble(m.group(1)) > TOLERANCE_PT) {
                overfull.add(m.group());
            }
        }
        assertEquals(List.of(), overfull, name + ": lines wider than the page");
        Tools.Run png = Tools.run(List.of(Tools.poppler("pdftoppm"), "-png", "-r", "90", "-f", "1", "-l", "1", "-singlefile",
                name + ".pdf", name), dir);
        assertEquals(0, png.exit(), name + ": pdftoppm failed: " + png.err());
    }
}
