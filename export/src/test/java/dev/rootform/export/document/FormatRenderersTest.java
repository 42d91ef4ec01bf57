package dev.rootform.export.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.export.Corpus;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;

/** LaTeX (parsed by KaTeX on Node) and MathML (parsed by JAXP). */
class FormatRenderersTest {
    /** The KaTeX check script and its installed packages (installed by .ci/run: npm ci --prefix export/src/test/node). */
    private static final Path NODE_DIR = Path.of("src/test/node");

    @TempDir
    Path dir;

    private static List<String> inputs() {
        List<String> all = new ArrayList<>(Corpus.SEQUENCES);
        all.addAll(Corpus.FUNCTIONS);
        all.add("(D+1)^2 (D^2+4) y = 0");
        all.add("x[n+3] = x[n+1] + x[n]");
        return all;
    }

    @Test
    void latexParsesWithKatex() throws Exception {
        assertTrue(Files.isDirectory(NODE_DIR.resolve("node_modules/katex")), "KaTeX missing: run npm ci --prefix export/src/test/node");
        List<String> command = new ArrayList<>(List.of("node", NODE_DIR.resolve("katex-check.js").toString()));
        for (String input : inputs()) {
            String latex = LatexRenderer.render(Corpus.report(input));
            assertTrue(latex.contains("\\begin{aligned}") && latex.contains("\\text{solution:}"), latex);
            Path file = dir.resolve("f" + command.size() + ".tex");
            Files.writeString(file, latex);
            command.add(file.toString());
        }
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), out);
    }

    @Test
    void latexShowsExactConstantsAndRange() {
        String fib = LatexRenderer.render(Corpus.report(Corpus.SEQUENCES.get(0)));
        assertTrue(fib.contains("\\sqrt{5}") && fib.contains("\\frac{1}{2}") && fib.contains("n \\geq 0"), fib);
        String damped = LatexRenderer.render(Corpus.report(Corpus.FUNCTIONS.get(0)));
        assertTrue(damped.contains("e^{-t}") && damped.contains("\\cos") && damped.contains("\\mathbb{R}"), damped);
    }

    @Test
    void mathmlIsWellFormedPresentationMarkup() throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        for (String input : inputs()) {
            String xml = MathMlRenderer.render(Corpus.report(input));
            Document d = f.newDocumentBuilder().parse(new InputSource(new StringReader(xml)));
            assertEquals(MathMlRenderer.NAMESPACE, d.getDocumentElement().getNamespaceURI(), input);
            assertEquals("math", d.getDocumentElement().getLocalName());
            assertEquals("block", d.getDocumentElement().getAttribute("display"));
            assertTrue(d.getElementsByTagNameNS(MathMlRenderer.NAMESPACE, "mi").getLength() > 0, input);
            assertTrue(d.getElementsByTagNameNS(MathMlRenderer.NAMESPACE, "mn").getLength() > 0, input);
        }
    }
}
