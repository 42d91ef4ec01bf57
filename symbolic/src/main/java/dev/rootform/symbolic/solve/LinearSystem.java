package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;

/**
 * Exact Gaussian elimination for a square rational system A·v = b. Package-private worker of
 * {@link ConditionFitter}.
 */
final class LinearSystem {
    /** Outcome of elimination: the unique solution, or the rank and whether b is consistent. */
    record Result(List<Rational> solution, int rank, boolean consistent) {
        boolean unique() {
            return solution != null;
        }
    }

    private LinearSystem() {
    }

    static Result solve(List<List<Rational>> matrix, List<Rational> rhs) {
        int rows = matrix.size();
        int cols = matrix.isEmpty() ? 0 : matrix.get(0).size();
        Rational[][] a = new Rational[rows][cols + 1];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                a[r][c] = matrix.get(r).get(c);
            }
            a[r][cols] = rhs.get(r);
        }
        int rank = 0;
        int[] pivotColumn = new int[rows];
        for (int c = 0; c < cols && rank < rows; c++) {
            int p = rank;
            while (p < rows && a[p][c].isZero()) {
                p++;
            }
            if (p == rows) {
                continue;
            }
            Rational[] tmp = a[p];
            a[p] = a[rank];
            a[rank] = tmp;
            for (int r = 0; r < rows; r++) {
                if (r != rank && !a[r][c].isZero()) {
                    Rational f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j <= cols; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotColumn[rank] = c;
            rank++;
        }
        boolean consistent = true;
        for (int r = rank; r < rows; r++) {
            consistent &= a[r][cols].isZero();
        }
        if (rank < cols || !consistent) {
            return new Result(null, rank, consistent);
        }
        List<Rational> v = new ArrayList<>(cols);
        for (int c = 0; c < cols; c++) {
            v.add(Rational.ZERO);
        }
        for (int r = 0; r < rank; r++) {
            v.set(pivotColumn[r], a[r][cols].divide(a[r][pivotColumn[r]]));
        }
        return new Result(v, rank, true);
    }
}
