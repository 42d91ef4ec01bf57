package dev.rootform.export.document;

import dev.rootform.export.notation.Formulas;
import dev.rootform.export.notation.RootText;
import dev.rootform.export.document.SystemReport.Eigenvalue;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.statespace.Signal;
import java.util.ArrayList;
import java.util.List;

/**
 * The plain-text pieces of a state-space answer that several renderers share: matrices, entries
 * of e^(At) or A^n with the indices where they hold, signals with their pulse and impulse parts,
 * eigenvalues.
 */
final class SystemTexts {
    private SystemTexts() {
    }

    /** e.g. {@code [[0, 1], [-5, -2]]}. */
    static String matrix(RationalMatrix m) {
        return m.toString();
    }

    /** {@code e^(At)} or {@code A^n}. */
    static String transitionName(SystemReport r) {
        return r.model().continuous() ? "e^(At)" : "A^n";
    }

    /** The formula of a closed form with, for a sequence, where it holds and the values listed before. */
    static String withRange(ClosedForm f) {
        String formula = Formulas.plain(f);
        if (f.leadingValues().isEmpty()) {
            return formula;
        }
        long first = f.origin().toBigInteger().longValueExact();
        List<String> listed = new ArrayList<>();
        for (int i = 0; i < f.leadingValues().size(); i++) {
            listed.add(f.variable() + " = " + (first + i) + ": " + f.leadingValues().get(i));
        }
        return formula + " for " + f.variable() + " ≥ " + f.validFrom() + " (" + String.join(", ", listed) + ")";
    }

    /** e.g. {@code x1(t) = …}, {@code y1[n] = … for n ≥ 1; y1[0] = 2}, {@code y1(t) = … + 1·δ(t)}. */
    static String signal(SignalReport s, boolean continuous) {
        Signal sig = s.signal();
        ClosedForm f = s.report().solution().closedForm();
        String head = sig.name() + (continuous ? "(t)" : "[n]") + " = ";
        String body = withRange(f);
        if (!sig.delta().isZero()) {
            body += " + " + sig.delta() + "·δ(t)";
        }
        if (sig.start() == 1) {
            body += " for n ≥ 1; " + sig.name() + "[0] = " + sig.before();
        }
        return head + body;
    }

    /** e.g. {@code -1 + 2i ≈ -1 + 2i, algebraic multiplicity 1, index 1}. */
    static String eigenvalue(Eigenvalue e, int digits) {
        return RootText.exact(e.root()) + "  ≈ " + RootText.decimal(e.approximation(), digits) + "  algebraic multiplicity "
                + e.algebraic() + ", index " + e.index() + (e.index() > 1 ? " (Jordan block of size " + e.index() + ")" : "");
    }

    /** "rank 2 of 2 (controllable)". */
    static String rank(int rank, int n, String property) {
        return "rank " + rank + " of " + n + " (" + (rank == n ? "" : "not ") + property + ")";
    }

    /** A value's text: exact when known, else the decimal. */
    static String value(dev.rootform.numeric.analysis.PointValue v, int digits) {
        return v.exactText().orElse(dev.rootform.export.notation.Numbers.decimal(v.value(), digits));
    }
}
