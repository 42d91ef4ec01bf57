package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.DocumentOptions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * MathML output ({@code --format mathml}) pasted into a bare HTML page and loaded in headless
 * Chromium: no errors, laid out with non-zero size, no row wider than the page (long rows are
 * broken), and every row the format promises present.
 */
class MathMlBrowserTest {
    @ParameterizedTest(name = "{0}")
    @MethodSource("dev.rootform.api.consumer.PageCorpus#documents")
    void mathMlLaysOutWithinThePage(PageCorpus.Case c) throws Exception {
        String mathml = PageCorpus.render(c, "mathml", DocumentOptions.defaults());
        for (String row : new String[] {"equation:", "characteristic:", "solution:", "valid for:"}) {
            assertTrue(mathml.contains("<mtext>" + row + "</mtext>"), c + ": no " + row + " row");
        }
        assertTrue(!mathml.contains("<mtext>equation: "), c + ": the equation is plain text");
        PageCorpus.report(c).analysis().constantValues().keySet().forEach(name -> assertTrue(
                mathml.contains("<msub><mi>" + name.charAt(0) + "</mi><mn>" + name.substring(1) + "</mn></msub><mo>≈</mo>"),
                c + ": constant " + name + " is missing"));
        BrowserProbe.load("mathml", c.name(), "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>" + c.name()
                + "</title></head><body>\n" + mathml + "</body></html>\n");
    }
}
