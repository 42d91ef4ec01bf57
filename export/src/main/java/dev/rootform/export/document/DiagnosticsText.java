package dev.rootform.export.document;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.Report;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.RootText;
import dev.rootform.numeric.diagnostics.Diagnostics;
import dev.rootform.numeric.diagnostics.Mode;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.numeric.roots.RootApproximation;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The diagnostics of a report as text lines (for {@link TextRenderer}) and as JSON members (for
 * {@link JsonRenderer}). Roots are named exactly, or by their decimals when the report is numeric.
 *
 * @since 0.2
 */
public final class DiagnosticsText {
    /** Significant digits of approximate mode quantities and of the condition number. */
    static final int SHORT_DIGITS = 7;

    private DiagnosticsText() {
    }

    /** Lines: stability, dominant mode and growth, one per mode, conditioning. */
    public static List<String> lines(Diagnostics d, Report r) {
        List<String> lines = new ArrayList<>();
        Stability s = d.stability();
        lines.add("stability: " + s.verdict().text() + s.root().map(x -> " (λ = " + root(x, r) + ": " + s.reason() + ")").orElse(""));
        lines.add("dominant: " + d.growth().root().map(x -> "λ = " + root(x, r) + ", ").orElse("") + "growth " + d.growth().theta());
        for (Mode m : d.modes()) {
            String quantities = m.quantities().stream().map(q -> q.symbol() + " = " + Numbers.decimal(q.value(), SHORT_DIGITS))
                    .collect(Collectors.joining(", "));
            lines.add("mode λ = " + root(m.root(), r) + (m.root().im().signum() > 0 ? " (and conjugate)" : "")
                    + (m.multiplicity() > 1 ? " ×" + m.multiplicity() : "") + (quantities.isEmpty() ? "" : ": " + quantities));
        }
        d.conditionNumber().ifPresent(k -> lines.add("conditioning: κ∞ = " + Numbers.decimal(k, SHORT_DIGITS)
                + " (relative errors in the conditions reach the constants amplified at most this much)"));
        return lines;
    }

    /** Fills the {@code diagnostics} JSON object. */
    static void json(ObjectNode out, Diagnostics d, Report r) {
        Stability s = d.stability();
        ObjectNode stability = out.putObject("stability").put("verdict", s.verdict().text()).put("reason", s.reason());
        s.root().ifPresent(x -> stability.put("root", root(x, r)));
        ObjectNode growth = out.putObject("dominant").put("growth", d.growth().theta()).put("power", d.growth().power())
                .put("rate", d.growth().rate());
        d.growth().root().ifPresent(x -> growth.put("root", root(x, r)));
        ArrayNode modes = out.putArray("modes");
        for (Mode m : d.modes()) {
            ObjectNode node = modes.addObject().put("root", root(m.root(), r)).put("multiplicity", m.multiplicity());
            m.quantities().forEach(q -> node.put(q.key(), q.value()));
        }
        d.conditionNumber().ifPresent(k -> out.put("conditionNumber", k.round(new MathContext(SHORT_DIGITS)).toString()));
    }

    private static String root(RootApproximation a, Report r) {
        return r.numeric() ? RootText.decimal(a, r.digits()) : RootText.exact(a.root());
    }
}
