package dev.rootform.export.document;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Numbers;
import dev.rootform.numeric.analysis.NumericSolution;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A numeric answer ({@link NumericSolution}: the exact path did not finish) as text or JSON, labelled
 * numeric throughout: the reason, the modes (certified roots with their constants to the requested
 * digits), the values and the numerical checks. Other formats need an exact answer and are refused.
 *
 * @since 0.2
 */
public final class NumericDocument {
    private NumericDocument() {
    }

    /** Why {@code format} cannot show a numeric answer, or empty for text and JSON. */
    public static Optional<String> refusal(String format) {
        return format.equals("text") || format.equals("json") ? Optional.empty()
                : Optional.of("--format " + format + " needs an exact answer, and the exact path did not finish; "
                        + "the numeric answer is available as text or json");
    }

    /**
     * The answer in {@code format}.
     *
     * @throws IllegalArgumentException if {@link #refusal} is not empty
     */
    public static String render(String format, NumericSolution s) {
        refusal(format).ifPresent(r -> {
            throw new IllegalArgumentException(r);
        });
        return format.equals("json") ? json(s) : text(s);
    }

    private static String text(NumericSolution s) {
        LinearEquation eq = s.problem().equation();
        boolean sequence = eq.domain() == Domain.DIFFERENCE;
        List<String> modes = new ArrayList<>();
        for (NumericSolution.Mode m : s.modes()) {
            modes.add("λ = " + root(m, s.digits()) + (m.multiplicity() > 1 ? " ×" + m.multiplicity() : "") + ": " + constants(m, s.digits()));
        }
        String u = sequence ? eq.variable() : "u";
        String form = sequence
                ? "Σ over the modes of " + u + "^p·ρ^" + u + "·(a_p·cos(θ" + u + ") + b_p·sin(θ" + u + ")), λ = ρ·e^(iθ)"
                : "Σ over the modes of u^p·e^(σu)·(a_p·cos(ωu) + b_p·sin(ωu)), λ = σ + iω, u = " + eq.variable()
                        + (s.origin().signum() == 0 ? "" : " - " + s.origin().stripTrailingZeros().toPlainString());
        Layout out = new Layout()
                .section("equation", List.of(EquationText.equation(eq), EquationText.kind(eq)))
                .line("conditions", TextRenderer.conditions(eq, s.problem().conditions()))
                .section("answer", List.of("NUMERIC, not exact: " + s.reason() + ";",
                        "roots certified, constants and values to " + s.digits() + " significant digits"))
                .section("solution", List.of(eq.function() + " = " + form + " (a real root has no sine part)"))
                .section("modes", modes)
                .section("verification", TextRenderer.verification(s.checks(), s.verified()).stream()
                        .map(line -> line.equals("verified") ? "verified numerically (not exact)" : line).toList());
        if (!s.values().isEmpty()) {
            out.section("values", s.values().stream().map(v -> value(eq, v, s.digits())).toList());
        }
        return out.toString();
    }

    private static String json(NumericSolution s) {
        LinearEquation eq = s.problem().equation();
        ObjectNode root = JsonRenderer.object();
        root.put("numeric", true).put("reason", s.reason());
        root.put("domain", eq.domain() == Domain.DIFFERENCE ? "difference" : "differential").put("order", eq.order());
        root.put("equation", EquationText.equation(eq));
        ArrayNode conditions = root.putArray("conditions");
        s.problem().conditions().forEach(c -> conditions.add(EquationText.condition(eq, c)));
        root.put("origin", s.origin().toPlainString());
        ArrayNode modes = root.putArray("modes");
        for (NumericSolution.Mode m : s.modes()) {
            ObjectNode mode = modes.addObject().put("re", Numbers.decimal(m.re(), s.digits())).put("im", Numbers.decimal(m.im(), s.digits()))
                    .put("radius", m.radius().toString()).put("multiplicity", m.multiplicity());
            ArrayNode cosine = mode.putArray("cosine");
            m.cosine().forEach(a -> cosine.add(Numbers.decimal(a, s.digits())));
            ArrayNode sine = mode.putArray("sine");
            m.sine().forEach(b -> sine.add(Numbers.decimal(b, s.digits())));
        }
        JsonRenderer.verification(root.putObject("verification"), s.verified(), s.checks());
        ArrayNode values = root.putArray("values");
        s.values().forEach(v -> values.addObject().put("at", v.at().toString()).put("value", Numbers.decimal(v.value(), s.digits())));
        return JsonRenderer.text(root);
    }

    private static String root(NumericSolution.Mode m, int digits) {
        String re = Numbers.decimal(m.re(), digits);
        String im = m.im().signum() == 0 ? "" : " ± " + Numbers.decimal(m.im(), digits) + "i";
        return re + im + (m.radius().signum() == 0 ? "" : " (within " + m.radius().round(new java.math.MathContext(2)) + ")");
    }

    private static String constants(NumericSolution.Mode m, int digits) {
        List<String> parts = new ArrayList<>();
        for (int p = 0; p < m.cosine().size(); p++) {
            parts.add("a_" + p + " = " + Numbers.decimal(m.cosine().get(p), digits));
            if (!m.sine().isEmpty()) {
                parts.add("b_" + p + " = " + Numbers.decimal(m.sine().get(p), digits));
            }
        }
        return String.join(", ", parts);
    }

    private static String value(LinearEquation eq, PointValue v, int digits) {
        String at = Numbers.point(v.at());
        String unknown = eq.domain() == Domain.DIFFERENCE ? eq.function() + "[" + at + "]" : eq.function() + "(" + at + ")";
        BigDecimal value = v.value();
        return unknown + " ≈ " + Numbers.decimal(value, digits);
    }
}
