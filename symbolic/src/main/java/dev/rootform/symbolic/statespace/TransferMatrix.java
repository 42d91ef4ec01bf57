package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.matrix.Resolvent;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import java.util.ArrayList;
import java.util.List;

/**
 * The transfer matrix G(s) = C(sI − A)^(-1)B + D (G(z) for a discrete model), exactly: with
 * adj(sI − A) = Σ_k M_k s^k from {@link Resolvent}, entry (r, k) is (Σ_j (C·M_j·B)_{rk} s^j)/χ(s)
 * + D_{rk}, reduced to lowest terms (cancelled pole–zero pairs are uncontrollable or unobservable
 * modes).
 *
 * @param entries p rows of m reduced rational functions
 * @since 0.3
 */
public record TransferMatrix(List<List<RationalFunction>> entries) {
    public TransferMatrix {
        entries = entries.stream().map(List::copyOf).toList();
    }

    public static TransferMatrix of(StateModel model, Resolvent resolvent) {
        List<RationalMatrix> cmb = new ArrayList<>();
        for (RationalMatrix m : resolvent.adjugate()) {
            cmb.add(model.c().multiply(m).multiply(model.b()));
        }
        List<List<RationalFunction>> rows = new ArrayList<>();
        for (int r = 0; r < model.outputs(); r++) {
            List<RationalFunction> row = new ArrayList<>();
            for (int k = 0; k < model.inputs(); k++) {
                Rational[] p = new Rational[cmb.size()];
                for (int j = 0; j < p.length; j++) {
                    p[j] = cmb.get(j).get(r, k);
                }
                row.add(new RationalFunction(RationalPolynomial.of(p), resolvent.characteristic()).add(RationalFunction.of(model.d().get(r, k))));
            }
            rows.add(row);
        }
        return new TransferMatrix(rows);
    }

    public int outputs() {
        return entries.size();
    }

    public int inputs() {
        return entries.isEmpty() ? 0 : entries.get(0).size();
    }
}
