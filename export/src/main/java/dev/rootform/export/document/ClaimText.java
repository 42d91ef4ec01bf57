package dev.rootform.export.document;

import dev.rootform.export.notation.EquationText;
import dev.rootform.export.notation.Formulas;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.util.ArrayList;
import java.util.List;

/**
 * A closed form written as one claim that {@code rootform check --claim} reads back:
 * {@code x[n] = 4·2^n - 1 for n ≥ 1; x[0] = 2} or {@code y(t) = e^(-t)·cos(2t)}.
 *
 * @since 0.3
 */
public final class ClaimText {
    private ClaimText() {
    }

    /**
     * The claim text of a closed form.
     *
     * @param f a closed form without free constants
     * @return {@code x[n] = … for n ≥ K} with the values before K, or {@code y(t) = …}
     */
    public static String of(ClosedForm f) {
        String formula = EquationText.unknownAt(f, f.variable()) + " = " + Formulas.plain(f);
        if (f.domain() == Domain.DIFFERENTIAL) {
            return formula;
        }
        List<String> parts = new ArrayList<>();
        parts.add(formula + " for " + f.variable() + " ≥ " + f.validFrom());
        long first = f.origin().toBigInteger().longValueExact();
        for (int i = 0; i < f.leadingValues().size(); i++) {
            parts.add(EquationText.unknownAt(f, Long.toString(first + i)) + " = " + f.leadingValues().get(i));
        }
        return String.join("; ", parts);
    }
}
