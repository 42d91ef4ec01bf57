package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import java.util.Objects;

/**
 * A linear time-invariant state-space model: x' = Ax + Bu, y = Cx + Du (continuous) or
 * x[n+1] = Ax[n] + Bu[n], y[n] = Cx[n] + Du[n] (discrete), with n states, m inputs and p outputs.
 * A model without inputs has an n×0 B (and p×0 D); one without outputs a 0×n C.
 *
 * @param domain {@link Domain#DIFFERENTIAL} (continuous) or {@link Domain#DIFFERENCE} (discrete)
 * @since 0.3
 */
public record StateModel(Domain domain, RationalMatrix a, RationalMatrix b, RationalMatrix c, RationalMatrix d) {
    /** Largest number of states, inputs or outputs. */
    public static final int MAX_SIZE = 16;

    /** @throws InputException if a shape does not fit, naming the matrix */
    public StateModel {
        Objects.requireNonNull(domain, "domain");
        int n = a.rows();
        if (!a.isSquare()) {
            throw shape("A must be square, got " + a.shape());
        }
        if (n > MAX_SIZE || b.columns() > MAX_SIZE || c.rows() > MAX_SIZE) {
            throw shape("at most " + MAX_SIZE + " states, inputs and outputs (A is " + a.shape() + ", B " + b.shape()
                    + ", C " + c.shape() + ")");
        }
        if (b.rows() != n) {
            throw shape("B must have one row per state (" + n + "), got " + b.shape());
        }
        if (c.columns() != n) {
            throw shape("C must have one column per state (" + n + "), got " + c.shape());
        }
        if (d.rows() != c.rows() || d.columns() != b.columns()) {
            throw shape("D must be outputs × inputs (" + c.rows() + "×" + b.columns() + "), got " + d.shape());
        }
    }

    /** A model whose B, C and D default when absent: no inputs, no outputs, D = 0. */
    public static StateModel of(Domain domain, RationalMatrix a, RationalMatrix b, RationalMatrix c, RationalMatrix d) {
        int n = a.rows();
        RationalMatrix bb = b == null ? RationalMatrix.zero(n, 0) : b;
        RationalMatrix cc = c == null ? RationalMatrix.zero(0, n) : c;
        RationalMatrix dd = d == null ? RationalMatrix.zero(cc.rows(), bb.columns()) : d;
        return new StateModel(domain, a, bb, cc, dd);
    }

    public int states() {
        return a.rows();
    }

    public int inputs() {
        return b.columns();
    }

    public int outputs() {
        return c.rows();
    }

    public boolean continuous() {
        return domain == Domain.DIFFERENTIAL;
    }

    private static InputException shape(String message) {
        return new InputException(message, "", -1);
    }
}
