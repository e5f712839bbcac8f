package org.treeproof.explain;

import java.util.Arrays;

/** Pearson's chi-square statistic of a contingency table and its expected counts. */
final class ContingencyChiSquare {
    private ContingencyChiSquare() {
    }

    /** The table without its all-zero rows and columns. */
    static int[][] compact(int[][] counts) {
        int rows = counts.length;
        int cols = rows == 0 ? 0 : counts[0].length;
        boolean[] keepCol = new boolean[cols];
        int keptRows = 0;
        for (int[] row : counts) {
            boolean any = false;
            for (int c = 0; c < cols; c++) {
                if (row[c] > 0) {
                    keepCol[c] = true;
                    any = true;
                }
            }
            keptRows += any ? 1 : 0;
        }
        int keptCols = 0;
        for (boolean b : keepCol) {
            keptCols += b ? 1 : 0;
        }
        int[][] out = new int[keptRows][keptCols];
        int r2 = 0;
        for (int[] row : counts) {
            if (Arrays.stream(row).sum() == 0) {
                continue;
            }
            int c2 = 0;
            for (int c = 0; c < cols; c++) {
                if (keepCol[c]) {
                    out[r2][c2++] = row[c];
                }
            }
            r2++;
        }
        return out;
    }

    /** Σ (observed − expected)² / expected, expected = row total × column total / N; no continuity correction. */
    static double statistic(int[][] t) {
        double[] rows = new double[t.length];
        double[] cols = new double[t[0].length];
        double n = 0;
        for (int r = 0; r < t.length; r++) {
            for (int c = 0; c < cols.length; c++) {
                rows[r] += t[r][c];
                cols[c] += t[r][c];
                n += t[r][c];
            }
        }
        double chi2 = 0;
        for (int r = 0; r < t.length; r++) {
            for (int c = 0; c < cols.length; c++) {
                double e = rows[r] * cols[c] / n;
                if (e > 0) {
                    double d = t[r][c] - e;
                    chi2 += d * d / e;
                }
            }
        }
        return chi2;
    }

    /** The smallest expected count. */
    static double minExpected(int[][] t) {
        double[] rows = new double[t.length];
        double[] cols = new double[t[0].length];
        double n = 0;
        for (int r = 0; r < t.length; r++) {
            for (int c = 0; c < cols.length; c++) {
                rows[r] += t[r][c];
                cols[c] += t[r][c];
                n += t[r][c];
            }
        }
        return Arrays.stream(rows).min().orElse(0) * Arrays.stream(cols).min().orElse(0) / n;
    }
}
