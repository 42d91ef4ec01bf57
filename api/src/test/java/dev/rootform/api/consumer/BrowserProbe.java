package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Loads a page in headless Chromium with a probe script added (a copy of the page: an error
 * catcher first in the head, probe.js last in the body), reads the probe's findings back from
 * {@code --dump-dom}, asserts the layout facts every page must meet, and saves a screenshot of the
 * whole page under target/consumer for review.
 */
final class BrowserProbe {
    /** The viewport width: about an A4 or Letter page's printable width at 96 px per inch. */
    static final int WIDTH = 800;
    private static final String CATCHER = "<script>window.__probeErrors = [];"
            + "window.addEventListener('error', function (e) { window.__probeErrors.push(String(e.message)); }, true);"
            + "(function () { var original = console.error; console.error = function () {"
            + " window.__probeErrors.push(Array.prototype.join.call(arguments, ' ')); original.apply(console, arguments); }; })();"
            + "</script>";
    private static final Pattern FINDINGS = Pattern.compile("<script type=\"application/json\" id=\"probe-findings\">(.*?)</script>",
            Pattern.DOTALL);

    private BrowserProbe() {
    }

    /**
     * Probes {@code html} saved as {@code name}.html under target/consumer/{@code kind}, and its
     * screenshot as {@code name}.png; returns the findings after the common assertions.
     */
    static JsonNode load(String kind, String name, String html) throws IOException, InterruptedException {
        Path dir = Tools.OUT.resolve(kind).toAbsolutePath();
        Path page = dir.resolve(name + ".html");
        Tools.writeString(page, html);
        Path probed = dir.resolve(name + ".probe.html");
        String probe;
        try (InputStream in = BrowserProbe.class.getResourceAsStream("/consumer/probe.js")) {
            probe = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Tools.writeString(probed, withProbe(html, probe));
        Tools.Run dump = Tools.chromium("--window-size=" + WIDTH + ",1000", "--virtual-time-budget=3000", "--dump-dom",
                probed.toUri().toString());
        assertEquals(0, dump.exit(), name + ": chromium failed: " + dump.err());
        Matcher m = FINDINGS.matcher(dump.out());
        assertTrue(m.find(), name + ": the probe left no findings (did the page load?): " + dump.err());
        JsonNode f = new ObjectMapper().readTree(m.group(1));
        assertEquals(0, f.get("errors").size(), name + ": errors in the page: " + f.get("errors"));
        assertTrue(f.get("maths").asInt() > 0, name + ": no <math> element");
        assertEquals(0, f.get("emptyMaths").size(), name + ": <math> elements laid out with zero size: " + f.get("emptyMaths"));
        assertEquals(0, f.get("wide").size(), name + ": elements wider than the " + WIDTH + " px page: " + f.get("wide"));
        assertTrue(f.get("scrollWidth").asInt() <= f.get("width").asInt(), name + ": the page scrolls sideways: " + f);
        assertEquals(0, f.get("resources").asInt(), name + ": the page fetched resources (it must be self-contained)");
        int height = Math.max(200, f.get("height").asInt());
        Tools.Run shot = Tools.chromium("--window-size=" + WIDTH + "," + height, "--virtual-time-budget=3000",
                "--screenshot=" + dir.resolve(name + ".png"), page.toUri().toString());
        assertEquals(0, shot.exit(), name + ": screenshot failed: " + shot.err());
        assertTrue(Files.size(dir.resolve(name + ".png")) > 0, name + ": empty screenshot");
        return f;
    }

    /**
     * Asserts that the probe's finding {@code drawn} about an SVG shows every sample of {@code time}:
     * a stem per sample, or a curve through all of them.
     */
    static void assertDrawn(dev.rootform.numeric.plot.TimePlot time, JsonNode drawn, String name) {
        assertTrue(drawn != null && drawn.get("height").asDouble() > 0, name + ": the plot is missing");
        if (time.stems() && !time.logScale()) {
            assertTrue(drawn.get("shapes").asInt() >= time.solution().size(), name + ": fewer stems than samples: " + drawn);
        } else {
            assertTrue(drawn.get("segments").asInt() >= time.solution().size() - 1, name + ": the curve lacks samples: " + drawn);
        }
    }

    /**
     * Asserts what the marks of a time plot ({@code drawn}, the probe's finding) tell the reader: the
     * legend entry "--values-at points" and the caption's squares exactly when values were asked for
     * ({@code requested}), the entry "cross-check points" and the caption's rings exactly when the
     * plot marks where the answer was checked ({@code checked}).
     */
    static void assertMarks(JsonNode drawn, boolean requested, boolean checked, String name) {
        java.util.List<String> texts = new java.util.ArrayList<>();
        drawn.get("texts").forEach(t -> texts.add(t.asText().strip()));
        String caption = drawn.get("caption").asText();
        assertEquals(requested, texts.contains("--values-at points"), name + ": legend " + texts);
        assertEquals(requested, caption.contains("squares mark the values asked for with --values-at"), name + ": caption " + caption);
        assertEquals(checked, texts.contains("cross-check points"), name + ": legend " + texts);
        assertEquals(checked, caption.contains("rings mark the points where the answer was compared with"), name + ": caption " + caption);
    }

    /** The page with the error catcher first in its head and the probe last in its body. */
    private static String withProbe(String html, String probe) {
        String head = html.contains("<head>") ? html.replaceFirst("<head>", "<head>" + Matcher.quoteReplacement(CATCHER))
                : CATCHER + html;
        int end = head.lastIndexOf("</body>");
        String script = "<script>" + probe + "</script>";
        return end < 0 ? head + script : head.substring(0, end) + script + head.substring(end);
    }
}
