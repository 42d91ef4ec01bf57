package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.rootform.api.DocumentOptions;
import dev.rootform.api.Exporters;
import dev.rootform.api.Options;
import dev.rootform.api.Rootform;
import dev.rootform.api.SolveRequest;
import dev.rootform.export.CodeNames;
import dev.rootform.export.Report;
import dev.rootform.numeric.plot.TimePlot;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Report pages ({@code --format html}) loaded in headless Chromium: no errors, every {@code <math>}
 * laid out, nothing wider than the page, no resource fetched, and SVG plots drawn from the
 * report's own samples; screenshots under target/consumer/html. Printing to PDF on A4 and on Letter
 * keeps the whole page (pdfinfo, pdftotext from poppler).
 */
class ReportPageBrowserTest {
    @ParameterizedTest(name = "{0}")
    @MethodSource("dev.rootform.api.consumer.PageCorpus#pages")
    void pageLoadsWithPlotsOfItsData(PageCorpus.Case c) throws Exception {
        Report report = PageCorpus.report(c);
        JsonNode f = BrowserProbe.load("html", c.name(), PageCorpus.render(c, "html", DocumentOptions.defaults()));
        Map<String, JsonNode> svgs = new HashMap<>();
        f.get("svgs").forEach(s -> svgs.put(s.get("id").asText(), s));
        JsonNode roots = svgs.get("roots-plot");
        assertTrue(roots != null && roots.get("width").asDouble() > 0, c + ": no roots plot: " + svgs.keySet());
        assertTrue(roots.get("shapes").asInt() + roots.get("paths").asInt() >= report.roots().size(), c + ": a root is not drawn: " + roots);
        TimePlot time = report.plots().orElseThrow().time().orElseThrow();
        BrowserProbe.assertDrawn(time, svgs.get("time-plot"), c + " (the solution, among " + svgs.keySet() + ")");
        // a solve answer marks only the points asked for, and only those in the plotted range
        assertTrue(!c.points().isEmpty() || time.marks().isEmpty(), c + ": marks without --values-at");
        BrowserProbe.assertMarks(svgs.get("time-plot"), !time.marks().isEmpty(), false, c.name());
        Optional<?> frequency = report.plots().orElseThrow().frequency();
        assertEquals(frequency.isPresent(), svgs.containsKey("frequency-plot"), c + ": frequency plot present only with a steady state");
        if (frequency.isPresent()) {
            assertTrue(svgs.get("frequency-plot").get("segments").asInt() >= 100, c + ": frequency response without data");
        }
    }

    @Test
    void pageWithCodeShowsItInABlock() throws Exception {
        PageCorpus.Case c = PageCorpus.UNDERDAMPED;
        Report report = Rootform.solve(SolveRequest.of(c.problem()).with(Options.builder().points(c.points()).plots(true).code(true)
                .build())).answer().orElseThrow();
        String html = Exporters.byName("html", new DocumentOptions(false, Optional.of("c"))).orElseThrow()
                .render(report, CodeNames.defaults()).text();
        assertTrue(html.contains("<pre class=\"code\" data-language=\"c\">"), "no code block");
        assertTrue(html.contains("double rootform_value(double t)"), "the C function is missing");
        BrowserProbe.load("html", "forced-underdamped-with-c", html);
    }

    /** A value with all its digits (F(3000), 627 digits) wraps inside the values table instead of widening the page. */
    @Test
    void longValueWrapsWithinThePage() throws Exception {
        Report report = Rootform.solve(SolveRequest.of("x[n+2] = x[n+1] + x[n]; x[0] = 0; x[1] = 1")
                .with(Options.builder().points("3000").plots(true).allDigits(true).build())).answer().orElseThrow();
        String html = Exporters.byName("html").orElseThrow().render(report, CodeNames.defaults()).text();
        assertTrue(html.contains(report.values().get(0).allDigits().orElseThrow().toString()), "the digits are missing");
        BrowserProbe.load("html", "all-digits", html);
    }

    @Test
    void printsWholeOnA4AndLetter() throws Exception {
        String html = PageCorpus.render(PageCorpus.UNDERDAMPED, "html", DocumentOptions.defaults());
        Path dir = Tools.OUT.resolve("print").toAbsolutePath();
        for (String paper : new String[] {"A4", "letter"}) {
            Path page = dir.resolve("forced-underdamped-" + paper + ".html");
            Tools.writeString(page, html.replace("@page { margin: 14mm; }", "@page { margin: 14mm; size: " + paper + "; }"));
            Path pdf = dir.resolve("forced-underdamped-" + paper + ".pdf");
                Tools.Run print = Tools.chromium("--no-pdf-header-footer", "--print-to-pdf=" + pdf, page.toUri().toString());
            assertEquals(0, print.exit(), paper + ": " + print.err());
            String info = Tools.run(java.util.List.of(Tools.poppler("pdfinfo"), pdf.toString()), dir).out();
            assertTrue(info.contains(paper.equals("A4") ? "(A4)" : "(letter)"), paper + ": " + info);
            String text = Tools.run(java.util.List.of(Tools.poppler("pdftotext"), pdf.toString(), "-"), dir).out();
            for (String part : new String[] {"Problem", "Plots", "Verification", "Diagnostics", "Steady state", "licensed engineering"}) {
                assertTrue(text.contains(part), paper + ": the printout lacks " + part);
            }
        }
    }
}
