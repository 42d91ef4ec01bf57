package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.RootText;
import dev.rootform.export.document.SystemReport.Eigenvalue;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.export.document.SystemReport.ValueRow;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.algebra.RationalFunction;
import java.io.UncheckedIOException;
import java.util.List;

/**
 * A state-space answer as one JSON object. Exact numbers are strings. Keys: domain, states,
 * inputs, outputs, a, b, c, d, x0, input, characteristic, minimalPolynomial, eigenvalues,
 * stability, stable, transitionMatrix, transferMatrix, controllabilityRank, observabilityRank,
 * response, values ([{at, state, output}]), verification, caution.
 *
 * @since 0.3
 */
public final class SystemJsonRenderer {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private SystemJsonRenderer() {
    }

    public static String render(SystemReport r) {
        ObjectNode root = MAPPER.createObjectNode();
        String lambda = EquationText.LAMBDA;
        root.put("domain", r.model().continuous() ? "continuous" : "discrete");
        root.put("states", r.model().states()).put("inputs", r.model().inputs()).put("outputs", r.model().outputs());
        matrix(root.putArray("a"), r.model().a());
        matrix(root.putArray("b"), r.model().b());
        matrix(root.putArray("c"), r.model().c());
        matrix(root.putArray("d"), r.model().d());
        ArrayNode x0 = root.putArray("x0");
        r.x0().forEach(v -> x0.add(v.toString()));
        root.put("input", r.input().label());
        ObjectNode chi = root.putObject("characteristic").put("polynomial", r.characteristic().toString(lambda));
        ArrayNode factors = chi.putArray("factors");
        for (Factor f : r.factors()) {
            factors.addObject().put("polynomial", f.polynomial().toString(lambda)).put("multiplicity", f.multiplicity());
        }
        root.put("minimalPolynomial", r.minimal().toString(lambda));
        ArrayNode eigenvalues = root.putArray("eigenvalues");
        for (Eigenvalue e : r.eigenvalues()) {
            eigenvalues.addObject().put("exact", RootText.exact(e.root()))
                    .put("re", Numbers.decimal(e.approximation().re(), r.digits()))
                    .put("im", Numbers.decimal(e.approximation().im(), r.digits()))
                    .put("algebraicMultiplicity", e.algebraic()).put("index", e.index());
        }
        ObjectNode stability = root.putObject("stability").put("verdict", r.stability().verdict().text())
                .put("reason", r.stability().reason());
        r.stability().root().ifPresent(x -> stability.put("root", RootText.decimal(x, r.digits())));
        root.put("stable", r.stable());
        ObjectNode transition = root.putObject("transitionMatrix").put("name", SystemTexts.transitionName(r));
        ArrayNode rows = transition.putArray("entries");
        for (List<ClosedForm> row : r.transition().entries()) {
            ArrayNode out = rows.addArray();
            row.forEach(f -> closedForm(out.addObject(), f));
        }
        ArrayNode transfer = root.putArray("transferMatrix");
        r.transfer().ifPresent(g -> g.entries().forEach(row -> {
            ArrayNode out = transfer.addArray();
            for (RationalFunction f : row) {
                out.addObject().put("text", f.toString(r.transformVariable()))
                        .put("numerator", f.numerator().toString(r.transformVariable()))
                        .put("denominator", f.denominator().toString(r.transformVariable()));
            }
        }));
        r.controllabilityRank().ifPresentOrElse(k -> root.put("controllabilityRank", k), () -> root.putNull("controllabilityRank"));
        r.observabilityRank().ifPresentOrElse(k -> root.put("observabilityRank", k), () -> root.putNull("observabilityRank"));
        ObjectNode response = root.putObject("response");
        signals(response.putArray("states"), r.states());
        signals(response.putArray("outputs"), r.outputs());
        ArrayNode values = root.putArray("values");
        for (ValueRow v : r.values()) {
            ObjectNode row = values.addObject().put("at", v.at().toString());
            points(row.putArray("state"), v.state(), r.digits());
            points(row.putArray("output"), v.output(), r.digits());
        }
        ObjectNode verification = root.putObject("verification").put("verified", r.verified());
        ArrayNode checks = verification.putArray("checks");
        for (Check c : r.checks()) {
            checks.addObject().put("name", c.name()).put("passed", c.passed()).put("detail", c.detail());
        }
        root.put("caution", CommentText.CAUTION);
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void matrix(ArrayNode out, RationalMatrix m) {
        m.toRows().forEach(row -> {
            ArrayNode r = out.addArray();
            row.forEach(v -> r.add(v.toString()));
        });
    }

    private static void closedForm(ObjectNode out, ClosedForm f) {
        out.put("text", Formulas.plain(f)).put("latex", Formulas.latex(f)).put("validFrom", f.validFrom());
        ArrayNode leading = out.putArray("leadingValues");
        f.leadingValues().forEach(v -> leading.add(v.toString()));
    }

    private static void signals(ArrayNode out, List<SignalReport> signals) {
        for (SignalReport s : signals) {
            ObjectNode node = out.addObject().put("name", s.signal().name()).put("equation",
                    EquationText.equation(s.report().solution().problem().equation()));
            closedForm(node, s.report().solution().closedForm());
            node.put("start", s.signal().start()).put("valueAtZero", s.signal().before().toString())
                    .put("impulse", s.signal().delta().toString());
        }
    }

    private static void points(ArrayNode out, List<PointValue> values, int digits) {
        values.forEach(v -> out.add(SystemTexts.value(v, digits)));
    }
}
