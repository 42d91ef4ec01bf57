package dev.rootform.export.document;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.rootform.export.Report;
import dev.rootform.export.notation.BasisCoefficient;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.Numbers;
import dev.rootform.export.notation.RootText;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.stream.Stream;

/**
 * The answer as one pretty-printed JSON object for programs. Exact numbers and decimals that may
 * not fit a double are strings; counts and flags are JSON numbers and booleans. Keys: domain, order,
 * equation, conditions, characteristic, roots, solution, constants, verification, diagnostics,
 * values, warnings.
 *
 * @since 0.1
 */
public final class JsonRenderer {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonRenderer() {
    }

    /** The report as JSON text. */
    public static String render(Report r) {
        Solution s = r.solution();
        LinearEquation eq = s.problem().equation();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("domain", eq.domain() == Domain.DIFFERENCE ? "difference" : "differential");
        root.put("order", eq.order());
        root.put("equation", EquationText.equation(eq));
        ArrayNode conditions = root.putArray("conditions");
        s.problem().conditions().forEach(c -> conditions.add(EquationText.condition(eq, c)));
        ObjectNode chi = root.putObject("characteristic");
        chi.put("polynomial", s.characteristic().toString(EquationText.LAMBDA));
        ArrayNode factors = chi.putArray("factors");
        for (Factor f : s.factors()) {
            factors.addObject().put("polynomial", f.polynomial().toString(EquationText.LAMBDA)).put("multiplicity", f.multiplicity());
        }
        roots(root.putArray("roots"), s.roots(), r.roots(), r.digits());
        solution(root.putObject("solution"), s.closedForm(), r);
        ArrayNode constants = root.putArray("constants");
        BasisCoefficient.of(s.closedForm()).forEach(c -> constants.addObject()
                .put("coefficient", r.numeric() ? c.decimal(r.digits()) : c.coefficient()).put("basis", c.basis()));
        verification(root.putObject("verification"), r.verified(),
                Stream.concat(r.solution().checks().stream(), r.numericChecks().stream()).toList());
        ObjectNode diagnostics = root.putObject("diagnostics");
        r.diagnostics().ifPresent(d -> DiagnosticsText.json(diagnostics, d, r));
        ArrayNode values = root.putArray("values");
        for (PointValue v : r.values()) {
            values.addObject().put("at", v.at().toString()).put("value", Numbers.decimal(v.value(), r.digits()))
                    .put("exact", v.exactText().orElse(null));
        }
        ArrayNode steady = root.putArray("steadyState");
        r.steadyStates().forEach(st -> steady.addObject().put("input", EquationText.forcingTerm(eq, st.input()))
                .put("amplitude", Numbers.decimal(st.amplitude(), r.digits())).put("gain", Numbers.decimal(st.gain(), r.digits()))
                .put("phaseDegrees", Numbers.decimal(st.phaseDegrees(), r.digits())));
        ArrayNode warnings = root.putArray("warnings");
        r.warnings().forEach(warnings::add);
        return text(root);
    }

    /** The object as indented JSON text. */
    static String text(ObjectNode root) {
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A new empty JSON object. */
    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    private static void roots(ArrayNode out, List<ExactRoot> roots, List<RootApproximation> approx, int digits) {
        for (int i = 0; i < roots.size(); i++) {
            ObjectNode node = out.addObject().put("exact", RootText.exact(roots.get(i)));
            if (i < approx.size()) {
                RootApproximation a = approx.get(i);
                node.put("re", Numbers.decimal(a.re(), digits)).put("im", Numbers.decimal(a.im(), digits))
                        .put("radius", a.radius().toString());
            }
            node.put("multiplicity", roots.get(i).multiplicity());
        }
    }

    /** The solution object of the answer; also the {@code solution} of a claim check's JSON. */
    static void solution(ObjectNode out, ClosedForm f, Report r) {
        out.put("text", EquationText.unknownAt(f, f.variable()) + " = " + Formulas.plain(f));
        out.put("latex", Formulas.latex(f));
        if (!f.particularTerms().isEmpty()) {
            out.put("homogeneous", Formulas.plain(f.withTerms(f.transientTerms())));
            out.put("particular", Formulas.plain(f.withTerms(f.particularTerms())));
        }
        out.put("origin", f.origin().toString());
        if (f.domain() == Domain.DIFFERENCE) {
            out.put("validFrom", f.validFrom());
        }
        ArrayNode leading = out.putArray("leadingValues");
        f.leadingValues().forEach(v -> leading.add(v.toString()));
        out.put("general", !f.freeConstants().isEmpty());
        ArrayNode free = out.putArray("freeConstants");
        f.freeConstants().forEach(free::add);
        if (!r.analysis().constantValues().isEmpty()) {
            ObjectNode values = out.putObject("constantValues");
            r.analysis().constantValues().forEach((name, value) -> values.put(name, Numbers.decimal(value, r.digits())));
        }
    }

    /** The verdict and the checks. */
    static void verification(ObjectNode out, boolean verified, List<Check> all) {
        out.put("verified", verified);
        ArrayNode checks = out.putArray("checks");
        all.forEach((Check c) ->
                checks.addObject().put("name", c.name()).put("passed", c.passed()).put("ran", c.ran()).put("detail", c.detail()));
    }
}
