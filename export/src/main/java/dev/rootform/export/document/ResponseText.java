package dev.rootform.export.document;

import dev.rootform.export.notation.Formulas;
import dev.rootform.export.document.Layout;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.RootText;
import dev.rootform.export.document.TextRenderer;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.numeric.response.FrequencyPoint;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.response.ResponsePlan;
import dev.rootform.symbolic.response.TransferFacts;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * A response answer for a person on a terminal: the transfer function and its facts, the
 * response with its parts, the frequency response and step figures, then the solved equivalent
 * problem as {@code rootform solve} shows it.
 *
 * @since 0.3
 */
public final class ResponseText {
    private ResponseText() {
    }

    /** The whole answer, ending in a newline. */
    public static String render(ResponseReport r) {
        TransferFunction h = r.transfer();
        TransferFacts f = r.facts();
        Layout out = new Layout().line("transfer", ResponseNotation.transfer(h));
        if (!h.continuous()) {
            out.line("in z^-1", ResponseNotation.delayForm(h));
        }
        if (!f.hiddenModes().isEmpty()) {
            out.section("cancelled", f.hiddenModes().stream().map(m -> hidden(h, m)).toList());
        }
        out.section("poles", roots(h, f.poleRoots(), r.poleValues(), r.digits()))
                .section("zeros", roots(h, f.zeroRoots(), r.zeroValues(), r.digits()))
                .line("DC gain", dcGain(h, f))
                .line("properness", properness(f.relativeDegree()))
                .line("stability", stability(h, f))
                .line("relation", r.relation() + "   (input u, output y)")
                .line("input", r.plan().input().text() + ", from zero initial state")
                .section("response", response(r))
                .line("solved as", r.problem());
        if (!r.frequencyResponse().isEmpty()) {
            out.section("frequency", r.frequencyResponse().stream().map(p -> frequency(h, p, r.digits())).toList());
        }
        r.stepFigures().ifPresent(s -> out.section("step figures", figures(h, s, r.digits())));
        if (!r.warnings().isEmpty()) {
            out.section("warnings", r.warnings());
        }
        return out + "\nthe solved problem (rootform solve \"" + r.problem() + "\"):\n" + TextRenderer.render(r.response());
    }

    private static List<String> response(ResponseReport r) {
        TransferFunction h = r.transfer();
        ClosedForm f = r.response().solution().closedForm();
        List<String> lines = new ArrayList<>();
        lines.add(ResponseNotation.response(h, r.plan().impulses(), f));
        if (h.continuous()) {
            lines.add(r.plan().impulses().isEmpty() ? "for t > 0 (0 before the input starts)"
                    : "the formula for t > 0; the impulses act at t = 0");
        } else {
            lines.add("for n ≥ 0 (0 before the input starts)");
        }
        if (r.plan().split() == ResponsePlan.Split.FORCED && !f.particularTerms().isEmpty()) {
            lines.add("transient (natural): " + Formulas.plain(f.withTerms(f.transientTerms())));
            lines.add("steady (forced): " + Formulas.plain(f.withTerms(f.particularTerms())));
        } else if (r.plan().split() == ResponsePlan.Split.STEADY_ONLY) {
            lines.add("all forced: " + h.signature() + " has no poles of its own");
        } else if (r.plan().split() == ResponsePlan.Split.NONE) {
            lines.add("transient and steady parts not separated: the input's modes have irrational amplitudes");
        }
        return lines;
    }

    static String hidden(TransferFunction h, TransferFacts.HiddenMode m) {
        Factor f = m.factor();
        String roots = m.roots().stream().map(x -> ResponseNotation.root(h, x)).collect(Collectors.joining(", "));
        return f.polynomial().toString(h.variable()) + (f.multiplicity() > 1 ? " (multiplicity " + f.multiplicity() + ")" : "")
                + ": pole–zero pair at " + h.variable() + " = " + roots + (m.stable() ? " (stable)"
                        : " (NOT stable: the mode is hidden from the input–output behaviour, not gone)");
    }

