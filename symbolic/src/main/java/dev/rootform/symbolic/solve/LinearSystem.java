package dev.rootform.symbolic.solve;

import dev.rootform.symbolic.algebra.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Exact Gauss–Jordan elimination for square rational systems: A·v = b, and the inverse A⁻¹.
 * Package-private worker of {@link ConditionFitter}.
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
        List<List<Rational>> column = new ArrayList<>();
        for (Rational b : rhs) {
            column.add(List.of(b));
        }
        Reduced r = reduce(matrix, column);
        int cols = r.cols();
        boolean consistent = true;
        for (int row = r.rank(); row < r.a().length; row++) {
            consistent &= r.a()[row][cols].isZero();
        }
        if (r.rank() < cols || !consistent) {
            return new Result(null, r.rank(), consistent);
        }
        return new Result(r.right(0), r.rank(), true);
    }

    /** A⁻¹ as a list of rows, or empty when A is singular. */
    static Optional<List<List<Rational>>> inverse(List<List<Rational>> matrix) {
        int n = matrix.size();
        List<List<Rational>> identity = new ArrayList<>();
        for (int r = 0; r < n; r++) {
            List<Rational> row = new ArrayList<>();
            for (int c = 0; c < n; c++) {
                row.add(r == c ? Rational.ONE : Rational.ZERO);
            }
            identity.add(row);
        }
        Reduced red = reduce(matrix, identity);
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

    /** The augmented matrix [A | B] in reduced row echelon form, with the pivot column of each pivot row. */
    private record Reduced(Rational[][] a, int cols, int rank, int[] pivotColumn) {
        /** Column j of the solution X of A·X = B (meaningful when A has full column rank). */
        List<Rational> right(int j) {
            List<Rational> v = new ArrayList<>(cols);
            for (int c = 0; c < cols; c++) {
                v.add(Rational.ZERO);
            }
            for (int r = 0; r < rank; r++) {
                v.set(pivotColumn[r], a[r][cols + j].divide(a[r][pivotColumn[r]]));
            }
            return v;
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
                    Rational f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j < width; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotColumn[rank] = c;
            rank++;
        }
        return new Reduced(a, cols, rank, pivotColumn);
    }
}
