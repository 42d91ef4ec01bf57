package dev.rootform.symbolic.params;

import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Solves a square linear system over Q(params) by Gaussian elimination, taking the first entry that
 * is not identically zero as pivot. The determinant comes with the solution: where it vanishes for
 * particular parameter values, the solution does not apply there.
 */
final class ParamSystem {
    /** The solution x of A·x = b and det A (not identically zero). */
    record Solved(List<ParamFunction> x, ParamFunction determinant) { }

    private ParamSystem() {
    }

    /** The unique solution for generic parameters, or empty when det A is identically zero. */
    static Optional<Solved> solve(List<List<ParamFunction>> a, List<ParamFunction> b) {
        int n = b.size();
        ParamFunction[][] m = new ParamFunction[n][n + 1];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                m[i][j] = a.get(i).get(j);
            }
            m[i][n] = b.get(i);
        }
        ParamFunction det = ParamFunction.one(b.isEmpty() ? List.of() : b.get(0).names());
        if (n == 0) {
            return Optional.of(new Solved(List.of(), det));
        }
        for (int k = 0; k < n; k++) {
            Deadline.checkCurrent();
            int pivot = k;
            while (pivot < n && m[pivot][k].isZero()) {
                pivot++;
            }
            if (pivot == n) {
                return Optional.empty();
            }
            if (pivot != k) {
                ParamFunction[] row = m[pivot];
                m[pivot] = m[k];
                m[k] = row;
                det = det.negate();
            }
            det = det.multiply(m[k][k]);
            for (int i = 0; i < n; i++) {
                if (i == k || m[i][k].isZero()) {
                    continue;
                }
                ParamFunction factor = m[i][k].divide(m[k][k]);
                for (int j = k; j <= n; j++) {
                    m[i][j] = m[i][j].subtract(factor.multiply(m[k][j]));
                }
            }
        }
        List<ParamFunction> x = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            x.add(m[i][n].divide(m[i][i]));
        }
        return Optional.of(new Solved(x, det));
    }
}