    private static List<String> roots(TransferFunction h, List<ExactRoot> exact, List<RootApproximation> values, int digits) {
        if (exact.isEmpty()) {
            return List.of("none");
        }
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < exact.size(); i++) {
            lines.add(ResponseNotation.root(h, exact.get(i)) + "  ≈ " + RootText.decimal(values.get(i), digits)
                    + "  multiplicity " + exact.get(i).multiplicity());
        }
        return lines;
    }

    static String dcGain(TransferFunction h, TransferFacts f) {
        String at = h.name() + "(" + (h.continuous() ? "0" : "1") + ")";
        return f.dcGain().map(g -> at + " = " + g).orElse("infinite: " + at + " is a pole");
    }

    static String properness(int relativeDegree) {
        if (relativeDegree > 0) {
            return "strictly proper, relative degree " + relativeDegree;
        }
        return relativeDegree == 0 ? "biproper (relative degree 0: direct feedthrough)"
                : "improper, relative degree " + relativeDegree;
    }

    static String stability(TransferFunction h, TransferFacts f) {
        if (!f.stable()) {
            String why = f.relativeDegree() < 0 ? (h.continuous() ? " (improper: it differentiates its input)" : " (not causal)")
                    : h.continuous() ? " (a pole with real part ≥ 0)" : " (a pole on or outside the unit circle)";
            return "not BIBO stable" + why + ": some bounded input gives an unbounded output";
        }
        return h.continuous() ? "BIBO stable: every pole has negative real part (Routh–Hurwitz, exact)"
                : "BIBO stable: every pole lies inside the unit circle (Routh–Hurwitz after z = (1 + w)/(1 − w), exact)";
    }

    private static String frequency(TransferFunction h, FrequencyPoint p, int digits) {
        String unit = h.continuous() ? " rad/s" : " rad/sample";
        String at = "ω = " + p.frequency().text() + unit + ": ";
        if (p.kind() == FrequencyPoint.Kind.POLE) {
            return at + "|H| infinite (a pole on the " + (h.continuous() ? "imaginary axis" : "unit circle") + ")";
        }
        if (p.kind() == FrequencyPoint.Kind.ZERO) {
            return at + "|H| = 0 (a zero there; dB −∞, phase undefined)";
        }
        String magnitude = p.exactMagnitude().map(m -> "|H| = " + m + " ≈ ").orElse("|H| ≈ ")
                + Numbers.decimal(p.magnitude().orElseThrow(), digits);
        String db = p.exactDecibels().map(d -> d + " dB").orElse("≈ " + Numbers.decimal(p.decibels().orElseThrow(), digits) + " dB");
        String phase = p.exactPhaseDegrees().map(d -> "phase " + d + "°")
                .orElse("phase ≈ " + Numbers.decimal(p.phaseDegrees().orElseThrow(), digits) + "°");
        return at + magnitude + ", " + db + ", " + phase;
    }

    private static List<String> figures(TransferFunction h, StepFigures s, int digits) {
        String unit = s.discrete() ? " samples" : "";
        List<String> lines = new ArrayList<>();
        lines.add("final value " + s.finalValue() + " (final-value theorem: " + h.name() + "(" + (h.continuous() ? "0" : "1") + "))");
        s.riseTime().ifPresent(t -> lines.add("rise time (10–90 %) " + show(t, digits) + unit));
        s.peakTime().ifPresent(t -> lines.add("peak time " + show(t, digits) + unit + ", peak value "
                + show(s.peakValue().orElseThrow(), digits)));
        s.overshootPercent().ifPresent(o -> lines.add("overshoot " + s.exactOvershootPercent()
                .map(q -> q + " %" + (q.isInteger() ? "" : " ≈ " + show(o, digits) + " %")).orElse(show(o, digits) + " %")));
        s.settlingTime().ifPresent(t -> lines.add("settling time (2 %) " + show(t, digits) + unit));
        lines.addAll(s.notes());
        return lines;
    }

    private static String show(BigDecimal x, int digits) {
        return Numbers.decimal(x, digits);
    }
}
