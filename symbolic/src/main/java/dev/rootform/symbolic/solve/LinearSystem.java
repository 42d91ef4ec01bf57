package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Exact Gauss–Jordan elimination for a square rational system A·v = b that explains its failures:
 * an inconsistent system comes with a certificate u (u·A = 0, u·b ≠ 0) and an underdetermined
 * one with a kernel vector v ≠ 0 (A·v = 0). Package-private worker of {@link ConditionFitter}.
 */
final class LinearSystem {
    /**
     * Outcome of elimination: exactly one of {@code solution}, {@code certificate} (inconsistent)
     * or {@code kernel} (underdetermined) is non-null.
     */
    record Result(List<Rational> solution, List<Rational> certificate, List<Rational> kernel, int rank) {
    }

    private LinearSystem() {
    }

    static Result solve(List<List<Rational>> matrix, List<Rational> rhs) {
        int n = matrix.size();
        // [A | b | I]: the identity part records the row operations, for the certificate
        Rational[][] a = new Rational[n][2 * n + 1];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                a[r][c] = matrix.get(r).get(c);
                a[r][n + 1 + c] = r == c ? Rational.ONE : Rational.ZERO;
            }
            a[r][n] = rhs.get(r);
        }
        int rank = 0;
        int[] pivotColumn = new int[n];
        for (int c = 0; c < n && rank < n; c++) {
            int p = rank;
            while (p < n && a[p][c].isZero()) {
                p++;
            }
            if (p == n) {
                continue;
            }
            Rational[] tmp = a[p];
            a[p] = a[rank];
            a[rank] = tmp;
            for (int r = 0; r < n; r++) {
                if (r != rank && !a[r][c].isZero()) {
                    Rational f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j < a[r].length; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotColumn[rank++] = c;
        }
        for (int r = rank; r < n; r++) {
            if (!a[r][n].isZero()) {
                List<Rational> u = new ArrayList<>();
                for (int c = 0; c < n; c++) {
                    u.add(a[r][n + 1 + c]);
                }
                return new Result(null, u, null, rank);
            }
        }
        List<Rational> v = new ArrayList<>(Collections.nCopies(n, Rational.ZERO));
        if (rank < n) {
            int free = firstFreeColumn(pivotColumn, rank, n);
            v.set(free, Rational.ONE);
            for (int r = 0; r < rank; r++) {
                v.set(pivotColumn[r], a[r][free].negate().divide(a[r][pivotColumn[r]]));
            }
            return new Result(null, null, v, rank);
        }
        for (int r = 0; r < rank; r++) {
            v.set(pivotColumn[r], a[r][n].divide(a[r][pivotColumn[r]]));
        }
        return new Result(v, null, null, rank);
    }

    private static int firstFreeColumn(int[] pivotColumn, int rank, int n) {
        int c = 0;
        for (int r = 0; r < rank && pivotColumn[r] == c; r++) {
            c++;
        }
        return c < n ? c : n - 1;
    }
}
