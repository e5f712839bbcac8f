package org.treeproof.tree;

import java.util.Arrays;

/**
 * Turns merges found out of height order (by the minimum spanning tree or the nearest-neighbour chain)
 * into the conventional layout: rows stably sorted by height, then relabelled through a union-find so
 * that each row names the two clusters current at that point (leaves {@code 0..n-1}, row {@code s}
 * forms {@code n+s}, smaller id first). This is valid for the monotone methods only, where a merge never
 * lies below one of the merges that formed its parts (Müllner 2011).
 */
final class MergeOrder {
    private MergeOrder() {
    }

    /**
     * @param a       one item (or slot) of each merge's first part, any member will do
     * @param b       one item of each merge's second part
     * @param heights reported merge heights, in the order found
     */
    static MergeTree sortAndLabel(int n, int[] a, int[] b, double[] heights) {
        int m = heights.length;
        int[] order = stableOrder(heights);
        int[] left = new int[m];
        int[] right = new int[m];
        double[] h = new double[m];
        int[] parent = new int[Math.max(1, 2 * n - 1)];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (int s = 0; s < m; s++) {
            int row = order[s];
            int ra = find(parent, a[row]);
            int rb = find(parent, b[row]);
            left[s] = Math.min(ra, rb);
            right[s] = Math.max(ra, rb);
            h[s] = heights[row] + 0.0; // turns a -0.0 height into +0.0
            parent[ra] = n + s;
            parent[rb] = n + s;
        }
        return new MergeTree(n, left, right, h, false);
    }

    /** Indices of {@code keys} in increasing key order, equal keys in index order (keys non-negative). */
    static int[] stableOrder(double[] keys) {
        int m = keys.length;
        double[] distinct = keys.clone();
        Arrays.sort(distinct);
        int u = 0;
        for (int i = 0; i < m; i++) {
            if (i == 0 || Double.compare(distinct[i], distinct[u - 1]) != 0) {
                distinct[u++] = distinct[i];
            }
        }
        long[] packed = new long[m];
        for (int i = 0; i < m; i++) {
            long rank = Arrays.binarySearch(distinct, 0, u, keys[i]);
            packed[i] = rank << 32 | i;
        }
        Arrays.sort(packed);
        int[] order = new int[m];
        for (int i = 0; i < m; i++) {
            order[i] = (int) packed[i];
        }
        return order;
    }

    private static int find(int[] parent, int x) {
        int root = x;
        while (parent[root] != root) {
            root = parent[root];
        }
        while (parent[x] != root) {
            int next = parent[x];
            parent[x] = root;
            x = next;
        }
        return root;
    }
}
