package org.treeproof.tree;

import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.CondensedRows;

/**
 * Cophenetic distances of a merge tree, one matrix row at a time: for leaf {@code i}, the cophenetic
 * distance to every leaf under the sibling of an ancestor of {@code i} is that ancestor's height, and
 * each sibling is a contiguous run of the leaf order. A row costs O(n), so the whole matrix is O(n²)
 * time with one row buffer, and the correlation never holds the cophenetic matrix.
 */
final class Cophenetic {
    private final int n;
    private final int[] left;
    private final int[] right;
    private final double[] height;
    private final int[] size;
    private final int[] leafOrder;
    private final int[] cladeStart;
    private final int[] parentMerge;
    private final int[] leafPosition;

    Cophenetic(MergeTree tree) {
        n = tree.leaves();
        left = tree.leftArray();
        right = tree.rightArray();
        height = tree.heightArray();
        size = tree.sizeArray();
        leafOrder = tree.leafOrderArray();
        cladeStart = tree.cladeStartArray();
        parentMerge = new int[2 * n - 1];
        parentMerge[2 * n - 2] = -1;
        for (int s = 0; s < n - 1; s++) {
            parentMerge[left[s]] = s;
            parentMerge[right[s]] = s;
        }
        leafPosition = new int[n];
        for (int p = 0; p < n; p++) {
            leafPosition[leafOrder[p]] = p;
        }
    }

    /** Fills {@code row[j]} with {@code coph(i, j) - shift} for every {@code j != i}. */
    private void fillRow(int i, double[] row, double shift) {
        int node = i;
        int s;
        while ((s = parentMerge[node]) >= 0) {
            int sibling = left[s] == node ? right[s] : left[s];
            int start = sibling < n ? leafPosition[sibling] : cladeStart[sibling - n];
            int end = start + (sibling < n ? 1 : size[sibling - n]);
            double v = height[s] - shift;
            for (int p = start; p < end; p++) {
                row[leafOrder[p]] = v;
            }
            node = n + s;
        }
    }

    double[] condensed() {
        double[] out = new double[CondensedDistances.length(n)];
        double[] row = new double[n];
        int t = 0;
        for (int i = 0; i < n - 1; i++) {
            fillRow(i, row, 0.0);
            int len = n - i - 1;
            System.arraycopy(row, i + 1, out, t, len);
            t += len;
        }
        return out;
    }

    /**
     * Pearson's r in two passes (mean, then centred sums), the way numpy-based code computes it; sums
     * are kept per row and added with Neumaier's compensation, which keeps the result within a few
     * ulps of a pairwise summation even for 2·10⁸ pairs.
     */
    double correlation(CondensedRows d) {
        return correlation(meanDistance(d), d);
    }

    /** The first pass: the mean of the distances over all pairs (NaN for fewer than two items). */
    static double meanDistance(CondensedRows d) {
        int n = d.size();
        long pairs = (long) n * (n - 1) / 2;
        if (pairs == 0) {
            return Double.NaN;
        }
        Sum sumD = new Sum();
        d.forEachRow((i, values, from) -> {
            double r = 0;
            for (int t = from, end = from + (n - i - 1); t < end; t++) {
                r += values[t];
            }
            sumD.add(r);
        });
        return sumD.value() / pairs;
    }

    /** The second pass, given the mean of the distances from {@link #meanDistance}. */
    double correlation(double meanD, CondensedRows d) {
        long pairs = (long) n * (n - 1) / 2;
        if (pairs == 0) {
            return Double.NaN;
        }
        Sum sumC = new Sum();
        for (int s = 0; s < n - 1; s++) {
            sumC.add(pairCount(s) * height[s]);
        }
        double meanC = sumC.value() / pairs;
        Sum scc = new Sum();
        for (int s = 0; s < n - 1; s++) {
            double c = height[s] - meanC;
            scc.add(pairCount(s) * c * c);
        }

        Sum sdd = new Sum();
        Sum sdc = new Sum();
        double[] row = new double[n];
        d.forEachRow((i, values, from) -> {
            fillRow(i, row, meanC);
            double rdd = 0;
            double rdc = 0;
            for (int j = i + 1, t = from; j < n; j++, t++) {
                double x = values[t] - meanD;
                rdd += x * x;
                rdc += x * row[j];
            }
            sdd.add(rdd);
            sdc.add(rdc);
        });
        double vd = sdd.value();
        double vc = scc.value();
        if (!(vd > 0) || !(vc > 0)) {
            return Double.NaN;
        }
        return sdc.value() / Math.sqrt(vd * vc);
    }

    private double pairCount(int s) {
        int a = left[s];
        int b = right[s];
        double na = a < n ? 1 : size[a - n];
        double nb = b < n ? 1 : size[b - n];
        return na * nb;
    }

    /** Neumaier's compensated sum (A. Neumaier, ZAMM 54 (1974) 39-51, doi:10.1002/zamm.19740540106). */
    private static final class Sum {
        private double sum;
        private double compensation;

        void add(double x) {
            double t = sum + x;
            if (Math.abs(sum) >= Math.abs(x)) {
                compensation += (sum - t) + x;
            } else {
                compensation += (x - t) + sum;
            }
            sum = t;
        }

        double value() {
            return sum + compensation;
        }
    }
}
