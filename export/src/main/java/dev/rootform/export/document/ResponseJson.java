package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.notation.Formulas;
import dev.rootform.export.document.JsonRenderer;
import dev.rootform.export.notation.Numbers;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.numeric.response.FrequencyPoint;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.response.Impulse;
import dev.rootform.symbolic.response.TransferFacts;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.util.List;
import java.util.Optional;

/**
 * A response answer as JSON: the solve answer of the equivalent problem (every key of
 * {@link JsonRenderer}: its {@code solution} is the response for t &gt; 0 or n &ge; 0, its
 * {@code values} are the response's) plus {@code transfer}, {@code poles}, {@code zeros},
 * {@code dcGain}, {@code properness}, {@code stable}, {@code hiddenModes}, {@code input},
 * {@code response} (with {@code impulses}), {@code equivalentEquation}, {@code frequencyResponse}
 * and {@code stepFigures}. Exact numbers and decimals are strings.
 *
 * @since 0.3
 */
public final class ResponseJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ResponseJson() {
    }

    /** The report as pretty-printed JSON. */
    public static String render(ResponseReport r) {
        try {
            ObjectNode root = (ObjectNode) MAPPER.readTree(JsonRenderer.render(r.response()));
            ObjectNode out = MAPPER.createObjectNode();
            TransferFunction h = r.transfer();
            TransferFacts f = r.facts();
            ObjectNode transfer = out.putObject("transfer");
            transfer.put("input", r.source()).put("name", h.name()).put("variable", h.variable())
                    .put("text", ResponseNotation.transfer(h)).put("latex", ResponseNotation.transferLatex(h))
                    .put("numerator", h.value().numerator().toString(h.variable()))
                    .put("denominator", h.value().denominator().toString(h.variable()));
            roots(out.putArray("poles"), h, f.poleRoots(), r.poleValues(), r.digits());
            roots(out.putArray("zeros"), h, f.zeroRoots(), r.zeroValues(), r.digits());
            ObjectNode dc = out.putObject("dcGain");
            dc.put("at", h.continuous() ? "0" : "1").put("finite", f.dcGain().isPresent())
                    .put("exact", f.dcGain().map(Object::toString).orElse(null));
            out.putObject("properness").put("relativeDegree", f.relativeDegree()).put("text", ResponseText.properness(f.relativeDegree()));
            out.put("stable", f.stable());
            ArrayNode hidden = out.putArray("hiddenModes");
            for (TransferFacts.HiddenMode m : f.hiddenModes()) {
                Factor factor = m.factor();
                ArrayNode at = hidden.addObject().put("factor", factor.polynomial().toString(h.variable()))
                        .put("multiplicity", factor.multiplicity()).put("stable", m.stable()).putArray("roots");
                m.roots().forEach(x -> at.add(ResponseNotation.root(h, x)));
            }
            out.put("input", r.plan().input().text());
            ClosedForm form = r.response().solution().closedForm();
            ObjectNode response = out.putObject("response");
            response.put("text", ResponseNotation.response(h, r.plan().impulses(), form))
                    .put("latex", ResponseNotation.responseLatex(h, r.plan().impulses(), form))
                    .put("split", r.plan().split().name().toLowerCase(java.util.Locale.ROOT));
            if (!form.particularTerms().isEmpty()) {
                response.put("transient", Formulas.plain(form.withTerms(form.transientTerms())))
                        .put("steady", Formulas.plain(form.withTerms(form.particularTerms())));
            }
            ArrayNode impulses = response.putArray("impulses");
            for (Impulse i : r.plan().impulses()) {
                impulses.addObject().put("order", i.order()).put("coefficient", i.coefficient().toString())
                        .put("text", ResponseNotation.impulse(h, i, false));
            }
            out.putObject("equivalentEquation").put("relation", r.relation()).put("problem", r.problem());
            ArrayNode frequencies = out.putArray("frequencyResponse");
            r.frequencyResponse().forEach(p -> frequency(frequencies.addObject(), h, p, r.digits()));
            r.stepFigures().ifPresentOrElse(s -> figures(out.putObject("stepFigures"), s, r.digits()), () -> out.putNull("stepFigures"));
            out.setAll(root);
            ArrayNode warnings = out.putArray("warnings");
            r.warnings().forEach(warnings::add);
            root.withArray("warnings").forEach(warnings::add);
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(out);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void roots(ArrayNode out, TransferFunction h, List<ExactRoot> exact, List<RootApproximation> values, int digits) {
        for (int i = 0; i < exact.size(); i++) {
            RootApproximation a = values.get(i);
            out.addObject().put("exact", ResponseNotation.root(h, exact.get(i))).put("re", Numbers.decimal(a.re(), digits))
                    .put("im", Numbers.decimal(a.im(), digits)).put("radius", a.radius().toString())
                    .put("multiplicity", exact.get(i).multiplicity());
        }
    }

    private static void frequency(ObjectNode out, TransferFunction h, FrequencyPoint p, int digits) {
        out.put("omega", p.frequency().text()).put("unit", h.continuous() ? "rad/s" : "rad/sample")
                .put("kind", p.kind().name().toLowerCase(java.util.Locale.ROOT));
        out.put("magnitude", decimal(p.magnitude(), digits)).put("magnitudeExact", p.exactMagnitude().map(Object::toString).orElse(null));
        out.put("decibels", decimal(p.decibels(), digits)).put("decibelsExact", p.exactDecibels().map(Object::toString).orElse(null));
        out.put("phaseDegrees", decimal(p.phaseDegrees(), digits))
                .put("phaseDegreesExact", p.exactPhaseDegrees().map(Object::toString).orElse(null));
    }

    private static void figures(ObjectNode out, StepFigures s, int digits) {
        out.put("finalValue", s.finalValue().toString()).put("unit", s.discrete() ? "samples" : "time");
        out.put("riseTime", decimal(s.riseTime(), digits)).put("peakTime", decimal(s.peakTime(), digits))
                .put("peakValue", decimal(s.peakValue(), digits)).put("overshootPercent", decimal(s.overshootPercent(), digits))
                .put("overshootPercentExact", s.exactOvershootPercent().map(Object::toString).orElse(null))
                .put("settlingTime", decimal(s.settlingTime(), digits));
        ArrayNode notes = out.putArray("notes");
        s.notes().forEach(notes::add);
    }

    private static String decimal(Optional<BigDecimal> x, int digits) {
        return x.map(v -> Numbers.decimal(v, digits)).orElse(null);
    }
}
