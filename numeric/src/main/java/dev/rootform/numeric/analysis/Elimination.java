package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.work.Deadline;
import java.util.Arrays;
import java.util.List;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * Gauss–Jordan elimination with partial pivoting of a k×(k+1) augmented system in apfloat at a
 * working precision; an entry below 10^-(working - 10) of its row's scale (its largest entry, at
 * least 1) counts as zero. The reduced system is returned whole, so that a caller can explain a
 * singular one.
 */
final class Elimination {
    /**
     * The system after elimination.
     *
     * @param a the reduced augmented matrix (rows swapped as pivoted)
     * @param pivotRow for each column the row of its pivot, or -1 when the column has none
     * @param rank the number of pivots
     * @param tiny the relative size below which an entry counted as zero
     * @param scales each row's scale
     */
    record Reduced(Apfloat[][] a, int[] pivotRow, int rank, Apfloat tiny, Apfloat[] scales) {
        boolean singular() {
            return rank < a.length;
        }

        /** The unique solution of a system that is not singular. */
        List<Apfloat> solution() {
            int k = a.length;
            Apfloat[] x = new Apfloat[k];
            for (int c = 0; c < k; c++) {
                x[c] = a[pivotRow[c]][k].divide(a[pivotRow[c]][c]);
            }
            return List.of(x);
        }
    }

    private Elimination() {
    }

    /** Eliminates in place; {@code a} has k rows of k + 1 entries (the last is the right-hand side). */
    static Reduced reduce(Apfloat[][] a, long working) {
        int k = a.length;
        Apfloat tiny = new Apfloat("1e-" + (working - 10), working);
        Apfloat[] scales = new Apfloat[k];
        for (int r = 0; r < k; r++) {
            scales[r] = scale(a, r);
        }
        int[] pivotRow = new int[k];
        Arrays.fill(pivotRow, -1);
        int rank = 0;
        for (int c = 0; c < k; c++) {
            int p = -1;
            for (int r = rank; r < k; r++) {
                if (ApfloatMath.abs(a[r][c]).compareTo(tiny.multiply(scales[r])) > 0
                        && (p < 0 || ApfloatMath.abs(a[r][c]).compareTo(ApfloatMath.abs(a[p][c])) > 0)) {
                    p = r;
                }
            }
            if (p < 0) {
                continue;
            }
            swap(a, scales, p, rank);
            for (int r = 0; r < k; r++) {
                if (r != rank) {
                    Deadline.checkCurrent();
                    Apfloat f = a[r][c].divide(a[rank][c]);
                    for (int j = c; j <= k; j++) {
                        a[r][j] = a[r][j].subtract(f.multiply(a[rank][j]));
                    }
                }
            }
            pivotRow[c] = rank++;
        }
        return new Reduced(a, pivotRow, rank, tiny, scales);
    }

    private static void swap(Apfloat[][] a, Apfloat[] scales, int i, int j) {
        Apfloat[] row = a[i];
        a[i] = a[j];
        a[j] = row;
        Apfloat s = scales[i];
        scales[i] = scales[j];
        scales[j] = s;
    }

    /** The largest |entry| of the row's coefficients, at least 1. */
    private static Apfloat scale(Apfloat[][] a, int row) {
        Apfloat max = Apfloat.ONE;
        for (int j = 0; j < a.length; j++) {
            Apfloat v = ApfloatMath.abs(a[row][j]);
            max = v.compareTo(max) > 0 ? v : max;
        }
        return max;
    }
}
