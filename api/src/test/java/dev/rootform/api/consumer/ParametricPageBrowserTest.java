package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.api.ParametricExporters;
import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ParametricReport;
import dev.rootform.export.document.ParametricTextRenderer;
import dev.rootform.export.html.Html;
import dev.rootform.symbolic.params.Constraint;
import dev.rootform.symbolic.params.ParametricCase;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Report pages of answers with parameters ({@code solve --params --format html}) in headless
 * Chromium (the checks every page meets, see {@link BrowserProbe}: no errors, every {@code <math>}
 * laid out, nothing wider than the page, nothing fetched), with one row of the case table per case
 * and the stability conditions.
 */
class ParametricPageBrowserTest {
    @ParameterizedTest(name = "{0}")
    @MethodSource("dev.rootform.api.consumer.PageCorpus#parametricDocuments")
    void pageShowsTheCaseTableAndTheStabilityConditions(PageCorpus.Parametric p) throws Exception {
        ParametricReport r = PageCorpus.report(p);
        String html = ParametricExporters.byName("html").orElseThrow().render(r, CodeNames.defaults()).text();
        BrowserProbe.load("html", p.name(), html);
        int number = 1;
        for (ParametricCase c : r.answer().cases()) {
            assertTrue(html.contains("<tr><td>" + number + "</td><td>" + Html.text(ParametricTextRenderer.when(c)) + "</td>"),
                    p + ": case " + number + " is not a row of the case table");
            assertTrue(html.contains("<mtext>case " + number + ":</mtext>"), p + ": no formula of case " + number);
            number++;
        }
        for (Constraint c : r.answer().stability().conditions()) {
            assertTrue(html.contains(Html.text(c.toString())), p + ": the stability condition " + c + " is not stated");
        }
        assertTrue(html.contains(Html.text(ParametricTextRenderer.stability(r.answer().stability()))), p + ": no stability verdict");
    }
}
