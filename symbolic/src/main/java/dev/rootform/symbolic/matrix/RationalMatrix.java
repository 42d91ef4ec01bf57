package dev.rootform.symbolic.matrix;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * An exact matrix over the rationals, r×c with r, c &ge; 0. Immutable.
 *
 * @since 0.3
 */
public final class RationalMatrix {
    private final Rational[][] entries;
    private final int columns;

    private RationalMatrix(Rational[][] entries, int columns) {
        this.entries = entries;
        this.columns = columns;
    }

    /**
     * The matrix with these rows.
     *
     * @param columns the number of columns (needed when there are no rows)
     * @throws IllegalArgumentException if a row has another length
     */
    public static RationalMatrix of(List<List<Rational>> rows, int columns) {
        Rational[][] e = new Rational[rows.size()][];
        for (int i = 0; i < e.length; i++) {
            if (rows.get(i).size() != columns) {
                throw new IllegalArgumentException("row " + i + " has " + rows.get(i).size() + " entries, expected " + columns);
            }
            e[i] = rows.get(i).toArray(new Rational[0]);
        }
        return new RationalMatrix(e, columns);
    }

    /** A matrix from integers, for tests and examples. */
    public static RationalMatrix ofIntegers(long[][] rows) {
        int c = rows.length == 0 ? 0 : rows[0].length;
        Rational[][] e = new Rational[rows.length][c];
        for (int i = 0; i < rows.length; i++) {
            if (rows[i].length != c) {
                throw new IllegalArgumentException("ragged rows");
            }
            for (int j = 0; j < c; j++) {
                e[i][j] = Rational.of(rows[i][j]);
            }
        }
        return new RationalMatrix(e, c);
    }

    public static RationalMatrix zero(int rows, int columns) {
        Rational[][] e = new Rational[rows][columns];
        for (Rational[] row : e) {
            Arrays.fill(row, Rational.ZERO);
        }
        return new RationalMatrix(e, columns);
    }

    public static RationalMatrix identity(int n) {
        RationalMatrix m = zero(n, n);
        for (int i = 0; i < n; i++) {
            m.entries[i][i] = Rational.ONE;
        }
        return m;
    }

    /** The n×1 matrix of a vector. */
    public static RationalMatrix column(List<Rational> v) {
        Rational[][] e = new Rational[v.size()][1];
        for (int i = 0; i < e.length; i++) {
            e[i][0] = v.get(i);
        }
        return new RationalMatrix(e, 1);
    }

    public int rows() {
        return entries.length;
    }

    public int columns() {
        return columns;
    }

    public boolean isSquare() {
        return rows() == columns;
    }

    public Rational get(int row, int column) {
        return entries[row][column];
    }

    /** Row i as a list. */
    public List<Rational> row(int i) {
        return List.of(entries[i]);
    }

    /** Column j as a list. */
    public List<Rational> column(int j) {
        List<Rational> c = new ArrayList<>(rows());
        for (Rational[] row : entries) {
            c.add(row[j]);
        }
        return List.copyOf(c);
    }

    /** The rows as lists. */
    public List<List<Rational>> toRows() {
        List<List<Rational>> rows = new ArrayList<>();
        for (Rational[] row : entries) {
            rows.add(List.of(row));
        }
        return List.copyOf(rows);
    }

    public RationalMatrix add(RationalMatrix other) {
        requireSameShape(other);
        Rational[][] e = new Rational[rows()][columns];
        for (int i = 0; i < rows(); i++) {
            for (int j = 0; j < columns; j++) {
                e[i][j] = entries[i][j].add(other.entries[i][j]);
            }
        }
        return new RationalMatrix(e, columns);
    }

    public RationalMatrix subtract(RationalMatrix other) {
        return add(other.scale(Rational.MINUS_ONE));
    }

    public RationalMatrix scale(Rational factor) {
        Rational[][] e = new Rational[rows()][columns];
        for (int i = 0; i < rows(); i++) {
            for (int j = 0; j < columns; j++) {
                e[i][j] = entries[i][j].multiply(factor);
            }
        }
        return new RationalMatrix(e, columns);
    }

