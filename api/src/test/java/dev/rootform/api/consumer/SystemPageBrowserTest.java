package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.rootform.api.Options;
import dev.rootform.api.Rootform;
import dev.rootform.api.SystemExporters;
import dev.rootform.api.SystemRequest;
import dev.rootform.api.SystemResult;
import dev.rootform.export.CodeNames;
import dev.rootform.export.document.SystemReport;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Report pages of state-space answers ({@code rootform system --format html}) in headless Chromium
 * (the checks every page meets, see {@link BrowserProbe}): the eigenvalue plane and a plot of each
 * output drawn from the report's own samples. Scenarios of our own.
 */
class SystemPageBrowserTest {
    @Test
    void aDrivenModelShowsItsEigenvaluesAndOutput() throws Exception {
        // a cart on a spring with a damper, pushed by a constant force: x1 position, x2 velocity
        SystemReport r = report(SystemRequest.continuous("[[0,1],[-4,-1]]").withB("[[0],[1]]").withC("[[1,0]]").withX0("[1,0]")
                .withInput("step"));
        Map<String, JsonNode> svgs = load("system-cart", r);
        assertTrue(svgs.containsKey("roots-plot"), "no eigenvalue plane: " + svgs.keySet());
        BrowserProbe.assertDrawn(r.outputs().get(0).report().plots().orElseThrow().time().orElseThrow(), svgs.get("y1-plot"),
                "system-cart y1");
        // no --values-at: the marks are the cross-check points only, named as such
        BrowserProbe.assertMarks(svgs.get("y1-plot"), false, true, "system-cart y1");
        assertTrue(svgs.get("y1-plot").get("caption").asText().contains("a numerical integration of the state equation"),
                svgs.get("y1-plot").toString());
    }

    @Test
    void valuesAskedForAndCrossCheckPointsAreMarkedApart() throws Exception {
        // the same cart, values asked at t = 3/2 and 3 (neither is a cross-check point)
        SystemReport r = report(SystemRequest.continuous("[[0,1],[-4,-1]]").withB("[[0],[1]]").withC("[[1,0]]").withX0("[1,0]")
                .withInput("step"), "3/2", "3");
        Map<String, JsonNode> svgs = load("system-cart-values", r);
        BrowserProbe.assertMarks(svgs.get("y1-plot"), true, true, "system-cart-values y1");
    }

    @Test
    void aDiscreteJordanBlockWithoutOutputsDrawsItsStates() throws Exception {
        // two bins of a stock count with carry-over: A has the double eigenvalue 1/2 (one Jordan block)
        SystemReport r = report(SystemRequest.discrete("[[0.5,1],[0,0.5]]").withX0("[0,4]"));
        Map<String, JsonNode> svgs = load("system-stock", r);
        assertTrue(svgs.containsKey("roots-plot"), "no eigenvalue plane: " + svgs.keySet());
        for (int i = 0; i < 2; i++) {
            BrowserProbe.assertDrawn(r.states().get(i).report().plots().orElseThrow().time().orElseThrow(),
                    svgs.get("x" + (i + 1) + "-plot"), "system-stock x" + (i + 1));
            BrowserProbe.assertMarks(svgs.get("x" + (i + 1) + "-plot"), false, true, "system-stock x" + (i + 1));
            assertTrue(svgs.get("x" + (i + 1) + "-plot").get("caption").asText().contains("the exact iteration of the state equation"),
                    svgs.get("x" + (i + 1) + "-plot").toString());
        }
    }

    private static SystemReport report(SystemRequest request, String... points) {
        SystemResult result = Rootform.system(request.with(Options.builder().plots(true).points(points).build()));
        assertTrue(result instanceof SystemResult.Analysed, result.toString());
        return result.answer().orElseThrow();
    }

    private static Map<String, JsonNode> load(String name, SystemReport r) throws Exception {
        String html = SystemExporters.render(r, "html", CodeNames.defaults()).text();
        for (String part : new String[] {"Model", "Eigenvalues", "Verification", "passed"}) {
            assertTrue(html.contains(part), name + ": the page lacks " + part);
        }
        JsonNode f = BrowserProbe.load("html", name, html);
        Map<String, JsonNode> svgs = new HashMap<>();
        f.get("svgs").forEach(s -> svgs.put(s.get("id").asText(), s));
        return svgs;
    }
}
