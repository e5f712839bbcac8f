package org.treeproof.tree;

import org.treeproof.distance.CondensedDistances;

/**
 * The primitive O(n³) agglomeration of the textbooks, kept as an independent reference: a full square
 * matrix, the closest active pair found by scanning every pair (first in row-major order on ties), and
 * the general Lance-Williams formula with all four coefficients from {@link Linkage#coefficients}
 * (Lance and Williams 1967, doi:10.1093/comjnl/9.4.373), on squared distances for the Euclidean-only
 * methods. Merges come out in the order they happen.
 */
final class NaiveLanceWilliams {
    private NaiveLanceWilliams() {
    }

    static MergeTree cluster(Linkage linkage, CondensedDistances distances) {
        int n = distances.size();
        boolean squared = linkage.requiresEuclidean();
        double[][] d = square(distances, squared);
        boolean[] active = new boolean[n];
        int[] id = new int[n];
        int[] size = new int[n];
        for (int i = 0; i < n; i++) {
            active[i] = true;
            id[i] = i;
            size[i] = 1;
        }
        int[] left = new int[n - 1];
        int[] right = new int[n - 1];
        double[] heights = new double[n - 1];
        for (int s = 0; s < n - 1; s++) {
            int bi = -1;
            int bj = -1;
            double best = Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (active[i] && active[j] && d[i][j] < best) {
                        best = d[i][j];
                        bi = i;
                        bj = j;
                    }
                }
            }
            left[s] = Math.min(id[bi], id[bj]);
            right[s] = Math.max(id[bi], id[bj]);
            heights[s] = squared ? Math.sqrt(Math.max(0, best)) : best;
            for (int k = 0; k < n; k++) {
                if (active[k] && k != bi && k != bj) {
                    double v = linkage.coefficients(size[bi], size[bj], size[k]).apply(d[k][bi], d[k][bj], best);
                    d[k][bj] = v;
                    d[bj][k] = v;
                }
            }
            active[bi] = false;
            size[bj] += size[bi];
            id[bj] = n + s;
        }
        return MergeTree.of(n, left, right, heights);
    }

    static double[][] square(CondensedDistances distances, boolean squared) {
        int n = distances.size();
        double[][] d = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double v = distances.get(i, j);
                d[i][j] = squared ? v * v : v;
            }
        }
        return d;
    }
}
