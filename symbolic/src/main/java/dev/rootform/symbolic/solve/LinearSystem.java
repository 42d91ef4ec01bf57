package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

/**
 * Exact Gauss–Jordan elimination for square rational systems: A·v = b, explaining its failures
 * (an inconsistent system comes with a certificate u: u·A = 0, u·b ≠ 0; an underdetermined one
 * with a kernel vector v ≠ 0: A·v = 0), and the inverse A⁻¹. Used by {@link ConditionFitter} and
 * by the fit of a response's forced part (dev.rootform.symbolic.response).
 *
 * @since 0.3
 */
public final class LinearSystem {
    /**
     * Outcome of elimination: exactly one of {@code solution}, {@code certificate} (inconsistent)
     * or {@code kernel} (underdetermined) is non-null.
     */
    public record Result(List<Rational> solution, List<Rational> certificate, List<Rational> kernel, int rank) {
    }

    private LinearSystem() {
    }

    /** Solves the square system A·v = b; see {@link Result}. */
    public static Result solve(List<List<Rational>> matrix, List<Rational> rhs) {
        int n = matrix.size();
        // [A | b | I]: the identity part records the row operations, for the certificate
        List<List<Rational>> right = identity(n);
        for (int r = 0; r < n; r++) {
            right.get(r).add(0, rhs.get(r));
        }
        Reduced red = reduce(matrix, right);
        for (int r = red.rank(); r < n; r++) {
            if (!red.a()[r][n].isZero()) {
                List<Rational> u = new ArrayList<>();
                for (int c = 0; c < n; c++) {
                    u.add(red.a()[r][n + 1 + c]);
                }
                return new Result(null, u, null, red.rank());
            }
        }
        if (red.rank() < n) {
            int free = red.firstFreeColumn();
            List<Rational> v = new ArrayList<>(Collections.nCopies(n, Rational.ZERO));
            v.set(free, Rational.ONE);
            for (int r = 0; r < red.rank(); r++) {
                int p = red.pivotColumn()[r];
                v.set(p, red.a()[r][free].negate().divide(red.a()[r][p]));
            }
            return new Result(null, null, v, red.rank());
        }
        return new Result(red.right(0), null, null, n);
    }

    /** A⁻¹ as a list of rows, or empty when A is singular. */
    static Optional<List<List<Rational>>> inverse(List<List<Rational>> matrix) {
        int n = matrix.size();
        Reduced red = reduce(matrix, identity(n));
        if (red.rank() < n) {
            return Optional.empty();
        }
        List<List<Rational>> columns = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            columns.add(red.right(j));
        }
        List<List<Rational>> rows = new ArrayList<>();
        for (int r = 0; r < n; r++) {
            List<Rational> row = new ArrayList<>();
            for (int c = 0; c < n; c++) {
                row.add(columns.get(c).get(r));
            }
            rows.add(row);
        }
        return Optional.of(rows);
    }

    private static List<List<Rational>> identity(int n) {
        List<List<Rational>> identity = new ArrayList<>();
        for (int r = 0; r < n; r++) {
            List<Rational> row = new ArrayList<>();
            for (int c = 0; c < n; c++) {
                row.add(r == c ? Rational.ONE : Rational.ZERO);
            }
            identity.add(row);
        }
        return identity;
    }

    /** The augmented matrix [A | B] in reduced row echelon form, with the pivot column of each pivot row. */
    private record Reduced(Rational[][] a, int cols, int rank, int[] pivotColumn) {
        /** Column j of the solution X of A·X = B (meaningful when A has full column rank). */
        List<Rational> right(int j) {
            List<Rational> v = new ArrayList<>(Collections.nCopies(cols, Rational.ZERO));
            for (int r = 0; r < rank; r++) {
                v.set(pivotColumn[r], a[r][cols + j].divide(a[r][pivotColumn[r]]));
            }
            return v;
        }

        /** The first column of A without a pivot. */
        int firstFreeColumn() {
            int c = 0;
            for (int r = 0; r < rank && pivotColumn[r] == c; r++) {
                c++;
            }
            return c;
        }
    }

    private static Reduced reduce(List<List<Rational>> matrix, List<List<Rational>> right) {
        int rows = matrix.size();
        int cols = matrix.isEmpty() ? 0 : matrix.get(0).size();
        int width = cols + (right.isEmpty() ? 0 : right.get(0).size());
        Rational[][] a = new Rational[rows][width];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < width; c++) {
                a[r][c] = c < cols ? matrix.get(r).get(c) : right.get(r).get(c - cols);
            }
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
                    Deadline.checkCurrent();
                    Rational f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j < width; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotColumn[rank++] = c;
        }
        return new Reduced(a, cols, rank, pivotColumn);
    }
}
