package org.treeproof.tree;

import org.treeproof.distance.CondensedDistances;

/**
 * Single linkage as a minimum spanning tree grown by Prim's algorithm on the condensed matrix: O(n²)
 * time, O(n) extra memory, the matrix is read in place and never copied. Müllner (2011),
 * arXiv:1109.2378; the MST edges sorted by length are the single-linkage
 * merges (J. C. Gower and G. J. S. Ross, "Minimum spanning trees and single linkage cluster analysis",
 * J. R. Stat. Soc. C 18 (1969) 54-64, doi:10.2307/2346439).
 *
 * <p>The tree grows from item 0; each step adds the outside item nearest to the tree, the smallest
 * index on ties, exactly as scipy's {@code mst_single_linkage} does.
 */
final class MinimumSpanningTree {
    private final CondensedDistances distances;

    MinimumSpanningTree(CondensedDistances distances) {
        this.distances = distances;
    }

    MergeTree run() {
        int n = distances.size();
        int m = n - 1;
        int[] a = new int[m];
        int[] b = new int[m];
        double[] h = new double[m];
        int[] rowOffset = new int[n];
        for (int i = 0; i < n; i++) {
            rowOffset[i] = (int) ((long) n * i - (long) i * (i + 1) / 2 - i - 1);
        }
        // outside[0..count) lists the items not yet in the tree in increasing order; reach[i] is the
        // distance from item i to the tree
        int[] outside = new int[n];
        double[] reach = new double[n];
        for (int i = 0; i < n; i++) {
            outside[i] = i;
            reach[i] = Double.POSITIVE_INFINITY;
        }
        int count = n;
        int x = 0;
        final CondensedDistances dist = distances;
        for (int k = 0; k < m; k++) {
            double best = Double.POSITIVE_INFINITY;
            int y = -1;
            int w = 0;
            int r = 0;
            // items below x: column x of the upper triangle
            for (; r < count; r++) {
                int i = outside[r];
                if (i >= x) {
                    break;
                }
                outside[w++] = i;
                double v = dist.at(rowOffset[i] + x);
                double ri = reach[i];
                if (v < ri) {
                    ri = v;
                    reach[i] = v;
                }
                if (ri < best) {
                    best = ri;
                    y = i;
                }
            }
            if (r < count && outside[r] == x) {
                r++; // x has just joined the tree
            }
            int ox = rowOffset[x];
            for (; r < count; r++) {
                int i = outside[r];
                outside[w++] = i;
                double v = dist.at(ox + i);
                double ri = reach[i];
                if (v < ri) {
                    ri = v;
                    reach[i] = v;
                }
                if (ri < best) {
                    best = ri;
                    y = i;
                }
            }
            count = w;
            a[k] = x;
            b[k] = y;
            h[k] = best;
            x = y;
        }
        return MergeOrder.sortAndLabel(n, a, b, h);
    }
}