    /** this·other. @throws IllegalArgumentException if the inner sizes differ */
    public RationalMatrix multiply(RationalMatrix other) {
        if (columns != other.rows()) {
            throw new IllegalArgumentException("cannot multiply " + shape() + " by " + other.shape());
        }
        Rational[][] e = new Rational[rows()][other.columns];
        for (int i = 0; i < rows(); i++) {
            Deadline.checkCurrent();
            for (int j = 0; j < other.columns; j++) {
                Rational sum = Rational.ZERO;
                for (int k = 0; k < columns; k++) {
                    if (!entries[i][k].isZero() && !other.entries[k][j].isZero()) {
                        sum = sum.add(entries[i][k].multiply(other.entries[k][j]));
                    }
                }
                e[i][j] = sum;
            }
        }
        return new RationalMatrix(e, other.columns);
    }

    /** this·v for a vector v. */
    public List<Rational> multiply(List<Rational> v) {
        return multiply(column(v)).column(0);
    }

    /** this^k for a square matrix, k &ge; 0, by repeated squaring. */
    public RationalMatrix power(long k) {
        if (!isSquare() || k < 0) {
            throw new IllegalArgumentException("power needs a square matrix and k >= 0");
        }
        RationalMatrix result = identity(rows());
        RationalMatrix base = this;
        for (long e = k; e > 0; e >>= 1) {
            if ((e & 1) == 1) {
                result = result.multiply(base);
            }
            if (e > 1) {
                base = base.multiply(base);
            }
        }
        return result;
    }

    public RationalMatrix transpose() {
        Rational[][] e = new Rational[columns][rows()];
        for (int i = 0; i < rows(); i++) {
            for (int j = 0; j < columns; j++) {
                e[j][i] = entries[i][j];
            }
        }
        return new RationalMatrix(e, rows());
    }

    /** [this other]: the columns of both, side by side. */
    public RationalMatrix beside(RationalMatrix other) {
        if (rows() != other.rows()) {
            throw new IllegalArgumentException("cannot put " + other.shape() + " beside " + shape());
        }
        Rational[][] e = new Rational[rows()][columns + other.columns];
        for (int i = 0; i < rows(); i++) {
            System.arraycopy(entries[i], 0, e[i], 0, columns);
            System.arraycopy(other.entries[i], 0, e[i], columns, other.columns);
        }
        return new RationalMatrix(e, columns + other.columns);
    }

    /** [this; other]: the rows of both, this one's first. */
    public RationalMatrix above(RationalMatrix other) {
        return transpose().beside(other.transpose()).transpose();
    }

    public Rational trace() {
        Rational sum = Rational.ZERO;
        for (int i = 0; i < Math.min(rows(), columns); i++) {
            sum = sum.add(entries[i][i]);
        }
        return sum;
    }

    public boolean isZero() {
        return Arrays.stream(entries).flatMap(Arrays::stream).allMatch(Rational::isZero);
    }

    /** The rank, by exact Gaussian elimination. */
    public int rank() {
        Rational[][] m = new Rational[rows()][];
        for (int i = 0; i < m.length; i++) {
            m[i] = entries[i].clone();
        }
        int rank = 0;
        for (int col = 0; col < columns && rank < m.length; col++) {
            Deadline.checkCurrent();
            int pivot = -1;
            for (int i = rank; i < m.length; i++) {
                if (!m[i][col].isZero()) {
                    pivot = i;
                    break;
                }
            }
            if (pivot < 0) {
                continue;
            }
            Rational[] swap = m[pivot];
            m[pivot] = m[rank];
            m[rank] = swap;
            for (int i = rank + 1; i < m.length; i++) {
                if (m[i][col].isZero()) {
                    continue;
                }
                Rational f = m[i][col].divide(m[rank][col]);
                for (int j = col; j < columns; j++) {
                    m[i][j] = m[i][j].subtract(f.multiply(m[rank][j]));
                }
            }
            rank++;
        }
        return rank;
    }

    /** e.g. {@code 2×3}. */
    public String shape() {
        return rows() + "×" + columns;
    }

    private void requireSameShape(RationalMatrix other) {
        if (rows() != other.rows() || columns != other.columns) {
            throw new IllegalArgumentException("shapes differ: " + shape() + " and " + other.shape());
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalMatrix m && columns == m.columns && Arrays.deepEquals(entries, m.entries);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(entries) * 31 + columns;
    }

    /** e.g. {@code [[0, 1], [-5, -2]]}. */
    @Override
    public String toString() {
        return toRows().toString();
    }
}
