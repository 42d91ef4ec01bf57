package dev.rootform.export.document;

import dev.rootform.export.notation.CommentText;
import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.RootText;
import dev.rootform.export.document.SystemReport.ValueRow;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.statespace.StateModel;
import java.util.ArrayList;
import java.util.List;

/**
 * A state-space answer as aligned text sections: the model, χ and its factors, eigenvalues,
 * stability, e^(At) or A^n entry by entry, the transfer matrix, the Kalman ranks, the response,
 * values, verification.
 *
 * @since 0.3
 */
public final class SystemTextRenderer {
    private SystemTextRenderer() {
    }

    public static String render(SystemReport r) {
        StateModel m = r.model();
        String lambda = EquationText.LAMBDA;
        Layout out = new Layout();
        section(out, "system", List.of((m.continuous() ? "continuous: x' = Ax + Bu, y = Cx + Du" : "discrete: x[n+1] = Ax[n] + Bu[n], y[n] = Cx[n] + Du[n]")
                + "; " + count(m.states(), "state") + ", " + count(m.inputs(), "input") + ", " + count(m.outputs(), "output")));
        section(out, "A", List.of(SystemTexts.matrix(m.a())));
        if (m.inputs() > 0) {
            section(out, "B", List.of(SystemTexts.matrix(m.b())));
        }
        if (m.outputs() > 0) {
            section(out, "C", List.of(SystemTexts.matrix(m.c())));
            if (m.inputs() > 0) {
                section(out, "D", List.of(SystemTexts.matrix(m.d())));
            }
        }
        if (!r.states().isEmpty()) {
            section(out, "x0", List.of(r.x0().toString()));
            section(out, "input", List.of(r.input().label() + (m.inputs() > 1 ? " (on every input)" : "")));
        }
        section(out, "characteristic", List.of(r.characteristic().toString(lambda)));
        section(out, "factored", List.of(EquationText.factorisation(r.characteristic(), r.factors())));
        section(out, "minimal", List.of(r.minimal().toString(lambda)));
        section(out, "eigenvalues", r.eigenvalues().stream().map(e -> SystemTexts.eigenvalue(e, r.digits())).toList());
        Stability s = r.stability();
        section(out, "stability", List.of(s.verdict().text() + s.root().map(x -> " (λ = " + RootText.decimal(x, 10) + ": "
                + s.reason() + ")").orElse("")));
        List<String> entries = new ArrayList<>();
        List<List<ClosedForm>> x = r.transition().entries();
        for (int i = 0; i < x.size(); i++) {
            for (int j = 0; j < x.size(); j++) {
                entries.add("[" + (i + 1) + "," + (j + 1) + "] = " + SystemTexts.withRange(x.get(i).get(j)));
            }
        }
        section(out, SystemTexts.transitionName(r), entries);
        r.transfer().ifPresent(g -> {
            List<String> lines = new ArrayList<>();
            for (int i = 0; i < g.outputs(); i++) {
                for (int k = 0; k < g.inputs(); k++) {
                    RationalFunction f = g.entries().get(i).get(k);
                    lines.add("G[" + (i + 1) + "," + (k + 1) + "](" + r.transformVariable() + ") = " + f.toString(r.transformVariable()));
                }
            }
            section(out, "transfer", lines);
        });
        r.controllabilityRank().ifPresent(k -> section(out, "controllability", List.of(SystemTexts.rank(k, m.states(), "controllable"))));
        r.observabilityRank().ifPresent(k -> section(out, "observability", List.of(SystemTexts.rank(k, m.states(), "observable"))));
        section(out, "state", r.states().stream().map(sr -> SystemTexts.signal(sr, m.continuous())).toList());
        section(out, "output", r.outputs().stream().map(sr -> SystemTexts.signal(sr, m.continuous())).toList());
        List<String> values = new ArrayList<>();
        for (ValueRow v : r.values()) {
            values.add((m.continuous() ? "t = " : "n = ") + v.at() + ": x = " + texts(v.state(), r.digits())
                    + (v.output().isEmpty() ? "" : ", y = " + texts(v.output(), r.digits())));
        }
        section(out, "values", values);
        List<String> checks = new ArrayList<>();
        for (Check c : r.checks()) {
            checks.add((c.passed() ? "[ok]     " : "[FAILED] ") + c.name() + ": " + c.detail());
        }
        checks.add(r.verified() ? "verified" : "NOT verified");
        section(out, "verification", checks);
        section(out, "caution", List.of(CommentText.CAUTION));
        return out.toString();
    }

    private static String count(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    private static String texts(List<dev.rootform.numeric.analysis.PointValue> values, int digits) {
        return values.stream().map(v -> SystemTexts.value(v, digits)).toList().toString();
    }

    private static void section(Layout out, String label, List<String> lines) {
        out.section(label, lines);
    }
}
