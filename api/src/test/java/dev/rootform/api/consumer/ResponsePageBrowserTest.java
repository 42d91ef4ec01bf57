package dev.rootform.api.consumer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.rootform.api.DocumentOptions;
import dev.rootform.api.Options;
import dev.rootform.api.ResponseExporters;
import dev.rootform.api.ResponseRequest;
import dev.rootform.api.ResponseResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.CodeNames;
import dev.rootform.export.document.ResponseReport;
import dev.rootform.numeric.plot.FrequencyPlot;
import dev.rootform.numeric.plot.TimePlot;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Report pages of responses ({@code rootform response --format html}) loaded in headless Chromium
 * (the checks every page meets, see {@link BrowserProbe}): the pole–zero plane, the response and
 * the frequency response drawn from the report's own samples; screenshots under target/consumer/html.
 * Scenarios of our own.
 */
class ResponsePageBrowserTest {
    /** One response, with a file-safe name. */
    record Case(String name, String transfer, String input, List<String> frequencies) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Case> cases() {
        return Stream.of(
                // a position servo closed around a motor with friction: an underdamped step response
                new Case("response-servo-step", "G(s) = 10/(s(s + 2)); H(s) = G/(1 + G)", "step", List.of("1", "pi")),
                // a smoothing filter on a tank-level sensor: a zero on the unit circle at z = -1
                new Case("response-sensor-filter", "H(z) = (1 + z^-1)/(1 - 1.5z^-1 + 0.56z^-2)", "impulse", List.of("pi/2", "pi")),
                // a lead network on a pump controller: biproper, an impulse at t = 0
                new Case("response-lead-network", "H(s) = (s + 1)/(s + 10)", "impulse", List.of()),
                // an unstable pole: the response grows on a log axis
                new Case("response-unstable", "H(s) = 1/((s - 1)(s + 3))", "step", List.of()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void pageLoadsWithPlotsOfItsData(Case c) throws Exception {
        ResponseReport r = report(c, Optional.empty());
        String html = ResponseExporters.byName("html", DocumentOptions.defaults()).orElseThrow().render(r, CodeNames.defaults()).text();
        JsonNode f = BrowserProbe.load("html", c.name(), html);
        Map<String, JsonNode> svgs = new HashMap<>();
        f.get("svgs").forEach(s -> svgs.put(s.get("id").asText(), s));
        JsonNode plane = svgs.get("poles-plot");
        assertTrue(plane != null && plane.get("width").asDouble() > 0, c + ": no pole-zero plot: " + svgs.keySet());
        int points = r.poleValues().size() + r.zeroValues().size();
        assertTrue(plane.get("shapes").asInt() + plane.get("paths").asInt() >= points, c + ": a pole or zero is not drawn: " + plane);
        TimePlot time = r.response().plots().orElseThrow().time().orElseThrow();
        BrowserProbe.assertDrawn(time, svgs.get("time-plot"), c + " (the response, among " + svgs.keySet() + ")");
        FrequencyPlot frequency = r.frequencyPlot().orElseThrow();
        assertTrue(svgs.get("frequency-plot").get("segments").asInt() >= frequency.magnitudeDb().size() / 2,
                c + ": frequency response without data: " + svgs.get("frequency-plot"));
        for (String part : new String[] {"Transfer function", "Poles and zeros", "Response", "Frequency response",
            "Equivalent equation", "Verification", "DC gain", r.relation()}) {
            assertTrue(html.contains(dev.rootform.export.html.Html.text(part)), c + ": the page lacks " + part);
        }
        assertEquals(!c.frequencies().isEmpty(), html.contains("<th>frequency</th>"), c + ": table of the requested frequencies");
    }

    @Test
    void impulsesAndStepFiguresHaveRowsOfTheirOwn() throws Exception {
        String lead = page(cases().filter(c -> c.name().equals("response-lead-network")).findFirst().orElseThrow(), Optional.empty());
        assertTrue(lead.contains("impulses at t = 0"), "the lead network's δ(t) has no row");
        String servo = page(cases().filter(c -> c.name().equals("response-servo-step")).findFirst().orElseThrow(), Optional.empty());
        assertTrue(servo.contains("<h2>Step figures</h2>") && servo.contains("overshoot"), "the servo's step figures are missing");
    }

    @Test
    void pageWithCodeShowsTheEvaluatorNamingTheTransferFunction() throws Exception {
        Case c = cases().findFirst().orElseThrow();
        String html = page(c, Optional.of("java"));
        assertTrue(html.contains("<pre class=\"code\" data-language=\"java\">"), "no code block");
        assertTrue(html.contains("Response of H(s) = "), "the code does not name the transfer function");
        BrowserProbe.load("html", c.name() + "-with-java", html);
    }

    private static String page(Case c, Optional<String> code) {
        return ResponseExporters.byName("html", new DocumentOptions(false, code)).orElseThrow()
                .render(report(c, code), CodeNames.defaults()).text();
    }

    private static ResponseReport report(Case c, Optional<String> code) {
        ResponseResult result = Rootform.response(ResponseRequest.of(c.transfer()).to(c.input()).frequencies(c.frequencies())
                .with(Options.builder().plots(true).code(code.isPresent()).build()));
        assertTrue(result instanceof ResponseResult.Answered, c + ": " + result);
        return result.answer().orElseThrow();
    }
}
